import { type CarbonationInput, computeCarbonation } from '@/lib/chemistry/carbonation';
import { ingredientContribution, type IngredientNutrients } from '@/lib/recipes/ingredient-sugar';

// USDA SR25 (ABBREV.txt), per 100 g: strawberries, raw (NDB 09316) sugars 4.89 g, carbohydrate 7.68 g, fibre 2.0 g,
// fat 0.30 g; cookies, shortbread, commercially prepared, plain (NDB 18192) sugars 15.06 g, carbohydrate 64.50 g,
// fibre 1.8 g, fat 24.10 g.
const strawberry: IngredientNutrients = {
  name: 'Strawberries',
  sugarsG: 4.89,
  carbohydrateG: 7.68,
  fibreG: 2.0,
  fatG: 0.3,
  fermentableShare: 1,
};
const shortbread: IngredientNutrients = {
  name: 'Shortbread',
  sugarsG: 15.06,
  carbohydrateG: 64.5,
  fibreG: 1.8,
  fatG: 24.1,
  fermentableShare: 1,
};

describe('ingredientContribution', () => {
  it('counts all of the sugar in the bottle, and when steeped the share in the expected case but all of it in the worst', () => {
    // By hand: 40 g strawberries × 4.89 / 100 = 1.956 g of sugars; steeped at 50 %, 0.978 g expected.
    expect(ingredientContribution(strawberry, 40, { inBottle: true, extractionShare: 0.5 })).toMatchObject({
      sugarG: 1.956,
      worstSugarG: 1.956,
    });
    const steeped = ingredientContribution(strawberry, 40, { inBottle: false, extractionShare: 0.5 });
    expect(steeped.sugarG).toBeCloseTo(0.978, 6);
    expect(steeped.worstSugarG).toBeCloseTo(1.956, 6);
  });

  it('counts fat whether steeped or in the bottle', () => {
    // By hand: 10 g shortbread × 24.10 / 100 = 2.41 g of fat either way.
    expect(ingredientContribution(shortbread, 10, { inBottle: false, extractionShare: 0.6 }).fatG).toBeCloseTo(2.41, 6);
    expect(ingredientContribution(shortbread, 10, { inBottle: true, extractionShare: 0.6 }).fatG).toBeCloseTo(2.41, 6);
  });

  it('takes available carbohydrate when sugars are not measured, and marks a line with neither as unknown', () => {
    // Shortbread with its sugar figure missing: 64.50 − 1.8 = 62.7 g per 100 g; 10 g bring 6.27 g.
    const estimated = ingredientContribution({ ...shortbread, sugarsG: null }, 10, {
      inBottle: true,
      extractionShare: 1,
    });
    expect(estimated.sugarG).toBeCloseTo(6.27, 6);
    expect(estimated.sugarBasis).toBe('available-carbohydrate');
    expect(
      ingredientContribution({ ...shortbread, sugarsG: null, carbohydrateG: null }, 10, {
        inBottle: true,
        extractionShare: 1,
      }).sugarBasis,
    ).toBe('unknown');
  });
});

describe('findings from the ingredient lines', () => {
  const base: CarbonationInput = {
    liquidMl: 500,
    headspaceMl: 25,
    sugars: [],
    ingredients: [],
    residualCo2Volumes: 0,
    sealedTempC: 20,
    temperaturesC: [20],
    maxWorkingPressureBar: 6,
    baseAbvPercent: 0,
    yield: 'worst',
    abvLimitPercent: 0.5,
  };
  const codes = (ingredients: CarbonationInput['ingredients']) =>
    computeCarbonation({ ...base, ingredients }).findings.map((f) => `${f.level}:${f.code}`);

  it('judge a steeped line by all of its sugar', () => {
    // 100 g strawberries steeped at 10 %: the worst case counts 4.89 g (9.78 g/L), the expected 0.489 g.
    const result = computeCarbonation({
      ...base,
      ingredients: [ingredientContribution(strawberry, 100, { inBottle: false, extractionShare: 0.1 })],
    });
    expect(result.sugar.fromIngredientsG).toBeCloseTo(4.89, 3);
    expect(result.cases.expected.co2.fromSugarVolumes).toBeLessThan(result.cases.worst.co2.fromSugarVolumes / 9);
  });

  it('give the rancidity caution for steeped fat, a caution for estimated sugar and a danger for unknown sugar', () => {
    expect(codes([ingredientContribution(shortbread, 10, { inBottle: false, extractionShare: 0.6 })])).toContain(
      'caution:fatty-ingredients',
    );
    expect(
      codes([ingredientContribution({ ...shortbread, sugarsG: null }, 10, { inBottle: false, extractionShare: 0.6 })]),
    ).toContain('caution:sugar-estimated');
    expect(
      codes([
        ingredientContribution({ ...shortbread, sugarsG: null, carbohydrateG: null }, 10, {
          inBottle: false,
          extractionShare: 0.6,
        }),
      ]),
    ).toContain('danger:sugar-unknown');
  });
});
