import fs from 'node:fs';
import path from 'node:path';

import type { DatasetIngredient } from '@/server/usda/sr-files';

/**
 * The USDA SR25 records of the starter library: generic ingredients flavour developers reach for. Their values
 * live in starter-ingredients.json, written from the SR files by `npm run starter:build -- <folder>`, so the
 * project works without the dataset; tests compare every row with the dataset when it is present.
 */
export const STARTER_RECORDS = [
  // Fruit
  '09316',
  '09302',
  '09050',
  '09042',
  '09070',
  '09063',
  '09078',
  '09236',
  '09252',
  '09003',
  '09021',
  '09279',
  '09132',
  '09176',
  '09266',
  '09231',
  '09226',
  '09139',
  '09148',
  '09150',
  '09159',
  '09200',
  '09112',
  '09218',
  '09326',
  '09181',
  '09286',
  '09089',
  '09307',
  '09088',
  '09083',
  '09107',
  '09311',
  // Juice
  '09232',
  '09152',
  '09160',
  '09206',
  '09128',
  '09016',
  '09273',
  '09135',
  '43382',
  '09442',
  // Dried fruit
  '09298',
  '09421',
  '09094',
  '09032',
  '09079',
  '09289',
  // Ginger, spices, herbs
  '11216',
  '02010',
  '02011',
  '02006',
  '02021',
  '02025',
  '02030',
  '02002',
  '02043',
  '02050',
  '02065',
  '02064',
  '02044',
  '02063',
  '02049',
  '11972',
  '02013',
  // Sugars and syrups
  '19335',
  '19334',
  '19296',
  '19353',
  '19912',
  '19304',
  // Baked goods and sweets
  '18173',
  '18120',
  '18301',
  '18192',
  '19165',
  '19904',
  // Dairy
  '01077',
] as const;

export const STARTER_FILE = path.join(__dirname, 'starter-ingredients.json');

export function loadStarterIngredients(): DatasetIngredient[] {
  return JSON.parse(fs.readFileSync(STARTER_FILE, 'utf8')) as DatasetIngredient[];
}
