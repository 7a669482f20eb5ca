import { StyleSheet } from 'react-native';

import { RecipeCardView, WRITE_IN_HEIGHT } from '@/components/print/RecipeCardView';
import { buildCard } from '@/lib/recipes/card';
import { evaluateRecipe, type IngredientFacts } from '@/lib/recipes/evaluate';
import { scaleRecipe } from '@/lib/recipes/scaling';
import type { RecipeContent } from '@/lib/schemas/recipes';
import { render, screen, within } from '@/tests/test-utils';

// USDA SR25 strawberries, raw (NDB 09316): 4.89 g sugars per 100 g. Vanilla extract (NDB 02050): 12.65 g sugars.
const facts = (id: number, name: string, sugarsG: number): IngredientFacts => ({
  id,
  name,
  sugarsG,
  carbohydrateG: sugarsG,
  fibreG: 0,
  fatG: 0,
  fermentableShare: 1,
  allergens: [],
  costPerKg: null,
});
const content: RecipeContent = {
  baseBrew: {
    name: 'black tea base',
    residualSugarGPerL: 1,
    ph: 3.2,
    abvPercent: 0.1,
    residualCo2Volumes: 0.9,
    lastOpenTempC: null,
  },
  lines: [
    { ingredientId: 1, amount: 40, unit: 'g-per-l', extractionPct: 100 },
    { ingredientId: 2, amount: 0.02, unit: 'g-per-l', extractionPct: 100 },
  ],
  sugars: [{ type: 'sucrose', gPerL: 2 }],
  process: {
    method: 'in-bottle',
    steepHours: 0,
    steepTempC: 4,
    strainLossPct: 0,
    carbonateHours: 72,
    carbonateTempC: 22,
    coldStoreTempC: 4,
  },
  bottleFormatId: 1,
  targetVolumes: 2.5,
  sweetnessNote: '',
  highestTempC: 30,
};

describe('RecipeCardView (the printed card)', () => {
  const bottle = { liquidMl: 473, headspaceMl: 25, maxWorkingPressureBar: 3 };
  const evaluation = evaluateRecipe(
    content,
    bottle,
    new Map([
      [1, facts(1, 'Strawberries', 4.89)],
      [2, facts(2, 'Vanilla extract', 12.65)],
    ]),
    0.5,
    'worst',
    { warmDayTempC: 35 },
  );
  const batch = { kind: 'bottles' as const, value: 150 };
  const scaled = scaleRecipe({
    lines: [
      { name: 'Strawberries', amount: 40, unit: 'g-per-l' },
      { name: 'Vanilla extract', amount: 0.02, unit: 'g-per-l' },
    ],
    sugars: [{ name: 'Sucrose (table sugar)', gPerL: 2 }],
    bottleLiquidMl: 473,
    process: { method: 'in-bottle' },
    batch,
    units: 'metric',
  });
  const card = buildCard({
    brewery: 'Test Ferments',
    recipeId: 4,
    recipeName: 'Strawberry vanilla',
    version: 2,
    content,
    scaled,
    bottleName: 'Crown cap 473 mL',
    bottleLiquidMl: 473,
    evaluation,
    approval: null,
    batch,
    units: 'metric',
  });

  it('puts each amount with its name, each bottle’s share, and a rounding note when rounding moved it more than 1 %', () => {
    render(<RecipeCardView card={card} />);
    const amounts = screen.getAllByTestId('card-amount');
    expect(amounts).toHaveLength(3);
    // By hand: 150 × 473 mL = 70.95 L. Strawberries 40 g/L → 2838 g → "2.84 kg"; each bottle 40 × 0.473 = 18.92 g.
    expect(within(amounts[0]).getByText('2.84 kg')).toBeOnTheScreen();
    expect(within(amounts[0]).getByText('Strawberries')).toBeOnTheScreen();
    expect(within(amounts[0]).getByText('18.9 g into each bottle')).toBeOnTheScreen();
    // Vanilla 0.02 g/L × 70.95 L = 1.419 g, read to 0.1 g: 1.4 g, |1.4 − 1.419| ÷ 1.419 = 1.34 % off.
    expect(within(amounts[1]).getByText('1.4 g')).toBeOnTheScreen();
    expect(
      within(amounts[1]).getByText('Rounded from 1.419 g (1.3 % off): weigh it on a finer scale.'),
    ).toBeOnTheScreen();
    // Sucrose 2 g/L → 141.9 g, to the gram from 100 g: 142 g (0.07 % off, no note); each bottle 0.946 g → 0.9 g.
    expect(within(amounts[2]).getByText('142 g')).toBeOnTheScreen();
    expect(within(amounts[2]).queryByText(/Rounded from/)).toBeNull();
    expect(within(amounts[2]).getByText('0.9 g into each bottle')).toBeOnTheScreen();
  });

  it('gives every checkpoint its target and a write-in box at least 8 mm high on paper', () => {
    render(<RecipeCardView card={card} />);
    const checkpoints = screen.getAllByTestId('card-checkpoint');
    expect(checkpoints.map((c) => within(c).getAllByText(/./)[0].props.children)).toEqual([
      'pH of the base before flavouring',
      'Gauge pressure of a test bottle',
      'Bottles filled',
      'Lot code',
      'Initials and date',
    ]);
    expect(within(checkpoints[0]).getByText('4.2 or below; never flavour above it')).toBeOnTheScreen();
    // 75 % of the 3 bar rating = 2.25 bar (2.25 × 14.5038 = 32.6 psi).
    expect(within(checkpoints[1]).getByText(/never above 2\.25 bar \(33 psi\)$/)).toBeOnTheScreen();
    expect(within(checkpoints[2]).getByText('150 planned')).toBeOnTheScreen();
    const boxes = screen.getAllByTestId('write-in');
    expect(boxes).toHaveLength(5);
    // Printed at 80 % (print.css): 40 px × 0.8 = 32 CSS px = 32 × 25.4 ÷ 96 = 8.47 mm.
    expect(StyleSheet.flatten(boxes[0].props.style).height).toBe(WRITE_IN_HEIGHT);
    expect((WRITE_IN_HEIGHT * 0.8 * 25.4) / 96).toBeGreaterThanOrEqual(8);
  });
});
