import fs from 'node:fs';
import path from 'node:path';

import { addedSugarShare, composeRecipe, type LabelIngredientFacts } from '@/lib/nutrition/composition';
import { panelDrawing } from '@/lib/nutrition/drawing';
import {
  declareAmount,
  declareCalories,
  declareCholesterol,
  declareFat,
  declareGramsToWhole,
  declareSodium,
  percentDailyValue,
  servingFor,
  servingsPerContainer,
} from '@/lib/nutrition/label-rules';
import { allergenStatement, buildNutrition, nutritionCsv, withLabValues } from '@/lib/nutrition/panel';
import { recipe, STRAWBERRY } from '@/tests/fixtures/nutrition';

const text = (d: { text: string }) => d.text;

describe('rounding by 21 CFR 101.9(c)', () => {
  it('calories, (c)(1): under 5 as 0, to 50 in 5s, above 50 in 10s', () => {
    expect(text(declareCalories(4.99))).toBe('0');
    expect(text(declareCalories(5))).toBe('5');
    expect(text(declareCalories(7.49))).toBe('5');
    expect(text(declareCalories(7.5))).toBe('10');
    expect(text(declareCalories(47))).toBe('45');
    expect(text(declareCalories(50))).toBe('50');
    // Above 50 the step is 10: 54.9 → 50, 55 → 60.
    expect(text(declareCalories(54.9))).toBe('50');
    expect(text(declareCalories(55))).toBe('60');
    expect(text(declareCalories(144))).toBe('140');
  });

  it('total, saturated and trans fat, (c)(2), (c)(2)(i), (c)(2)(ii): under 0.5 g as 0, under 5 g in 0.5 g, then 1 g', () => {
    expect(text(declareFat(0.49))).toBe('0 g');
    expect(text(declareFat(0.5))).toBe('0.5 g');
    expect(text(declareFat(0.74))).toBe('0.5 g');
    expect(text(declareFat(0.75))).toBe('1 g');
    expect(text(declareFat(4.74))).toBe('4.5 g');
    expect(text(declareFat(4.99))).toBe('5 g');
    expect(text(declareFat(5))).toBe('5 g');
    expect(text(declareFat(5.49))).toBe('5 g');
    expect(text(declareFat(5.5))).toBe('6 g');
    expect(text(declareAmount('transFat', 0.3))).toBe('0 g');
    expect(text(declareAmount('saturatedFat', 2.3))).toBe('2.5 g');
  });

  it('cholesterol, (c)(3): under 2 mg as 0, 2 to 5 mg "less than 5 mg", above 5 mg in 5 mg', () => {
    expect(text(declareCholesterol(1.99))).toBe('0 mg');
    expect(text(declareCholesterol(2))).toBe('less than 5 mg');
    expect(text(declareCholesterol(5))).toBe('less than 5 mg');
    expect(text(declareCholesterol(5.1))).toBe('5 mg');
    expect(text(declareCholesterol(7.5))).toBe('10 mg');
  });

  it('sodium, (c)(4): under 5 mg as 0, 5 to 140 mg in 5 mg, above 140 mg in 10 mg', () => {
    expect(text(declareSodium(4.99))).toBe('0 mg');
    expect(text(declareSodium(5))).toBe('5 mg');
    expect(text(declareSodium(7.5))).toBe('10 mg');
    expect(text(declareSodium(140))).toBe('140 mg');
    // 142 mg is above 140, so the 10 mg step: 140; 145 → 150.
    expect(text(declareSodium(142))).toBe('140 mg');
    expect(text(declareSodium(145))).toBe('150 mg');
  });

  it('carbohydrate, fiber, sugars, added sugars (c)(6) and protein (c)(7): under 0.5 g as 0, under 1 g "less than 1 g"', () => {
    expect(text(declareGramsToWhole(0.49))).toBe('0 g');
    expect(text(declareGramsToWhole(0.5))).toBe('less than 1 g');
    expect(text(declareGramsToWhole(0.99))).toBe('less than 1 g');
    expect(text(declareGramsToWhole(1))).toBe('1 g');
    expect(text(declareGramsToWhole(1.49))).toBe('1 g');
    expect(text(declareGramsToWhole(1.5))).toBe('2 g');
    for (const n of ['totalCarbohydrate', 'dietaryFiber', 'totalSugars', 'addedSugars', 'protein'] as const)
      expect(text(declareAmount(n, 0.7))).toBe('less than 1 g');
  });

  it('vitamins and minerals: under 2 % of the RDI as 0 ((c)(8)(iii)); then 0.1 for RDIs under 25, 10 mg for 250 and over (FDA guidance 2019)', () => {
    // Vitamin D RDI 20 mcg: 2 % is 0.4 mcg.
    expect(text(declareAmount('vitaminD', 0.39))).toBe('0 mcg');
    expect(text(declareAmount('vitaminD', 0.44))).toBe('0.4 mcg');
    // Iron RDI 18 mg: 2 % is 0.36 mg.
    expect(text(declareAmount('iron', 0.35))).toBe('0 mg');
    expect(text(declareAmount('iron', 1.26))).toBe('1.3 mg');
    // Calcium RDI 1,300 mg: 2 % is 26 mg. Potassium RDI 4,700 mg: 2 % is 94 mg.
    expect(text(declareAmount('calcium', 25.9))).toBe('0 mg');
    expect(text(declareAmount('calcium', 26))).toBe('30 mg');
    expect(text(declareAmount('potassium', 93.9))).toBe('0 mg');
    expect(text(declareAmount('potassium', 264))).toBe('260 mg');
  });
});

