import { Link } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import {
  Badge,
  Banner,
  Button,
  type Column,
  EmptyState,
  Loading,
  Select,
  Table,
  Text,
  TextField,
} from '@/components/ui';
import { type Ingredient, useIngredientSearchQuery } from '@/lib/api/ingredients';
import { useDebouncedValue } from '@/lib/hooks/use-debounced-value';
import { CATEGORIES, type Category, CATEGORY_LABELS } from '@/lib/ingredients';
import { colors, fonts, fontSize, space } from '@/lib/theme';
import { formatNumber } from '@/lib/units';

const PAGE_SIZE = 25;
const sugars = (i: Ingredient) =>
  i.per100g.sugarsG === null ? 'not measured' : `${formatNumber(i.per100g.sugarsG, 1)} g`;

/** Search the library by word beginnings ("straw rasp"), filter by category, page through the rest. */
export function IngredientList({ showArchived }: { showArchived: boolean }) {
  const [text, setText] = useState('');
  const [category, setCategory] = useState<Category | ''>('');
  const [page, setPage] = useState(1);
  const q = useDebouncedValue(text, 250);
  const search = useIngredientSearchQuery({ q, category, page, pageSize: PAGE_SIZE, archived: showArchived });
  const pages = search.data ? Math.max(1, Math.ceil(search.data.total / PAGE_SIZE)) : 1;
  const columns: Column<Ingredient>[] = [
    {
      key: 'name',
      header: 'Ingredient',
      flex: 2.4,
      render: (i) => (
        <Link href={`/ingredients/${i.id}`} style={styles.link}>
          {i.displayName}
        </Link>
      ),
    },
    { key: 'category', header: 'Category', render: (i) => CATEGORY_LABELS[i.category] },
    { key: 'sugars', header: 'Sugars per 100 g', render: (i) => sugars(i) },
    {
      key: 'source',
      header: 'Source',
      render: (i) => (
        <Badge label={i.scope === 'house' ? 'House' : 'USDA'} tone={i.scope === 'house' ? 'success' : 'neutral'} />
      ),
    },
  ];
  return (
    <View style={styles.wrap}>
      <TextField
        label="Search ingredients"
        value={text}
        onChangeText={(value) => {
          setText(value);
          setPage(1);
        }}
        placeholder="e.g. straw rasp, ginger, honey"
        autoCapitalize="none"
        autoCorrect={false}
        returnKeyType="search"
      />
      <Select
        compact
        label="Category"
        value={category}
        onChange={(value) => {
          setCategory(value);
          setPage(1);
        }}
        options={[
          { value: '' as const, label: 'All' },
          ...CATEGORIES.map((c) => ({ value: c, label: CATEGORY_LABELS[c] })),
        ]}
      />
      {search.isError ? <Banner tone="danger">{search.error.message}</Banner> : null}
      {!search.data ? (
        <Loading label="Searching…" />
      ) : search.data.items.length === 0 ? (
        <EmptyState
          title="Nothing found"
          message="Try the beginning of a word, another category, or add a house ingredient."
        />
      ) : (
        <View style={[styles.wrap, search.isPlaceholderData && styles.stale]}>
          <Text variant="small" aria-live="polite">
            {search.data.total} {search.data.total === 1 ? 'ingredient' : 'ingredients'}
            {pages > 1 ? ` · page ${page} of ${pages}` : ''}
          </Text>
          <Table label="Ingredients" columns={columns} rows={search.data.items} rowKey={(i) => i.id} />
          {pages > 1 ? (
            <View style={styles.pager}>
              <Button
                label="Previous page"
                variant="secondary"
                disabled={page <= 1}
                onPress={() => setPage(page - 1)}
              />
              <Button
                label="Next page"
                variant="secondary"
                disabled={page >= pages}
                onPress={() => setPage(page + 1)}
              />
            </View>
          ) : null}
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  stale: { opacity: 0.6 },
  link: {
    color: colors.primary,
    fontFamily: fonts.semibold,
    fontSize: fontSize.md,
    lineHeight: 24,
    textDecorationLine: 'underline',
  },
  pager: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
