import { HomeActions } from '@/components/home/HomeActions';
import { RecipeShortlist } from '@/components/home/RecipeShortlist';
import { Badge, Card, Screen, Text } from '@/components/ui';
import { useSessionQuery } from '@/lib/api/session';
import { ROLE_DESCRIPTIONS, ROLE_LABELS } from '@/lib/roles';

export default function HomeScreen() {
  const { data: session } = useSessionQuery();
  if (!session) return null;
  const { user, organisation } = session;
  return (
    <Screen title={`Hello, ${user.name.split(' ')[0]}`} subtitle={organisation.name}>
      <Card title="Your role" aside={<Badge label={ROLE_LABELS[user.role]} tone="info" />}>
        <Text>{ROLE_DESCRIPTIONS[user.role]}</Text>
      </Card>
      <RecipeShortlist role={user.role} />
      <HomeActions session={session} />
    </Screen>
  );
}
