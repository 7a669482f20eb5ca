import { RecipeResults } from '@/components/recipes/RecipeResults';
import { evaluateRecipe, type IngredientFacts } from '@/lib/recipes/evaluate';
import type { RecipeContent } from '@/lib/schemas/recipes';
import { render, screen, within } from '@/tests/test-utils';

// USDA SR25 strawberries, raw (09316): 4.89 g sugars and 0.30 g fat per 100 g; cost invented for the test.
const strawberry: IngredientFacts = {
  id: 1,
  name: 'Strawberries, raw',
  sugarsG: 4.89,
  carbohydrateG: 7.68,
  fibreG: 2,
  fatG: 0.3,
  fermentableShare: 1,
  allergens: [],
  costPerKg: 6,
};
const content: RecipeContent = {
  baseBrew: {
    name: 'House black tea base',
    residualSugarGPerL: 2,
    ph: 3.2,
    abvPercent: 0.2,
    residualCo2Volumes: 0.9,
    lastOpenTempC: null,
  },
  lines: [{ ingredientId: 1, amount: 40, unit: 'g-per-l', extractionPct: 100 }],
  sugars: [{ type: 'sucrose', gPerL: 4 }],
  process: {
    method: 'in-bottle',
    steepHours: 0,
    steepTempC: 4,
    strainLossPct: 0,
    carbonateHours: 72,
    carbonateTempC: 22,
    coldStoreTempC: 4,
  },
  bottleFormatId: 9,
  targetVolumes: 2.5,
  sweetnessNote: '',
  highestTempC: 30,
};

describe('RecipeResults (the designer’s numbers for one bottle)', () => {
  const evaluation = evaluateRecipe(
    content,
    { liquidMl: 500, headspaceMl: 25, maxWorkingPressureBar: 3 },
    new Map([[1, strawberry]]),
    0.5,
    'worst',
    { warmDayTempC: 35 },
  );

  it('shows the sugar each part brings, worked by hand', () => {
    render(<RecipeResults evaluation={evaluation} units="metric" limitPercent={0.5} bottleName="Crown cap 500 mL" />);
    // By hand, per 500 mL: strawberries 40 g/L × 0.5 L = 20 g × 4.89 % = 0.978 g; base 2 g/L and sucrose 4 g/L × 0.5 L
    // = 3 g; fermentable 3.978 g = 7.956 g/L. Cost: 20 g × 6 per kg = 0.120 per bottle, 0.24 per litre.
    expect(
      screen.getByText(
        /From the ingredients 0\.98 g · base and added sugar 3(\.00)? g · fermentable 3\.98 g \(8(\.0)? g\/L\)/,
      ),
    ).toBeOnTheScreen();
    expect(screen.getByText('Ingredients cost $0.120 per bottle, $0.24 per litre.')).toBeOnTheScreen();
    expect(
      screen.getByText(/Strawberries, raw: 20(\.00)? g per bottle, 0\.98 g of sugar into the liquid/),
    ).toBeOnTheScreen();
  });

  it('lists the pressure at each temperature with the warm day, and the alcohol against the limit', () => {
    render(<RecipeResults evaluation={evaluation} units="metric" limitPercent={0.5} bottleName="Crown cap 500 mL" />);
    const table = screen.getByLabelText('Pressure at each temperature');
    expect(within(table).getByText(/Warmest the bottles may meet · 35 °C/)).toBeOnTheScreen();
    // Alcohol by hand: 7.956 g/L of fermentable sugar × 0.068210 % ABV per g/L (sucrose: 4 × 46.069 ÷ 342.30 g of
    // ethanol per g, ÷ 0.78924 g/mL, CRC) = 0.5427 %, plus 0.2 % in the base = 0.74 % ABV: over the 0.5 % limit.
    expect(screen.getAllByText(/0\.74 % ABV/).length).toBeGreaterThan(0);
    expect(screen.getByText(/at or over the 0\.5 % ABV limit/)).toBeOnTheScreen();
  });
});
