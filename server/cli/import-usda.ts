import path from 'node:path';

import { Presets, SingleBar } from 'cli-progress';

import { prepareDatabase, sequelize } from '@/server/db';
import { importDatasetIngredients } from '@/server/services/ingredients';
import { ingredientFromSr, NotSrFolderError, readSrFoods } from '@/server/usda/sr-files';

/** `npm run import:usda -- <folder>`: imports or updates the dataset ingredients from the USDA SR25 files. */
async function run(): Promise<void> {
  const folder = process.argv[2];
  if (!folder) {
    console.error('Usage: npm run import:usda -- <folder with FOOD_DES.txt, ABBREV.txt and WEIGHT.txt of USDA SR25>');
    process.exit(2);
  }
  let foods;
  try {
    foods = readSrFoods(path.resolve(folder));
  } catch (error) {
    if (error instanceof NotSrFolderError) {
      console.error(error.message);
      process.exit(1);
    }
    throw error;
  }
  const generic = foods.filter((food) => !food.branded);
  console.log(`${foods.length} foods read, ${foods.length - generic.length} branded products left out.`);
  await prepareDatabase();
  const bar = new SingleBar(
    { format: 'Importing [{bar}] {percentage}% · {value}/{total} foods', hideCursor: true },
    Presets.shades_classic,
  );
  bar.start(generic.length, 0);
  const report = await importDatasetIngredients(generic.map(ingredientFromSr), (done) => bar.update(done));
  bar.stop();
  console.log(`Done: ${report.created} added, ${report.updated} updated, ${report.unchanged} unchanged.`);
  await sequelize.close();
}

run().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
