import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Button, FormStatus, Text } from '@/components/ui';
import { useStartBatchMutation } from '@/lib/api/batches';
import type { RecipeDetail } from '@/lib/api/recipes';
import { useSessionQuery } from '@/lib/api/session';
import { can } from '@/lib/roles';
import type { BatchKind } from '@/lib/schemas/recipes';
import { space } from '@/lib/theme';

/**
 * Starts a batch at the size on screen: a production batch of the approved version (owners, brewers), or a trial of
 * the newest version (owners, developers). The batch freezes this card; later versions change nothing in it.
 */
export function StartBatch({
  recipe,
  batch,
}: {
  recipe: RecipeDetail;
  batch: { kind: BatchKind; value: number } | null;
}) {
  const router = useRouter();
  const { data: session } = useSessionQuery();
  const start = useStartBatchMutation();
  const role = session?.user.role;
  const production = recipe.approvedVersion !== null && can(role, 'batches.run');
  const trial = can(role, 'batches.trial') && recipe.status !== 'archived';
  if (!batch || (!production && !trial)) return null;
  const go = (version: number, isTrial: boolean) =>
    start.mutate(
      { recipeId: recipe.id, version, batch, trial: isTrial },
      { onSuccess: (created) => router.push(`/batches/${created.id}`) },
    );
  return (
    <View style={styles.wrap}>
      <FormStatus error={start.error} />
      <View style={styles.row}>
        {production ? (
          <Button
            label={`Start production batch (version ${recipe.approvedVersion})`}
            busy={start.isPending}
            onPress={() => go(recipe.approvedVersion!, false)}
          />
        ) : null}
        {trial ? (
          <Button
            label={`Start trial batch (version ${recipe.currentVersion})`}
            variant="secondary"
            busy={start.isPending}
            onPress={() => go(recipe.currentVersion, true)}
          />
        ) : null}
      </View>
      <Text variant="small">The batch keeps these amounts and steps and gets its own lot code.</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
