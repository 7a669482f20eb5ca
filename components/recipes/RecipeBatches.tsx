import { Link } from 'expo-router';
import { StyleSheet } from 'react-native';

import { Card, Text } from '@/components/ui';
import { useBatchesQuery } from '@/lib/api/batches';
import { useSessionQuery } from '@/lib/api/session';
import { can } from '@/lib/roles';
import { BATCH_STATE_LABELS } from '@/lib/schemas/batches';
import { colors, fonts } from '@/lib/theme';

/** The batches made of this recipe, newest first, each opening its record. */
export function RecipeBatches({ recipeId }: { recipeId: number }) {
  const { data: session } = useSessionQuery();
  const allowed = can(session?.user.role, 'batches.read');
  const batches = useBatchesQuery({ recipeId, pageSize: 20 });
  if (!allowed || !batches.data) return null;
  return (
    <Card title="Batches of this recipe">
      {batches.data.items.length === 0 ? <Text variant="muted">No batch yet.</Text> : null}
      {batches.data.items.map((b) => (
        <Text key={b.id}>
          <Link href={`/batches/${b.id}`} style={styles.link}>
            {b.lotCode}
          </Link>
          {` · version ${b.version} · ${b.bottles} bottles · ${BATCH_STATE_LABELS[b.state]}${b.trial ? ' · trial' : ''}`}
        </Text>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  link: { color: colors.primary, fontFamily: fonts.semibold, textDecorationLine: 'underline' },
});
