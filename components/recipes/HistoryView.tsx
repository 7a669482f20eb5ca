import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Card, FormStatus, Loading, Text } from '@/components/ui';
import { useRecipeDiffQuery, useRecipeVersionsQuery, useRestoreVersionMutation } from '@/lib/api/recipes';
import { formatDateTime } from '@/lib/format';
import { colors, space } from '@/lib/theme';

/** Every saved version; compare any with the newest, and bring an old one back as a new version. */
export function HistoryView({ recipeId, current, canEdit }: { recipeId: number; current: number; canEdit: boolean }) {
  const versions = useRecipeVersionsQuery(recipeId);
  const [compare, setCompare] = useState<number | null>(null);
  const diff = useRecipeDiffQuery(recipeId, compare, current);
  const restore = useRestoreVersionMutation(recipeId);
  if (!versions.data) return <Loading />;
  return (
    <View style={styles.wrap}>
      <FormStatus error={restore.error} />
      <Card title="Versions">
        {versions.data.map((v) => (
          <View key={v.number}>
            <View style={styles.row}>
              <View style={styles.grow}>
                <Text>
                  Version {v.number}
                  {v.number === current ? ' (current)' : ''} · {v.note || 'no note'}
                </Text>
                <Text variant="small">
                  {v.savedBy ?? 'someone'} · {formatDateTime(v.savedAt)}
                </Text>
              </View>
              {v.number !== current ? (
                <>
                  <Button
                    label="Compare"
                    accessibleName={`Compare version ${v.number} with the current one`}
                    variant="secondary"
                    onPress={() => setCompare(compare === v.number ? null : v.number)}
                  />
                  {canEdit ? (
                    <Button
                      label="Restore"
                      accessibleName={`Restore version ${v.number}`}
                      variant="quiet"
                      busy={restore.isPending && restore.variables === v.number}
                      onPress={() => restore.mutate(v.number)}
                    />
                  ) : null}
                </>
              ) : null}
            </View>
            {compare === v.number ? (
              // Right under the version compared, where the person just pressed.
              <View style={styles.diff} role="region" aria-label={`What changed from version ${compare} to ${current}`}>
                <Text variant="label">
                  What changed from version {compare} to {current}
                </Text>
                {diff.isPending ? <Loading label="Comparing…" /> : null}
                {diff.data?.length === 0 ? <Text variant="muted">Nothing changed.</Text> : null}
                {diff.data?.map((c, i) => (
                  <Text key={i}>
                    {c.what}: {c.before ?? '—'} → {c.after ?? '—'}
                  </Text>
                ))}
              </View>
            ) : null}
          </View>
        ))}
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm, paddingVertical: space.xs },
  grow: { flex: 1, minWidth: 200 },
  diff: {
    gap: space.xs,
    padding: space.md,
    marginBottom: space.sm,
    borderLeftWidth: 3,
    borderLeftColor: colors.primary,
    backgroundColor: colors.background,
  },
});
