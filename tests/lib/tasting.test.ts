import { withSugarAddition } from '@/lib/recipes/tasting';
import type { RecipeContent } from '@/lib/schemas/recipes';

const content = { sugars: [{ type: 'sucrose', gPerL: 4 }] } as unknown as RecipeContent;

describe('withSugarAddition', () => {
  it('turns "+4 g sucrose to 473 mL" into g/L and adds it to the same sugar', () => {
    // By hand: 4 g ÷ 0.473 L = 8.4567 g/L; 4 + 8.4567 = 12.4567 g/L.
    expect(withSugarAddition(content, { type: 'sucrose', grams: 4, toMl: 473 }).sugars).toEqual([
      { type: 'sucrose', gPerL: 12.4567 },
    ]);
  });

  it('adds another sugar as a line of its own', () => {
    // By hand: 2 g ÷ 0.5 L = 4 g/L of honey.
    expect(withSugarAddition(content, { type: 'honey', grams: 2, toMl: 500 }).sugars).toEqual([
      { type: 'sucrose', gPerL: 4 },
      { type: 'honey', gPerL: 4 },
    ]);
  });
});
