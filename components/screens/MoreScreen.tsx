import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { navItemsFor, phoneTabs } from '@/components/shell/nav';
import { Button, Card, Icon, Screen, Text } from '@/components/ui';
import { useServerInfoQuery, useSessionQuery, useSignOutMutation } from '@/lib/api/session';
import { colors, space } from '@/lib/theme';

/** On phones, the destinations that do not fit in the tab bar. */
export default function MoreScreen() {
  const router = useRouter();
  const { data: session } = useSessionQuery();
  const { data: serverInfo } = useServerInfoQuery();
  const signOut = useSignOutMutation();
  if (!session) return null;
  const all = navItemsFor(session, serverInfo);
  const { overflow } = phoneTabs(all);
  const list = overflow.length > 0 ? overflow : all;
  return (
    <Screen title="More" maxWidth={640}>
      <Card>
        {list.map((item) => (
          <Button
            key={item.href}
            label={item.label}
            variant="secondary"
            onPress={() => router.navigate(item.href)}
            block
          />
        ))}
      </Card>
      <Card>
        <View style={styles.row}>
          <Icon name="person" color={colors.textMuted} />
          <Text variant="muted" style={styles.grow}>
            {session.user.name} · {session.organisation.name}
          </Text>
        </View>
        <Button label="Sign out" variant="quiet" onPress={() => signOut.mutate()} />
      </Card>
    </Screen>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  grow: { flex: 1 },
});
