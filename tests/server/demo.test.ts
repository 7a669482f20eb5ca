import { Recipe, Tasting } from '@/server/db';
import { seedDemoIfEmpty } from '@/server/seed/demo';
import { seedDemoRecipesIfEmpty } from '@/server/seed/demo-recipes';
import { loadStarterIngredients } from '@/server/seed/starter-ingredients';
import { importDatasetIngredients } from '@/server/services/ingredients';
import { evaluate, getRecipe } from '@/server/services/recipes';

import { startApp, stopApp } from './helpers';

beforeAll(async () => {
  await startApp();
  await seedDemoIfEmpty();
  await importDatasetIngredients(loadStarterIngredients());
});
afterAll(stopApp);

describe('the demo scenario', () => {
  it('has four recipes of both processes, with a caution and a danger, each tasted', async () => {
    expect(await seedDemoRecipesIfEmpty()).toBe(true);
    expect(await seedDemoRecipesIfEmpty()).toBe(false);
    const recipes = await Recipe.findAll();
    expect(recipes).toHaveLength(4);
    const auth = { userId: 2, organisationId: recipes[0].organisationId, role: 'developer' as const };
    const levels = new Set<string>();
    const methods = new Set<string>();
    for (const recipe of recipes) {
      const detail = await getRecipe(auth, recipe.id);
      methods.add(detail.content.process.method);
      const result = await evaluate(auth, detail.content);
      for (const finding of result.carbonation.findings) levels.add(finding.level);
      expect(await Tasting.count({ where: { recipeId: recipe.id } })).toBeGreaterThan(0);
    }
    expect([...methods].sort()).toEqual(['in-bottle', 'steep-strain']);
    expect(levels).toEqual(new Set(['ok', 'caution', 'danger']));
  });
});
