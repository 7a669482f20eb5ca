import { Redirect, Slot, usePathname } from 'expo-router';

import { AuthFrame } from '@/components/auth/AuthFrame';
import { useSessionQuery } from '@/lib/api/session';

/**
 * Pages for signed-out people. Someone already signed in who opens sign-in or sign-up goes home; the page does not
 * wait for that answer (a round trip on a slow phone), it draws at once.
 */
export default function SignedOutLayout() {
  const session = useSessionQuery();
  const pathname = usePathname();
  if (session.data && (pathname === '/sign-in' || pathname === '/sign-up')) return <Redirect href="/" />;
  return (
    <AuthFrame>
      <Slot />
    </AuthFrame>
  );
}
