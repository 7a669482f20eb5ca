import { Redirect, Slot, usePathname } from 'expo-router';

import { AuthFrame } from '@/components/auth/AuthFrame';
import { AppShell } from '@/components/shell/AppShell';
import { Banner, Loading } from '@/components/ui';
import { useServerInfoQuery, useSessionQuery } from '@/lib/api/session';

/** Signed-in area. Signed-out visitors go to sign-in, except to a development outbox that is open to all. */
export default function SignedInLayout() {
  const session = useSessionQuery();
  const serverInfo = useServerInfoQuery();
  const pathname = usePathname();
  if (session.isPending) return <Loading />;
  if (session.isError) {
    return (
      <AuthFrame>
        <Banner tone="danger" title="Fizzwright cannot load">
          {session.error.message}
        </Banner>
      </AuthFrame>
    );
  }
  if (!session.data) {
    if (pathname === '/outbox' && serverInfo.data?.outboxOpen) return <Slot />;
    if (pathname === '/outbox' && serverInfo.isPending) return <Loading />;
    return <Redirect href="/sign-in" />;
  }
  return (
    <AppShell session={session.data}>
      <Slot />
    </AppShell>
  );
}