describe('% Daily Value', () => {
  const dv = (n: Parameters<typeof percentDailyValue>[0], amount: number) =>
    percentDailyValue(n, amount, declareAmount(n, amount));

  it('macronutrients to the nearest 1 % of the declared amount, 101.9(d)(7)(ii), with the DRVs of (c)(9)', () => {
    // Total carbohydrate 14 g declared: 14 / 275 = 5.09 % → 5 %.
    expect(dv('totalCarbohydrate', 13.8)).toBe('5%');
    // Sodium 2,300 mg DRV: 140 mg declared → 6.09 % → 6 %.
    expect(dv('sodium', 141)).toBe('6%');
    // Added sugars 50 g DRV: 12 g → 24 %.
    expect(dv('addedSugars', 12.2)).toBe('24%');
    // Fat 78 g: 0 g declared (0.4 g actual) → 0 %, beside "0 g".
    expect(dv('totalFat', 0.4)).toBe('0%');
    // "less than 1 g" of fiber: the actual 0.7 g / 28 g = 2.5 % → 3 %.
    expect(dv('dietaryFiber', 0.7)).toBe('3%');
  });

  it('none for calories, trans fat, total sugars and protein', () => {
    for (const n of ['calories', 'transFat', 'totalSugars', 'protein'] as const) expect(dv(n, 10)).toBeNull();
  });

  it('vitamins and minerals by (c)(8)(iii): 2 % steps to 10 %, 5 % steps to 50 %, then 10 % steps', () => {
    // Calcium RDI 1,300 mg.
    expect(dv('calcium', 25)).toBe('0%'); // 1.9 %
    expect(dv('calcium', 39)).toBe('4%'); // 3.0 % → 4 % (2 % step, half up)
    expect(dv('calcium', 130)).toBe('10%'); // exactly 10 %
    expect(dv('calcium', 150)).toBe('10%'); // 11.5 % → 10 % (5 % step)
    expect(dv('calcium', 650)).toBe('50%'); // exactly 50 %
    expect(dv('calcium', 700)).toBe('50%'); // 53.8 % → 50 % (10 % step)
    expect(dv('calcium', 715)).toBe('60%'); // 55 % → 60 %
  });
});

describe('serving size by 21 CFR 101.12(b) and 101.9(b)', () => {
  it('a container under 200 % of the 360 mL reference amount is one serving, 101.9(b)(6)', () => {
    // 199 % of 360 mL = 716.4 mL.
    const s = servingFor(716.4);
    expect(s).toMatchObject({
      servingMl: 716.4,
      servingsPerContainer: 1,
      layout: 'single-serving',
      household: '1 bottle',
    });
    expect(servingFor(473)).toMatchObject({
      household: '1 bottle',
      metric: '473 mL',
      servingsText: '1 serving per container',
    });
  });

  it('from 200 % up to and including 300 % two columns, per serving and per container, 101.9(b)(12)(i)', () => {
    // 200 % = 720 mL: 2 servings of 12 fl oz (1 fl oz = 30 mL, 101.9(b)(5)(viii)).
    expect(servingFor(720)).toMatchObject({
      servingMl: 360,
      servingsPerContainer: 2,
      servingsText: '2 servings per container',
      household: '12 fl oz',
      metric: '360 mL',
      layout: 'dual-column',
    });
    // 300 % = 1,080 mL: still two columns.
    expect(servingFor(1080)).toMatchObject({ servingsPerContainer: 3, layout: 'dual-column' });
    // Above 300 %: per serving only.
    expect(servingFor(1081)).toMatchObject({ layout: 'per-serving' });
  });

  it('servings per container by 101.9(b)(8): nearest 0.5 from 2 to 5, nearest whole above, "about" when rounded', () => {
    // 750 mL / 360 mL = 2.083 → 2.
    expect(servingsPerContainer(750 / 360)).toEqual({ value: 2, text: 'about 2 servings per container' });
    expect(servingsPerContainer(2.3)).toEqual({ value: 2.5, text: 'about 2.5 servings per container' });
    expect(servingsPerContainer(5.6)).toEqual({ value: 6, text: 'about 6 servings per container' });
    expect(servingsPerContainer(3)).toEqual({ value: 3, text: '3 servings per container' });
  });
});

