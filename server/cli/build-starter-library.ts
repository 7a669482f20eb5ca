import fs from 'node:fs';

import { STARTER_FILE, STARTER_RECORDS } from '@/server/seed/starter-ingredients';
import { ingredientFromSr, readSrFoods } from '@/server/usda/sr-files';

/** `npm run starter:build -- <folder>`: writes the starter library's values from the USDA SR files. */
const folder = process.argv[2];
if (!folder) {
  console.error('Usage: npm run starter:build -- <folder with the USDA SR25 files>');
  process.exit(2);
}
const byRecord = new Map(readSrFoods(folder).map((food) => [food.record, food]));
const missing = STARTER_RECORDS.filter((record) => !byRecord.has(record));
if (missing.length > 0) {
  console.error(`Not in the dataset: ${missing.join(', ')}`);
  process.exit(1);
}
const rows = STARTER_RECORDS.map((record) => ingredientFromSr(byRecord.get(record)!));
fs.writeFileSync(STARTER_FILE, `${JSON.stringify(rows, null, 2)}\n`);
console.log(`Wrote ${rows.length} starter ingredients to ${STARTER_FILE}.`);
