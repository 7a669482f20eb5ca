import { type Href, useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Button, Card, Text } from '@/components/ui';
import { useServerInfoQuery } from '@/lib/api/session';
import { useTeamQuery } from '@/lib/api/team';
import type { Session } from '@/lib/api/types';
import { can } from '@/lib/roles';
import { space } from '@/lib/theme';

interface Action {
  title: string;
  text: string;
  button: string;
  href: Href;
}

/** The next useful things this person can do, by role and by the state of their brewery. */
export function HomeActions({ session }: { session: Session }) {
  const router = useRouter();
  const owner = can(session.user.role, 'team.manage');
  const team = useTeamQuery(owner);
  const serverInfo = useServerInfoQuery();
  const actions: Action[] = [
    {
      title: 'Quick check',
      text: 'How much sugar for the fizz you want, what pressure the bottle will hold when warm, and how much alcohol the same sugar makes.',
      button: 'Open Quick check',
      href: '/quick-check',
    },
  ];
  if (owner) {
    const members = team.data?.members.filter((m) => m.active).length ?? 0;
    const pending = team.data?.invitations.filter((i) => i.status === 'pending').length ?? 0;
    actions.push({
      title: members <= 1 && pending === 0 ? 'Bring in your team' : 'Your team',
      text: team.data
        ? `${members} active ${members === 1 ? 'member' : 'members'}, ${pending} open ${pending === 1 ? 'invitation' : 'invitations'}. Invite recipe developers and brewers, and set who does what.`
        : 'Invite recipe developers and brewers, and set who does what.',
      button: 'Open Team',
      href: '/team',
    });
  }
  if (serverInfo.data?.outbox && (owner || serverInfo.data.outboxOpen)) {
    actions.push({
      title: 'Mail outbox',
      text: 'This server has no mail server set up, so invitations and reset links wait in the outbox. Open them there.',
      button: 'Open Mail outbox',
      href: '/outbox',
    });
  }
  actions.push({
    title: 'Your profile',
    text: 'Keep your name current and change your password.',
    button: 'Open Profile',
    href: '/profile',
  });
  return (
    <View style={styles.grid}>
      {actions.map((action) => (
        <Card key={action.title} title={action.title} style={styles.card}>
          <Text variant="muted">{action.text}</Text>
          <Button
            label={action.button}
            variant="secondary"
            onPress={() => router.navigate(action.href)}
            style={styles.button}
          />
        </Card>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  card: { flexGrow: 1, flexBasis: 300 },
  button: { alignSelf: 'flex-start' },
});
