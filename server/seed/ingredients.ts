import { config } from '@/server/config';
import {
  datasetIngredientCount,
  datasetLacksLabelNutrients,
  importDatasetIngredients,
} from '@/server/services/ingredients';
import { ingredientFromSr, NotSrFolderError, readSrFoods } from '@/server/usda/sr-files';

import { loadStarterIngredients } from './starter-ingredients';

/**
 * Fills an empty ingredient library: the whole USDA SR25 dataset when its files are at NUTRIENT_DATA_DIR,
 * otherwise the starter library shipped with the project. A library filled before the label nutrients existed
 * (sodium, minerals...) is filled in again the same way, once. Answers what it did, in words, or null.
 */
export async function seedIngredientsIfEmpty(folder = config.nutrientDataDir): Promise<string | null> {
  if ((await datasetIngredientCount()) > 0 && !(await datasetLacksLabelNutrients())) return null;
  try {
    const foods = readSrFoods(folder).filter((food) => !food.branded);
    const report = await importDatasetIngredients(foods.map(ingredientFromSr));
    return `Ingredient library: imported ${report.created + report.updated} foods from the USDA SR25 files in ${folder}.`;
  } catch (error) {
    if (!(error instanceof NotSrFolderError)) throw error;
    const report = await importDatasetIngredients(loadStarterIngredients());
    return `Ingredient library: no USDA SR25 files at ${folder}, so the ${report.created + report.updated} starter ingredients were loaded (npm run import:usda -- <folder> adds the rest).`;
  }
}
