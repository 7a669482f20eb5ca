import { OutboxView } from '@/components/outbox/OutboxView';
import { Screen, TextLink } from '@/components/ui';
import { useSessionQuery } from '@/lib/api/session';

export default function OutboxScreen() {
  const { data: session } = useSessionQuery();
  return (
    <Screen
      title="Mail outbox"
      subtitle="E-mails this server has written, waiting here because no mail server is set up."
      maxWidth={860}
    >
      {session ? null : <TextLink href="/sign-in">Go to sign in</TextLink>}
      <OutboxView />
    </Screen>
  );
}
