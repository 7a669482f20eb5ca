import { expect, type Page, test } from '@playwright/test';

import { openNav, PHONE, shot, signIn, WIDE } from './helpers';

async function buildRecipe(page: Page, name: string, prefix: string) {
  await openNav(page, 'Recipes');
  await page.getByRole('button', { name: 'New recipe' }).click();
  await page.getByLabel('Recipe name').fill(name);
  await page.getByRole('radio', { name: 'Glass crown cap 473 mL' }).click();
  await page.getByRole('radio', { name: 'Steep, strain, then carbonate' }).click();
  await page.getByRole('button', { name: 'Create and open the designer' }).click();
  await expect(page.getByRole('heading', { name, level: 1 })).toBeVisible();

  // Ingredients from the library.
  await page.getByLabel('Add an ingredient').fill('straw');
  await page.getByRole('button', { name: 'Add Strawberries', exact: true }).click();
  await page.getByLabel('Amount of Strawberries', { exact: true }).fill('30');
  await page.getByLabel('Add an ingredient').fill('ginger root');
  await page.getByRole('button', { name: 'Add Ginger root', exact: true }).click();
  await page.getByLabel('Amount of Ginger root', { exact: true }).fill('2');
  await page.getByLabel('Sucrose (table sugar) per litre').fill('1');
  await expect(page.getByText(/g of sugar into the liquid/).first()).toBeVisible();
  await expect(page.getByText(/Worst case .* within 25 %|stays well within/).first()).toBeVisible();
  await shot(page, `${prefix}-recipe-designer`);

  // More sugar: a caution (or worse) shows before anything is sealed.
  await page.getByLabel('Sucrose (table sugar) per litre').fill('9');
  await expect(page.getByText(/is at or over the bottle's 3 bar rating/).first()).toBeVisible();
  await page.getByLabel('Sucrose (table sugar) per litre').fill('2');
  // The sugar for the target follows the target as it changes.
  await page.getByLabel('Target carbonation').fill('1.2');
  await expect(page.getByText(/^1\.2 volumes need .* g\/L of fermentable sugar in all/)).toBeVisible();
  await page.getByLabel('Target carbonation').fill('4');
  await expect(
    page.getByText(/^4 volumes cannot be reached safely in this bottle \(the pressure would pass 80 % of its rating/),
  ).toBeVisible();
  await page.getByLabel('Target carbonation').fill('2');
  await expect(page.getByText(/^2 volumes (need|cannot)/)).toBeVisible();
  await page.getByRole('button', { name: 'Save as new version' }).click();
  await expect(page.getByText('Version 2', { exact: true })).toBeVisible();

  // Scale to 200 bottles and read the amounts.
  await page.getByRole('radio', { name: 'Scale' }).click();
  await page.getByLabel('Number of bottles').fill('200');
  await expect(page.getByText(/Batch: 200 bottles of Glass crown cap 473 mL/)).toBeVisible();
  // 30 g/L × 94.6 L = 2838 g → 2.84 kg; ginger and sucrose, 2 g/L each → 189.2 g → 189 g (1 g steps from 100 g).
  await expect(page.getByText('2.84 kg', { exact: true })).toBeVisible();
  await expect(page.getByText('189 g', { exact: true })).toHaveCount(2);
  await expect(page.getByText(/to top up after straining/)).toBeVisible();
  await expect(
    page.getByText(/^3\. Top up with 9\.46 L of fresh base to 94\.6 L and dissolve 189 g sucrose/),
  ).toBeVisible();
  await shot(page, `${prefix}-recipe-scaled`);
}

test('a developer builds a recipe on a phone, sees the caution when sugar goes up, and scales it to 200 bottles', async ({
  browser,
}) => {
  const page = await (await browser.newContext({ viewport: PHONE })).newPage();
  await signIn(page, 'rafi@wrenfield.example', 'wrenfield-developer');
  await buildRecipe(page, `Berry ginger fizz ${Date.now()}`, 'phone');
});

test('the same on a wide screen, then the history shows what changed', async ({ browser }) => {
  const page = await (await browser.newContext({ viewport: WIDE })).newPage();
  await signIn(page, 'rafi@wrenfield.example', 'wrenfield-developer');
  await buildRecipe(page, `Garden berry ${Date.now()}`, 'wide');
  await page.getByRole('radio', { name: 'History' }).click();
  await page.getByRole('button', { name: 'Compare version 1 with the current one' }).click();
  // The answer opens under the version compared, in the form's words.
  const changes = page.getByRole('region', { name: /What changed from version 1 to/ });
  await expect(changes.getByText(/Strawberries added/)).toBeVisible();
  await shot(page, 'wide-recipe-history');

  // A tasting whose sugar would make the recipe a danger says so before it is saved, and is listed against the
  // version tasted with the version it made.
  await page.getByRole('radio', { name: 'Tastings' }).click();
  await page.getByRole('radio', { name: 'Sucrose added' }).click();
  await page.getByLabel('Grams of sucrose').fill('5');
  await page.getByLabel('Into this much liquid').fill('473');
  await expect(page.getByText('With this sugar the recipe would be a danger')).toBeVisible();
  await shot(page, 'wide-tasting-danger');
  await page.getByRole('button', { name: 'Save tasting' }).click();
  await expect(page.getByText(/tasted version 2/)).toBeVisible();
  await page.getByRole('button', { name: 'Its sugar made version 3: open History' }).click();
  await expect(page.getByText(/\+5 g sucrose to 473 mL/).first()).toBeVisible();
});

test('a brewer reads the design without fields to edit, on a phone', async ({ browser }) => {
  const page = await (await browser.newContext({ viewport: PHONE })).newPage();
  await signIn(page, 'juno@wrenfield.example', 'wrenfield-brewer');
  await openNav(page, 'Recipes');
  await page.getByRole('link', { name: 'Ginger Lime Snap' }).click();
  await page.getByRole('radio', { name: 'Design' }).click();
  await expect(page.getByRole('heading', { name: 'The recipe' })).toBeVisible();
  await expect(page.getByText(/^Ginger root: 8\.0 g per litre/)).toBeVisible();
  await expect(page.getByRole('textbox')).toHaveCount(0);
  await expect(page.getByRole('button', { name: 'Save as new version' })).toHaveCount(0);
  await shot(page, 'phone-brewer-design-read-only');
});
