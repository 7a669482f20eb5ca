import { diffRecipes } from '@/lib/recipes/diff';
import { evaluateRecipe, type IngredientFacts } from '@/lib/recipes/evaluate';
import type { RecipeContent } from '@/lib/schemas/recipes';

// USDA SR25: strawberries, raw (09316) 4.89 g sugars, 7.68 g carbohydrate, 2.0 g fibre and 0.30 g fat per 100 g;
// cookies, shortbread (18192) 64.5 g carbohydrate and 1.8 g fibre, with round sugar and fat figures as below.
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
const shortbread: IngredientFacts = {
  id: 2,
  name: 'Shortbread',
  sugarsG: 20,
  carbohydrateG: 64.5,
  fibreG: 1.8,
  fatG: 24,
  fermentableShare: 1,
  allergens: ['wheat', 'milk'],
  costPerKg: 12,
};
const facts = new Map([strawberry, shortbread].map((f) => [f.id, f]));
const bottle = { liquidMl: 500, headspaceMl: 25, maxWorkingPressureBar: 3 };

const content = (over: Partial<RecipeContent> = {}): RecipeContent => ({
  baseBrew: {
    name: 'House black tea base',
    residualSugarGPerL: 2,
    ph: 3.2,
    abvPercent: 0.2,
    residualCo2Volumes: 0.9,
    lastOpenTempC: null,
  },
  lines: [{ ingredientId: 1, amount: 40, unit: 'g-per-l', extractionPct: 50 }],
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
  ...over,
});

describe('evaluateRecipe', () => {
  it('adds the base’s residual sugar, the fruit and the added sugar for one bottle', () => {
    const result = evaluateRecipe(content(), bottle, facts, 0.5);
    // By hand, per 500 mL: strawberries 40 g/L × 0.5 L = 20 g × 4.89 % = 0.978 g (all of it: solids stay in the bottle);
    // sucrose 4 g/L × 0.5 = 2 g; base 2 g/L × 0.5 = 1 g. Fermentable 3.978 g, 7.956 g/L.
    expect(result.lines[0]).toMatchObject({ gramsPerBottle: 20, sugarToLiquidG: expect.closeTo(0.978, 6) });
    expect(result.carbonation.sugar.fermentableG).toBeCloseTo(3.978, 4);
    expect(result.carbonation.sugar.fermentableGPerL).toBeCloseTo(7.956, 3);
    expect(result.carbonation.findings.map((f) => f.code)).toContain('solids-in-bottle');
    expect(result.carbonation.pressures.map((p) => p.tempC)).toEqual([22, 4, 30]);
    // Cost by hand: 20 g × 6 per kg = 0.12 per bottle, 0.24 per litre.
    expect(result.cost.perBottle).toBeCloseTo(0.12, 10);
    expect(result.cost.perLitre).toBeCloseTo(0.24, 10);
  });

  it('counts only the extraction share when steeped and strained, and rolls up allergens', () => {
    const steeped = evaluateRecipe(
      content({
        lines: [
          { ingredientId: 1, amount: 40, unit: 'g-per-l', extractionPct: 50 },
          { ingredientId: 2, amount: 5, unit: 'g-per-bottle', extractionPct: 60 },
        ],
        process: {
          method: 'steep-strain',
          steepHours: 48,
          steepTempC: 4,
          strainLossPct: 10,
          carbonateHours: 72,
          carbonateTempC: 22,
          coldStoreTempC: 4,
        },
      }),
      bottle,
      facts,
      0.5,
    );
    // Strawberries 0.978 g × 50 % = 0.489 g; shortbread 5 g × 20 % × 60 % = 0.6 g.
    expect(steeped.lines.map((l) => l.sugarToLiquidG)).toEqual([expect.closeTo(0.489, 6), expect.closeTo(0.6, 6)]);
    expect(steeped.allergens).toEqual(['milk', 'wheat']);
    expect(steeped.carbonation.findings.map((f) => f.code)).not.toContain('solids-in-bottle');
  });

  it('gives no cost when an ingredient has none, and names it', () => {
    const result = evaluateRecipe(content(), bottle, new Map([[1, { ...strawberry, costPerKg: null }]]), 0.5);
    expect(result.cost).toEqual({ perBottle: null, perLitre: null, missing: ['Strawberries, raw'] });
  });
});

describe('diffRecipes', () => {
  it('lists ingredient amounts, sugar, process and bottle changes', () => {
    const a = { name: 'Rhubarb fool', content: content() };
    const b = {
      name: 'Rhubarb fool',
      content: content({
        lines: [
          { ingredientId: 1, amount: 45, unit: 'g-per-l', extractionPct: 50 },
          { ingredientId: 2, amount: 3, unit: 'g-per-bottle', extractionPct: 60 },
        ],
        sugars: [{ type: 'sucrose', gPerL: 5 }],
        bottleFormatId: 10,
      }),
    };
    const changes = diffRecipes(
      a,
      b,
      new Map([
        [1, 'Strawberries'],
        [2, 'Shortbread'],
      ]),
    );
    expect(changes).toEqual(
      expect.arrayContaining([
        { area: 'ingredients', what: 'Strawberries', before: '40 g per litre', after: '45 g per litre' },
        { area: 'ingredients', what: 'Shortbread added', before: null, after: '3 g per bottle' },
        { area: 'sugar', what: 'Sucrose (g/L)', before: 4, after: 5 },
        { area: 'bottle', what: 'Bottle format', before: 9, after: 10 },
      ]),
    );
    // In the designer's own words, never its field names.
    const process = diffRecipes(
      a,
      {
        ...a,
        content: content({
          targetVolumes: 3,
          process: { ...content().process, method: 'steep-strain', steepHours: 24 },
        }),
      },
      new Map(),
    );
    expect(process).toEqual(
      expect.arrayContaining([
        { area: 'targets', what: 'Target carbonation (volumes)', before: 2.5, after: 3 },
        {
          area: 'process',
          what: 'How the flavour goes in',
          before: 'In the bottle',
          after: 'Steep, strain, then carbonate',
        },
        { area: 'process', what: 'Steep for (h)', before: 0, after: 24 },
      ]),
    );
    expect(diffRecipes(a, a, new Map())).toEqual([]);
  });
});
