import type { RecipeContent, TastingInput } from '@/lib/schemas/recipes';

/**
 * The content a tasting's sugar addition makes: "+4 g sucrose to 473 mL" adds 4 ÷ 473 × 1000 = 8.457 g/L of
 * sucrose to the recipe's added sugars. The same function previews the change before saving and makes the version.
 */
export function withSugarAddition(
  content: RecipeContent,
  addition: NonNullable<TastingInput['sugarAddition']>,
): RecipeContent {
  const { type, grams, toMl } = addition;
  const extra = (grams / toMl) * 1000;
  const sugars = [...content.sugars];
  const existing = sugars.findIndex((s) => s.type === type);
  if (existing >= 0) sugars[existing] = { type, gPerL: Number((sugars[existing].gPerL + extra).toFixed(4)) };
  else sugars.push({ type, gPerL: Number(extra.toFixed(4)) });
  return { ...content, sugars };
}
