import { Redirect, Slot, usePathname } from 'expo-router';
import { type ComponentType, lazy, type ReactNode, Suspense } from 'react';

import { AuthFrame } from '@/components/auth/AuthFrame';
import { Banner } from '@/components/ui/Banner';
import { Loading } from '@/components/ui/Loading';
import { useServerInfoQuery, useSessionQuery } from '@/lib/api/session';
import type { Session } from '@/lib/api/types';

import type * as Screens from './index';

/**
 * What the signed-in routes (app/(app), app/print, app/c) are made of. The screens and the shell load on demand, all
 * from one module (./index), which the bundler makes one chunk, fetched once: the sign-in screen's first load
 * carries none of it, and a signed-out visitor never fetches it.
 */

type ScreenName = Exclude<keyof typeof Screens, 'AppShell'>;

const loadScreens = () => import('./index');

/** A route that shows one signed-in screen, loading the signed-in code the first time one is opened. */
export function lazyScreen(name: ScreenName): ComponentType {
  const Screen = lazy(() => loadScreens().then((screens) => ({ default: screens[name] as ComponentType })));
  function LazyRoute() {
    return (
      <Suspense fallback={<Loading />}>
        <Screen />
      </Suspense>
    );
  }
  LazyRoute.displayName = `Lazy(${name})`;
  return LazyRoute;
}

const Shell = lazy(() =>
  loadScreens().then((screens) => ({
    default: screens.AppShell as ComponentType<{ session: Session; children: ReactNode }>,
  })),
);

/**
 * The signed-in area's layout. Signed-out visitors go to sign-in (decided before any signed-in code is fetched),
 * except to a development outbox that is open to all.
 */
export function SignedInArea() {
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
    <Suspense fallback={<Loading />}>
      <Shell session={session.data}>
        <Slot />
      </Shell>
    </Suspense>
  );
}
