import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { Op } from 'sequelize';

import { LABEL_NUTRIENT_FIELDS } from '@/lib/ingredients';
import { Ingredient, prepareDatabase, sequelize } from '@/server/db';
import { seedIngredientsIfEmpty } from '@/server/seed/ingredients';
import { loadStarterIngredients, STARTER_RECORDS } from '@/server/seed/starter-ingredients';
import { datasetIngredientCount, importDatasetIngredients, searchIngredients } from '@/server/services/ingredients';
import type { AuthContext } from '@/server/services/sessions';
import { assertSrFolder, ingredientFromSr, NotSrFolderError, readSrFoods } from '@/server/usda/sr-files';

/** A signed-in person of no brewery: sees the dataset only. */
const nobody: AuthContext = { userId: 0, organisationId: 0, role: 'owner' };

const SHARED = path.resolve(__dirname, '../../../shared/data/usda-sr25');
const sharedPresent = fs.existsSync(path.join(SHARED, 'FOOD_DES.txt'));

/** A tiny dataset in the SR25 abbreviated format (fields ^, text ~, CRLF), written by the test itself. */
function writeFixture(dir: string, strawberrySugar = '4.89') {
  const food = (no: string, group: string, name: string, maker = '') =>
    `~${no}~^~${group}~^~${name}~^~${name.toUpperCase()}~^~~^~${maker}~^~~^~~^0^~~^6.25^^^`;
  const abbrev = (no: string, sugar: string, fat: string) =>
    `~${no}~^~X~^90.95^32^0.67^${fat}^0.40^7.68^2.0^${sugar}^16^0.41`;
  fs.writeFileSync(
    path.join(dir, 'FOOD_DES.txt'),
    [
      food('09316', '0900', 'Strawberries, raw'),
      food('02010', '0200', 'Spices, cinnamon, ground'),
      food('19999', '1900', 'Candy bar, branded', 'A Maker'),
    ].join('\r\n') + '\r\n',
    'latin1',
  );
  fs.writeFileSync(
    path.join(dir, 'ABBREV.txt'),
    [abbrev('09316', strawberrySugar, '0.30'), abbrev('02010', '2.17', '1.24'), abbrev('19999', '50', '20')].join(
      '\r\n',
    ) + '\r\n',
    'latin1',
  );
  fs.writeFileSync(
    path.join(dir, 'WEIGHT.txt'),
    ['~09316~^1^1^~cup, halves~^152^^', '~09316~^2^1^~medium (1-1/4" dia)~^12^^', '~02010~^1^1^~tsp~^2.6^^'].join(
      '\r\n',
    ) + '\r\n',
    'latin1',
  );
}

let dir: string;
beforeAll(async () => {
  await prepareDatabase();
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'fizzwright-sr-'));
});
afterAll(async () => {
  fs.rmSync(dir, { recursive: true, force: true });
  await sequelize.close();
});

describe('reading the SR25 format', () => {
  it('reads foods, values per 100 g and household measures, and marks branded rows', () => {
    writeFixture(dir);
    const foods = readSrFoods(dir);
    expect(foods).toHaveLength(3);
    expect(foods[0]).toMatchObject({
      record: '09316',
      name: 'Strawberries, raw',
      foodGroup: '0900',
      branded: false,
      sugarsG: 4.89,
      fatG: 0.3,
      energyKcal: 32,
    });
    expect(foods[0].measures).toEqual([
      { label: '1 cup, halves', grams: 152 },
      { label: '1 medium (1-1/4" dia)', grams: 12 },
    ]);
    expect(foods[2].branded).toBe(true);
    // Calcium and iron are the 11th and 12th fields of ABBREV.txt; the fixture stops there, so the label nutrients
    // after them were not measured: null, never zero. Trans fat and added sugars are not in the abbreviated file.
    expect(ingredientFromSr(foods[0])).toMatchObject({
      calciumMg: 16,
      ironMg: 0.41,
      sodiumMg: null,
      potassiumMg: null,
      transFatG: null,
      addedSugarsG: null,
    });
    expect(ingredientFromSr(foods[1])).toMatchObject({
      category: 'spice',
      sourceDataset: 'USDA SR25',
      sourceRecord: '02010',
    });
  });

  it('says clearly when a folder is not in that format', () => {
    expect(() => assertSrFolder(path.join(dir, 'nope'))).toThrow(NotSrFolderError);
    const other = fs.mkdtempSync(path.join(os.tmpdir(), 'fizzwright-not-sr-'));
    fs.writeFileSync(path.join(other, 'FOOD_DES.txt'), 'name,sugar\nstrawberry,4.89\n');
    expect(() => assertSrFolder(other)).toThrow(/ABBREV.txt, WEIGHT.txt missing/);
    fs.writeFileSync(path.join(other, 'ABBREV.txt'), 'x');
    fs.writeFileSync(path.join(other, 'WEIGHT.txt'), 'x');
    expect(() => assertSrFolder(other)).toThrow(/not in the SR format/);
    fs.rmSync(other, { recursive: true, force: true });
  });
});