describe('added sugars by FDA’s definition, 21 CFR 101.9(c)(6)(iii)', () => {
  const facts = (over: Partial<LabelIngredientFacts>) =>
    ({ name: 'x', category: 'fruit', house: false, sugarsG: 10, addedSugarsG: null, ...over }) as LabelIngredientFacts;

  it('a fruit’s own sugars are not added; honey, syrups and table sugar are', () => {
    expect(addedSugarShare(facts({ name: 'Strawberries, raw' })).share).toBe(0);
    expect(addedSugarShare(facts({ name: 'Orange juice, raw', category: 'juice' })).share).toBe(0);
    expect(addedSugarShare(facts({ name: 'Honey', category: 'sugar-syrup' })).share).toBe(1);
    expect(addedSugarShare(facts({ name: 'Syrups, maple', category: 'sugar-syrup' })).share).toBe(1);
  });

  it('sweetened fruit and concentrates not diluted back count all their sugars (the dataset does not split them)', () => {
    expect(addedSugarShare(facts({ name: 'Strawberries, frozen, sweetened, sliced' })).share).toBe(1);
    expect(addedSugarShare(facts({ name: 'Strawberries, frozen, unsweetened' })).share).toBe(0);
    const concentrate = 'Orange juice, frozen concentrate, unsweetened, undiluted';
    expect(addedSugarShare(facts({ name: concentrate, category: 'juice' })).share).toBe(1);
    const diluted = 'Orange juice, frozen concentrate, unsweetened, diluted with 3 volume water';
    expect(addedSugarShare(facts({ name: diluted, category: 'juice' })).share).toBe(0);
  });

  it('a house ingredient follows its label, and counts all its sugars when the label value is missing', () => {
    expect(addedSugarShare(facts({ house: true, sugarsG: 40, addedSugarsG: 10 })).share).toBe(0.25);
    expect(addedSugarShare(facts({ house: true, sugarsG: 40, addedSugarsG: null })).share).toBe(1);
  });
});

describe('allergen statement', () => {
  it('lists the major allergens in the order they appear', () => {
    expect(allergenStatement(['wheat', 'milk'])).toBe('Contains: Wheat, Milk');
    expect(allergenStatement(['tree-nuts', 'sesame'])).toBe('Contains: Tree nuts, Sesame');
    expect(allergenStatement([])).toBeNull();
  });
});

