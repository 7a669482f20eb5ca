import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Text, TextField } from '@/components/ui';
import { type Ingredient, useIngredientSearchQuery } from '@/lib/api/ingredients';
import { useDebouncedValue } from '@/lib/hooks/use-debounced-value';
import { CATEGORY_LABELS } from '@/lib/ingredients';
import { colors, radius, space } from '@/lib/theme';
import { formatNumber } from '@/lib/units';

/** Finds an ingredient in the library by word beginnings and adds it to the recipe. */
export function IngredientPicker({ onPick, exclude }: { onPick: (ingredient: Ingredient) => void; exclude: number[] }) {
  const [text, setText] = useState('');
  const q = useDebouncedValue(text, 250);
  const search = useIngredientSearchQuery({ q, category: '', page: 1, pageSize: 6 });
  const items = q.trim() ? (search.data?.items ?? []).filter((i) => !exclude.includes(i.id)) : [];
  return (
    <View style={styles.wrap}>
      <TextField
        label="Add an ingredient"
        value={text}
        onChangeText={setText}
        placeholder="e.g. rhubarb, ginger, shortbread"
        autoCapitalize="none"
        autoCorrect={false}
      />
      {items.map((ingredient) => (
        <View key={ingredient.id} style={styles.row}>
          <View style={styles.text}>
            <Text>{ingredient.displayName}</Text>
            <Text variant="small">
              {CATEGORY_LABELS[ingredient.category]} ·{' '}
              {ingredient.per100g.sugarsG === null
                ? 'sugars not measured'
                : `${formatNumber(ingredient.per100g.sugarsG, 1)} g sugars per 100 g`}
              {ingredient.scope === 'house' ? ' · house' : ''}
              {ingredient.displayName !== ingredient.name ? ` · ${ingredient.name}` : ''}
            </Text>
          </View>
          <Button
            label="Add"
            accessibleName={`Add ${ingredient.displayName}`}
            variant="secondary"
            onPress={() => {
              onPick(ingredient);
              setText('');
            }}
          />
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.sm,
    padding: space.sm,
    borderRadius: radius.md,
    backgroundColor: colors.surfaceMuted,
  },
  text: { flex: 1 },
});
