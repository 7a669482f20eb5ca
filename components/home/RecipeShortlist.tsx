import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Badge, Card, SafetyBadge, Text } from '@/components/ui';
import { STATE_TONE } from '@/components/ui/review-tone';
import { type RecipeSummary, useRecipesQuery } from '@/lib/api/recipes';
import type { Role } from '@/lib/roles';
import { can } from '@/lib/roles';
import { REVIEW_STATE_LABELS } from '@/lib/schemas/reviews';
import { colors, fonts, fontSize, space } from '@/lib/theme';

const VIEW: Record<
  Role,
  { title: string; empty: string; status: 'draft' | 'approved'; keep: (r: RecipeSummary) => boolean }
> = {
  owner: {
    title: 'Waiting for your review',
    empty: 'Nothing waits for review.',
    status: 'draft',
    keep: (r) => r.reviewState === 'submitted',
  },
  developer: {
    title: 'In development',
    empty: 'No drafts: start a recipe.',
    status: 'draft',
    // Submitted recipes stay in view (as "Waiting for review") until an owner decides.
    keep: (r) => r.reviewState === 'draft' || r.reviewState === 'returned' || r.reviewState === 'submitted',
  },
  brewer: {
    title: 'Approved for production',
    empty: 'No recipe is approved for production yet.',
    status: 'approved',
    keep: () => true,
  },
};

/** The recipes that need this person now, by role. */
export function RecipeShortlist({ role }: { role: Role }) {
  const view = VIEW[role];
  const recipes = useRecipesQuery('', view.status);
  const items = (recipes.data ?? []).filter(view.keep);
  return (
    <Card title={view.title} aside={recipes.data ? String(items.length) : undefined}>
      {recipes.data && items.length === 0 ? <Text variant="muted">{view.empty}</Text> : null}
      {items.slice(0, 8).map((r) => (
        <View key={r.id} style={styles.row}>
          <Link
            href={
              r.reviewState === 'submitted' && can(role, 'recipes.approve')
                ? `/recipes/${r.id}?tab=review`
                : `/recipes/${r.id}`
            }
            style={styles.link}
          >
            {r.name}
          </Link>
          <View style={styles.badges}>
            <SafetyBadge level={r.safetyLevel} />
            <Badge
              label={
                !can(role, 'recipes.develop')
                  ? `v${r.approvedVersion}`
                  : `${REVIEW_STATE_LABELS[r.reviewState]} · v${r.currentVersion}`
              }
              tone={!can(role, 'recipes.develop') ? 'success' : STATE_TONE[r.reviewState]}
            />
          </View>
        </View>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  badges: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  row: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: space.sm,
    minHeight: 36,
  },
  link: {
    color: colors.primary,
    fontFamily: fonts.semibold,
    fontSize: fontSize.md,
    lineHeight: 24,
    textDecorationLine: 'underline',
  },
});