describe('a recipe’s panel, worked by hand from SR25 values', () => {
  const composition = composeRecipe(recipe(), 355, new Map([[1, STRAWBERRY]]));

  it('as formulated, per litre', () => {
    const c = composition.asFormulated;
    // Sugars: base 2 + sucrose 10 + strawberries 60 × 4.89 / 100 = 2.934 → 14.934 g/L; added: base 2 + sucrose 10.
    expect(c.totalSugars).toBeCloseTo(14.934, 6);
    expect(c.addedSugars).toBeCloseTo(12, 6);
    // Carbohydrate: 2 + max(10, 10 × 0.9998) + 60 × 7.68 / 100 = 4.608 → 16.608 g/L.
    expect(c.totalCarbohydrate).toBeCloseTo(16.608, 6);
    expect(c.dietaryFiber).toBeCloseTo(1.2, 6); // 60 × 2.0 / 100
    expect(c.protein).toBeCloseTo(0.402, 6); // 60 × 0.67 / 100
    expect(c.totalFat).toBeCloseTo(0.18, 6); // 60 × 0.30 / 100
    expect(c.sodium).toBeCloseTo(0.7, 6); // sucrose 10 × 1 / 100 + strawberries 60 × 1 / 100
    expect(c.potassium).toBeCloseTo(92, 6); // 10 × 2 / 100 + 60 × 153 / 100
    // Alcohol of the base: 0.2 % ABV × 10 × 0.78924 g/mL (CRC, ethanol at 20 °C) = 1.57848 g/L.
    expect(c.alcoholG).toBeCloseTo(1.57848, 6);
    // Calories: 4 × (0.402 + 16.608) + 9 × 0.18 + 7 × 1.57848 = 68.04 + 1.62 + 11.04936 = 80.70936 kcal/L.
    expect(c.calories).toBeCloseTo(80.70936, 5);
    expect(composition.missing.transFat).toEqual(['Strawberries']);
  });

  it('after conditioning: all fermentable sugar fermented at the theoretical yield', () => {
    const c = composition.afterConditioning;
    // Fermentable: 2 + 10 + 2.934 = 14.934 g/L, counted as sucrose (C12H22O11 + H2O → 4 C2H5OH + 4 CO2):
    // M(sucrose) = 12 × 12.011 + 22 × 1.008 + 11 × 15.999 = 342.297; M(ethanol) = 2 × 12.011 + 6 × 1.008 + 15.999 = 46.069;
    // ethanol = 14.934 × 4 × 46.069 / 342.297 = 8.03973 g/L.
    expect(composition.fermentedSugarGPerL).toBeCloseTo(14.934, 6);
    expect(composition.ethanolFormedGPerL).toBeCloseTo(8.03973, 4);
    expect(c.totalSugars).toBeCloseTo(0, 6);
    expect(c.addedSugars).toBeCloseTo(0, 6);
    expect(c.totalCarbohydrate).toBeCloseTo(1.674, 6); // 16.608 − 14.934
    expect(c.alcoholG).toBeCloseTo(9.61821, 4); // 1.57848 + 8.03973
    // 4 × (0.402 + 1.674) + 9 × 0.18 + 7 × 9.61821 = 8.304 + 1.62 + 67.32747 = 77.25147 kcal/L.
    expect(c.calories).toBeCloseTo(77.25147, 3);
  });

  it('declares a 355 mL bottle (98.6 % of the reference amount) as one serving', () => {
    const answer = buildNutrition({
      recipeId: 1,
      version: 1,
      recipeName: 'Test',
      bottleName: '355 mL',
      containerMl: 355,
      serving: servingFor(355),
      servingAskedMl: null,
      composition,
      steeped: false,
      allergens: [],
      lab: null,
      abvLimitPercent: 0.5,
    });
    // × 0.355 L: calories 80.70936 → 28.65 → 30 (5-calorie steps to 50); carbohydrate 5.896 g → 6 g, 6/275 = 2 %;
    // sugars 5.302 g → 5 g; added 4.26 g → 4 g, 4/50 = 8 %; fiber 0.426 g → 0 g; protein 0.143 g → 0 g;
    // fat 0.064 g → 0 g; sodium 0.25 mg → 0 mg; potassium 32.7 mg (0.7 % of 4,700) → 0 mg, 0 %.
    expect(answer.asFormulated.label).toMatchObject({
      calories: '30',
      totalCarbohydrate: '6 g',
      totalSugars: '5 g',
      addedSugars: '4 g',
      dietaryFiber: '0 g',
      protein: '0 g',
      totalFat: '0 g',
      sodium: '0 mg',
      potassium: '0 mg',
    });
    expect(answer.asFormulated.percentDailyValue).toMatchObject({ totalCarbohydrate: '2%', addedSugars: '8%' });
    // After: 77.25147 × 0.355 = 27.42 → 25; carbohydrate 1.674 × 0.355 = 0.594 g → "less than 1 g".
    expect(answer.afterConditioning.label).toMatchObject({
      calories: '25',
      totalCarbohydrate: 'less than 1 g',
      totalSugars: '0 g',
      addedSugars: '0 g',
    });
    // 9.61821 g/L / 0.78924 / 10 = 1.2187 % ABV: over the 0.5 % line, which the notes say.
    expect(answer.abvPercent.afterConditioning).toBeCloseTo(1.22, 2);
    expect(answer.notes.join(' ')).toMatch(/alcohol beverage rules/);
    expect(answer.perContainer).toBeUndefined();
    expect(panelDrawing(answer, 'afterConditioning').width).toBe(260);
  });

  it('a steeped line counts every nutrient at its share reaching the liquid', () => {
    const steeped = composeRecipe(
      recipe({ process: { ...recipe().process, method: 'steep-strain' } }),
      355,
      new Map([[1, STRAWBERRY]]),
    );
    // 50 % of 60 g/L: potassium 30 × 153 / 100 + 0.2 = 46.1 mg/L; sugars 2 + 10 + 1.467 = 13.467 g/L.
    expect(steeped.asFormulated.potassium).toBeCloseTo(46.1, 6);
    expect(steeped.asFormulated.totalSugars).toBeCloseTo(13.467, 6);
  });

  it('the base’s residual sugar is declared as added unless the base says how much of it is', () => {
    const c = composeRecipe(
      recipe({ baseBrew: { ...recipe().baseBrew, residualAddedSugarGPerL: 0.5 }, sugars: [] }),
      355,
      new Map([[1, STRAWBERRY]]),
    );
    expect(c.asFormulated.addedSugars).toBeCloseTo(0.5, 6);
  });

  it('a 750 mL bottle (208 %) gets two columns, and lab values replace the estimate', () => {
    const big = composeRecipe(recipe(), 750, new Map([[1, STRAWBERRY]]));
    const lab = {
      per100Ml: { totalSugars: 0.4, totalCarbohydrate: 0.6 },
      reference: 'Lab 1',
      enteredBy: null,
      enteredAt: '',
    };
    const answer = buildNutrition({
      recipeId: 1,
      version: 1,
      recipeName: 'Test',
      bottleName: '750 mL',
      containerMl: 750,
      serving: servingFor(750),
      servingAskedMl: null,
      composition: big,
      steeped: false,
      allergens: ['wheat'],
      lab,
      abvLimitPercent: 0.5,
    });
    expect(answer.serving.layout).toBe('dual-column');
    expect(answer.perContainer).toBeDefined();
    expect(answer.declared).toBe('lab');
    // 0.4 g per 100 mL × 3.6 = 1.44 g per 360 mL → 1 g; the container 0.4 × 7.5 = 3 g.
    expect(answer.lab!.label.totalSugars).toBe('1 g');
    expect(answer.perContainer!.lab!.label.totalSugars).toBe('3 g');
    expect(answer.lab!.fromLab).toEqual(['totalCarbohydrate', 'totalSugars']);
    // Calories not given by the lab are worked out again: the estimate's protein, fat and alcohol, the lab's carbohydrate.
    const merged = withLabValues(big.afterConditioning, lab.per100Ml);
    expect(merged.calories).toBeCloseTo(4 * (0.402 + 6) + 9 * 0.18 + 7 * 9.61821, 3);
    expect(answer.allergenStatement).toBe('Contains: Wheat');
    const csv = nutritionCsv(answer).split('\r\n');
    expect(csv[0]).toBe(
      'basis,nutrient,unit,per_100_ml,per_serving,declared_per_serving,percent_dv_per_serving,per_container,declared_per_container,percent_dv_per_container',
    );
    expect(csv).toContain('lab,Total Sugars,g,0.4,1.44,1 g,,3,3 g,');
    expect(panelDrawing(answer, 'lab').width).toBe(380);
  });
});

const SR = path.resolve(__dirname, '../../../shared/data/usda-sr25/ABBREV.txt');
const haveSr = fs.existsSync(SR);
(haveSr ? describe : describe.skip)('the SR25 values used above (skipped without ../shared/data/usda-sr25)', () => {
  it('match ABBREV.txt', () => {
    const rows = new Map(
      fs
        .readFileSync(SR, 'latin1')
        .split(/\r?\n/)
        .map((l) => l.split('^').map((f) => f.replace(/^~|~$/g, '')))
        .map((f) => [f[0], f] as const),
    );
    const s = rows.get('09316')!;
    expect([s[7], s[8], s[9], s[4], s[5], s[44], s[10], s[11], s[14], s[15]].map(Number)).toEqual([
      7.68, 2, 4.89, 0.67, 0.3, 0.015, 16, 0.41, 153, 1,
    ]);
    const sugar = rows.get('19335')!;
    expect([sugar[7], sugar[15], sugar[14], sugar[10], sugar[11]].map(Number)).toEqual([99.98, 1, 2, 1, 0.05]);
  });
});
