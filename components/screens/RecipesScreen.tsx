import { Link, useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet } from 'react-native';

import {
  Badge,
  Banner,
  Button,
  Card,
  type Column,
  EmptyState,
  Loading,
  SafetyBadge,
  Screen,
  Segmented,
  Table,
  TextField,
} from '@/components/ui';
import { STATE_TONE } from '@/components/ui/review-tone';
import { type RecipeSummary, useRecipesQuery } from '@/lib/api/recipes';
import { useSessionQuery } from '@/lib/api/session';
import { formatDate } from '@/lib/format';
import { useDebouncedValue } from '@/lib/hooks/use-debounced-value';
import { can } from '@/lib/roles';
import type { RecipeListFilter } from '@/lib/schemas/recipes';
import { REVIEW_STATE_LABELS } from '@/lib/schemas/reviews';
import { colors, fonts, fontSize } from '@/lib/theme';

export default function RecipesScreen() {
  const router = useRouter();
  const { data: session } = useSessionQuery();
  const [text, setText] = useState('');
  const [status, setStatus] = useState<RecipeListFilter>(
    can(session?.user.role, 'recipes.develop') ? 'draft' : 'approved',
  );
  const recipes = useRecipesQuery(useDebouncedValue(text, 250), status);
  const canEdit = can(session?.user.role, 'recipes.edit');
  const columns: Column<RecipeSummary>[] = [
    {
      key: 'name',
      header: 'Recipe',
      flex: 2,
      render: (r) => (
        <Link href={`/recipes/${r.id}`} style={styles.link}>
          {r.name}
        </Link>
      ),
    },
    { key: 'notes', header: 'Flavour', flex: 2, render: (r) => r.flavourNotes || '—' },
    {
      key: 'status',
      header: 'Status',
      render: (r) =>
        r.status === 'archived' ? (
          <Badge label="Archived" />
        ) : (
          <Badge
            label={`${REVIEW_STATE_LABELS[r.reviewState]} · v${r.currentVersion}${r.approvedVersion && r.reviewState !== 'approved' ? ` (v${r.approvedVersion} in production)` : ''}`}
            tone={STATE_TONE[r.reviewState]}
          />
        ),
    },
    { key: 'safety', header: 'Safety', render: (r) => <SafetyBadge level={r.safetyLevel} /> },
    { key: 'updated', header: 'Changed', render: (r) => formatDate(r.updatedAt) },
  ];
  return (
    <Screen
      title="Recipes"
      subtitle="Flavours of your brewery, kept per litre so every batch size is exact."
      actions={canEdit ? <Button label="New recipe" onPress={() => router.push('/recipes/new')} /> : null}
    >
      <Card>
        <TextField
          label="Search recipes"
          value={text}
          onChangeText={setText}
          placeholder="Name or flavour, e.g. rhubarb"
        />
        <Segmented
          label="Show"
          value={status}
          onChange={setStatus}
          options={[
            { value: 'draft', label: 'Current' },
            { value: 'approved', label: 'For production' },
            { value: 'archived', label: 'Archived' },
            { value: 'all', label: 'All' },
          ]}
        />
        {recipes.isError ? <Banner tone="danger">{recipes.error.message}</Banner> : null}
        {!recipes.data ? (
          <Loading />
        ) : recipes.data.length === 0 ? (
          <EmptyState
            title="No recipes here"
            message={canEdit ? 'Start one with New recipe.' : 'Recipe developers add recipes here.'}
          />
        ) : (
          <Table label="Recipes" columns={columns} rows={recipes.data} rowKey={(r) => r.id} />
        )}
      </Card>
    </Screen>
  );
}

const styles = StyleSheet.create({
  link: {
    color: colors.primary,
    fontFamily: fonts.semibold,
    fontSize: fontSize.md,
    lineHeight: 24,
    textDecorationLine: 'underline',
  },
});