describe('importDatasetIngredients', () => {
  it('imports, then changes nothing on a second run, then updates what changed', async () => {
    writeFixture(dir);
    const rows = () =>
      readSrFoods(dir)
        .filter((f) => !f.branded)
        .map(ingredientFromSr);
    expect(await importDatasetIngredients(rows())).toEqual({ created: 2, updated: 0, unchanged: 0 });
    expect(await importDatasetIngredients(rows())).toEqual({ created: 0, updated: 0, unchanged: 2 });
    writeFixture(dir, '5.10');
    expect(await importDatasetIngredients(rows())).toEqual({ created: 0, updated: 1, unchanged: 1 });
    expect((await Ingredient.findOne({ where: { sourceRecord: '09316' } }))?.sugarsG).toBe(5.1);
    expect(await datasetIngredientCount()).toBe(2);
  });
});

describe('a library imported before the label nutrients', () => {
  it('is filled in again once at start, and left alone after that', async () => {
    await Ingredient.destroy({ where: {} });
    const old = loadStarterIngredients().map((row) => ({
      ...row,
      ...Object.fromEntries(LABEL_NUTRIENT_FIELDS.map((f) => [f, null])),
    }));
    await importDatasetIngredients(old);
    expect(await Ingredient.count({ where: { sodiumMg: { [Op.not]: null } } })).toBe(0);
    const said = await seedIngredientsIfEmpty(path.join(dir, 'no-such-folder'));
    expect(said).toMatch(/starter ingredients were loaded/);
    // USDA SR25 NDB 09316 (strawberries, raw): sodium 1 mg, potassium 153 mg per 100 g.
    const strawberry = await Ingredient.findOne({ where: { sourceRecord: '09316' } });
    expect(strawberry).toMatchObject({ sodiumMg: 1, potassiumMg: 153 });
    expect(await seedIngredientsIfEmpty(path.join(dir, 'no-such-folder'))).toBeNull();
  });
});

describe('the starter library', () => {
  it('has at least 60 generic ingredients, each with its USDA SR25 record', () => {
    const starter = loadStarterIngredients();
    expect(starter.length).toBeGreaterThanOrEqual(60);
    expect(starter.map((s) => s.sourceRecord)).toEqual([...STARTER_RECORDS]);
    expect(new Set(starter.map((s) => s.category)).size).toBeGreaterThanOrEqual(8);
  });

  const compare = sharedPresent ? it : it.skip;
  if (!sharedPresent)
    console.log(
      `USDA SR25 files not found at ${SHARED}: the starter library is not compared with the dataset in this run.`,
    );
  compare('matches the USDA National Nutrient Database for Standard Reference, Release 25, row by row', () => {
    const byRecord = new Map(readSrFoods(SHARED).map((f) => [f.record, f]));
    for (const row of loadStarterIngredients()) {
      const food = byRecord.get(row.sourceRecord)!;
      expect(food.branded).toBe(false);
      expect(row).toEqual(ingredientFromSr(food));
    }
  });
});

describe('the full USDA SR25 import', () => {
  const full = sharedPresent ? it : it.skip;
  if (!sharedPresent) console.log(`USDA SR25 files not found at ${SHARED}: the full import is not tested in this run.`);
  full(
    'imports every generic food with published values (SR25: strawberries 4.89 g, honey 82.12 g, granulated sugar 99.80 g sugars per 100 g)',
    async () => {
      const foods = readSrFoods(SHARED);
      expect(foods).toHaveLength(8463);
      const generic = foods.filter((f) => !f.branded);
      const report = await importDatasetIngredients(generic.map(ingredientFromSr));
      expect(report.created + report.updated + report.unchanged).toBe(generic.length);
      expect(await datasetIngredientCount()).toBe(generic.length);
      const sugars = async (record: string) => (await Ingredient.findOne({ where: { sourceRecord: record } }))?.sugarsG;
      expect(await sugars('09316')).toBe(4.89);
      expect(await sugars('19296')).toBe(82.12);
      expect(await sugars('19335')).toBe(99.8);
      expect(await importDatasetIngredients(generic.map(ingredientFromSr))).toEqual({
        created: 0,
        updated: 0,
        unchanged: generic.length,
      });
      // Each database's own full-text search (FTS5 on SQLite, tsvector on PostgreSQL) puts the plain food first for
      // word beginnings as people type them. Record numbers from SR25's FOOD_DES.txt.
      const first = async (q: string) =>
        (await searchIngredients(nobody, { q, page: 1, pageSize: 5, archived: false, category: '' })).items[0]?.source;
      expect(await first('straw rasp')).toBe('USDA SR25 record 09316'); // Strawberries, raw
      expect(await first('honey')).toBe('USDA SR25 record 19296'); // Honey
      expect(await first('lemon juice')).toBe('USDA SR25 record 09152'); // Lemon juice, raw
      expect(await first('blueb')).toBe('USDA SR25 record 09050'); // Blueberries, raw
      expect(await first('maple syrup')).toBe('USDA SR25 record 19353'); // Syrups, maple
    },
    60_000,
  );
});
