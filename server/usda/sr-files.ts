import fs from 'node:fs';
import path from 'node:path';

import {
  type Allergen,
  type Category,
  DEFAULT_FERMENTABLE_SHARE,
  DEFAULT_STEEP_SHARE,
  type Measure,
} from '@/lib/ingredients';

/**
 * Reader for the USDA National Nutrient Database for Standard Reference, Release 25, in its "abbreviated" ASCII
 * form: fields separated by ^, text enclosed in ~, one record per line. Values are per 100 g of edible portion; an
 * empty field means "not measured", which stays null here rather than becoming 0.
 */
export const SR_DATASET = 'USDA SR25';

export interface SrFood {
  record: string;
  name: string;
  foodGroup: string;
  branded: boolean;
  energyKcal: number | null;
  proteinG: number | null;
  fatG: number | null;
  carbohydrateG: number | null;
  fibreG: number | null;
  sugarsG: number | null;
  saturatedFatG: number | null;
  cholesterolMg: number | null;
  sodiumMg: number | null;
  vitaminDMcg: number | null;
  calciumMg: number | null;
  ironMg: number | null;
  potassiumMg: number | null;
  measures: Measure[];
}

export class NotSrFolderError extends Error {}

const REQUIRED = ['FOOD_DES.txt', 'ABBREV.txt', 'WEIGHT.txt'];
const LINE = /^~\d{5}~\^/;

function fields(line: string): string[] {
  return line.split('^').map((field) => field.replace(/^~|~$/g, ''));
}

function readLines(file: string): string[] {
  return fs
    .readFileSync(file, 'latin1')
    .split(/\r?\n/)
    .filter((line) => line.length > 0);
}

const num = (text: string | undefined): number | null => (text === undefined || text === '' ? null : Number(text));

/** Checks that `folder` holds the SR abbreviated files; throws NotSrFolderError saying what is missing. */
export function assertSrFolder(folder: string): void {
  if (!fs.existsSync(folder) || !fs.statSync(folder).isDirectory())
    throw new NotSrFolderError(`${folder} is not a folder.`);
  const missing = REQUIRED.filter((name) => !fs.existsSync(path.join(folder, name)));
  if (missing.length > 0)
    throw new NotSrFolderError(`${folder} is not a USDA SR folder: ${missing.join(', ')} missing.`);
  for (const name of REQUIRED) {
    const fd = fs.openSync(path.join(folder, name), 'r');
    const buffer = Buffer.alloc(200);
    fs.readSync(fd, buffer, 0, 200, 0);
    fs.closeSync(fd);
    if (!LINE.test(buffer.toString('latin1')))
      throw new NotSrFolderError(`${name} in ${folder} is not in the SR format (~NDB_No~^...).`);
  }
}

/** Every food of the SR files, with its household measures. */
export function readSrFoods(folder: string): SrFood[] {
  assertSrFolder(folder);
  const values = new Map<string, string[]>();
  for (const line of readLines(path.join(folder, 'ABBREV.txt'))) {
    const f = fields(line);
    values.set(f[0], f);
  }
  const measures = new Map<string, Measure[]>();
  for (const line of readLines(path.join(folder, 'WEIGHT.txt'))) {
    const [record, , amount, description, grams] = fields(line);
    const list = measures.get(record) ?? [];
    list.push({ label: `${Number(amount)} ${description}`, grams: Number(grams) });
    measures.set(record, list);
  }
  const foods: SrFood[] = [];
  for (const line of readLines(path.join(folder, 'FOOD_DES.txt'))) {
    const [record, foodGroup, longDesc, , , manufacturer] = fields(line);
    const v = values.get(record);
    if (!v) continue;
    foods.push({
      record,
      name: longDesc,
      foodGroup,
      branded: manufacturer !== '',
      energyKcal: num(v[3]),
      proteinG: num(v[4]),
      fatG: num(v[5]),
      carbohydrateG: num(v[7]),
      fibreG: num(v[8]),
      sugarsG: num(v[9]),
      // ABBREV.txt columns (0-based): 10 Calcium, 11 Iron, 14 Potassium, 15 Sodium (mg), 41 Vit_D_mcg, 44 FA_Sat (g),
      // 47 Cholestrl (mg), as the SR25 documentation lists them.
      calciumMg: num(v[10]),
      ironMg: num(v[11]),
      potassiumMg: num(v[14]),
      sodiumMg: num(v[15]),
      vitaminDMcg: num(v[41]),
      saturatedFatG: num(v[44]),
      cholesterolMg: num(v[47]),
      measures: measures.get(record) ?? [],
    });
  }
  return foods;
}

const has = (name: string, ...words: string[]) => words.some((w) => new RegExp(`\\b${w}`, 'i').test(name));

/** Our category for an SR food, from its food group and name. */
export function categoryOf(food: Pick<SrFood, 'name' | 'foodGroup'>): Category {
  const { name, foodGroup } = food;
  if (foodGroup === '0100') return 'dairy';
  if (foodGroup === '0900') {
    if (has(name, 'juice', 'nectar')) return 'juice';
    if (has(name, 'puree', 'purée', 'sauce')) return 'puree';
    if (has(name, 'dried', 'dehydrated', 'raisins', 'prunes', 'dates')) return 'dried-fruit';
    return 'fruit';
  }
  if (foodGroup === '0200') {
    return has(
      name,
      'basil',
      'mint',
      'spearmint',
      'peppermint',
      'rosemary',
      'thyme',
      'sage',
      'dill',
      'parsley',
      'tarragon',
      'chervil',
      'marjoram',
      'oregano',
      'savory',
      'bay',
      'lavender',
    )
      ? 'herb'
      : 'spice';
  }
  // "No sugar added" ice cream is a sweet, not a sugar: judge by what the food is (its first word), or a syrup.
  if (foodGroup === '1900' && (/^(sugars?|syrups?|honey|molasses|sweeteners?)\b/i.test(name) || has(name, 'syrup')))
    return 'sugar-syrup';
  if (foodGroup === '1800' || foodGroup === '1900') return 'baked-good';
  if (has(name, 'juice')) return 'juice';
  if (has(name, 'ginger root', 'horseradish')) return 'spice';
  if (has(name, 'lemon grass', 'lemongrass')) return 'herb';
  return 'other';
}

/** The US major allergens a food's name or group points to (a first guess: a developer checks the label). */
export function allergensOf(food: Pick<SrFood, 'name' | 'foodGroup'>): Allergen[] {
  const { name, foodGroup } = food;
  const found = new Set<Allergen>();
  if (foodGroup === '0100' || has(name, 'milk', 'butter', 'cream', 'cheese', 'yogurt', 'whey')) found.add('milk');
  if (foodGroup === '0100' && has(name, 'egg')) found.add('eggs');
  if (has(name, 'egg')) found.add('eggs');
  if (foodGroup === '1500' && !has(name, 'crustaceans', 'shrimp', 'crab', 'lobster', 'crayfish')) found.add('fish');
  if (has(name, 'shrimp', 'crab', 'lobster', 'crayfish', 'crustaceans')) found.add('crustacean-shellfish');
  if (
    has(
      name,
      'almond',
      'walnut',
      'pecan',
      'hazelnut',
      'filbert',
      'cashew',
      'pistachio',
      'macadamia',
      'brazilnut',
      'pine nut',
    )
  )
    found.add('tree-nuts');
  if (has(name, 'peanut')) found.add('peanuts');
  if (foodGroup === '1800' || has(name, 'wheat', 'flour', 'bread', 'cookie', 'cake', 'pie', 'cracker'))
    found.add('wheat');
  if (has(name, 'soy')) found.add('soybeans');
  if (has(name, 'sesame', 'tahini')) found.add('sesame');
  return [...found].sort();
}

/** The ingredient row an SR food becomes. */
export function ingredientFromSr(food: SrFood) {
  const category = categoryOf(food);
  return {
    name: food.name,
    category,
    energyKcal: food.energyKcal,
    carbohydrateG: food.carbohydrateG,
    sugarsG: food.sugarsG,
    fibreG: food.fibreG,
    fatG: food.fatG,
    proteinG: food.proteinG,
    saturatedFatG: food.saturatedFatG,
    // Trans fat is in SR25's full nutrient file only, not the abbreviated one; added sugars are not in SR25 at all.
    transFatG: null as number | null,
    cholesterolMg: food.cholesterolMg,
    sodiumMg: food.sodiumMg,
    addedSugarsG: null as number | null,
    vitaminDMcg: food.vitaminDMcg,
    calciumMg: food.calciumMg,
    ironMg: food.ironMg,
    potassiumMg: food.potassiumMg,
    fermentableShare: DEFAULT_FERMENTABLE_SHARE[category],
    steepShare: DEFAULT_STEEP_SHARE[category],
    allergens: allergensOf(food),
    measures: food.measures,
    costPerKg: null,
    notes:
      category === 'dairy'
        ? 'Milk sugar is lactose, which brewing yeasts do not ferment: it sweetens but makes no fizz.'
        : null,
    sourceDataset: SR_DATASET,
    sourceRecord: food.record,
  };
}
export type DatasetIngredient = ReturnType<typeof ingredientFromSr>;
