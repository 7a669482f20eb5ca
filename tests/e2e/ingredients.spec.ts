import { expect, test } from '@playwright/test';

import { openNav, PHONE, shot, signIn, WIDE } from './helpers';

test('a developer searches the library, reads an ingredient and adds a house ingredient from its label', async ({
  browser,
}) => {
  const page = await (await browser.newContext({ viewport: PHONE })).newPage();
  await signIn(page, 'rafi@wrenfield.example', 'wrenfield-developer');
  await openNav(page, 'Ingredients');
  await page.getByLabel('Search ingredients').fill('straw rasp');
  // Dataset ingredients read by their short names; the full description stays on the detail.
  await expect(page.getByRole('link', { name: 'Strawberries', exact: true })).toBeVisible();
  await expect(page.getByRole('link', { name: 'Raspberries', exact: true })).toBeVisible();
  await shot(page, 'phone-ingredients-search');
  await page.getByRole('link', { name: 'Strawberries', exact: true }).click();
  await expect(page.getByText('Full name in the dataset: Strawberries, raw')).toBeVisible();
  // USDA SR25, NDB 09316: 4.89 g total sugars per 100 g.
  await expect(page.getByText('4.89 g of sugars per 100 g', { exact: true })).toBeVisible();
  await expect(page.getByText('Source: USDA SR25 record 09316')).toBeVisible();
  await shot(page, 'phone-ingredient-detail');

  // The brewery's own short name for a dataset ingredient, everywhere it is read.
  await openNav(page, 'Ingredients');
  await page.getByLabel('Search ingredients').fill('lemons');
  await page.getByRole('link', { name: 'Lemons', exact: true }).click();
  await page.getByLabel('Display name').fill('Unwaxed lemons');
  await page.getByRole('button', { name: 'Save name' }).click();
  await expect(page.getByText('Display name saved.')).toBeVisible();
  await expect(page.getByRole('heading', { name: 'Unwaxed lemons', level: 1 })).toBeVisible();
  await openNav(page, 'Ingredients');
  await page.getByLabel('Search ingredients').fill('lemons');
  await expect(page.getByRole('link', { name: 'Unwaxed lemons', exact: true })).toBeVisible();

  const stamp = Date.now();
  await openNav(page, 'Ingredients');
  await page.getByRole('button', { name: 'New house ingredient' }).click();
  await page.getByLabel('Name', { exact: true }).fill(`Orchard quince purée ${stamp}`);
  await page.getByRole('radio', { name: 'Purée' }).click();
  await page.getByLabel('Serving size').fill('40');
  await page.getByLabel('Total sugars per serving').fill('50');
  await page.getByRole('button', { name: 'Save ingredient' }).click();
  await expect(page.getByText('Sugars (50 g) cannot weigh more than the serving (40 g).')).toBeVisible();
  await page.getByLabel('Total sugars per serving').fill('6');
  await expect(page.getByText('= 15.00 g of sugars per 100 g')).toBeVisible();
  await page.getByRole('checkbox', { name: 'Tree nuts' }).click();
  await shot(page, 'phone-house-ingredient-form');
  await page.getByRole('button', { name: 'Save ingredient' }).click();
  await expect(page.getByRole('heading', { name: `Orchard quince purée ${stamp}`, level: 1 })).toBeVisible();
  // 6 g in a 40 g serving = 15 g per 100 g.
  await expect(page.getByText('15.00 g of sugars per 100 g', { exact: true })).toBeVisible();
  await expect(page.getByText('Tree nuts')).toBeVisible();
  await expect(page.getByText(/Rafi Castellan · created/)).toBeVisible();

  // The supplier's label photo, through the browser's file picker.
  const png = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.alloc(200, 7)]);
  const [chooser] = await Promise.all([
    page.waitForEvent('filechooser'),
    page.getByRole('button', { name: 'Attach a PDF, JPEG or PNG' }).click(),
  ]);
  await chooser.setFiles({ name: 'quince-label.png', mimeType: 'image/png', buffer: png });
  await expect(page.getByRole('button', { name: 'Open quince-label.png' })).toBeVisible();
  const [chooser2] = await Promise.all([
    page.waitForEvent('filechooser'),
    page.getByRole('button', { name: 'Attach a PDF, JPEG or PNG' }).click(),
  ]);
  await chooser2.setFiles({
    name: 'not-really.png',
    mimeType: 'image/png',
    buffer: Buffer.from('plain text pretending'),
  });
  await expect(page.getByText('Attach a PDF, JPEG or PNG file.')).toBeVisible();
  await shot(page, 'phone-house-ingredient-detail');
});

test('a brewer reads the library on a wide screen but cannot add to it', async ({ browser }) => {
  const page = await (await browser.newContext({ viewport: WIDE })).newPage();
  await signIn(page, 'juno@wrenfield.example', 'wrenfield-brewer');
  await openNav(page, 'Ingredients');
  await page.getByRole('radio', { name: 'Sugar or syrup' }).click();
  await page.getByLabel('Search ingredients').fill('hon');
  // Ranked by relevance: the word that starts with "hon" comes first.
  await expect(page.getByRole('table', { name: 'Ingredients' }).getByRole('link').first()).toHaveText('Honey');
  await expect(page.getByRole('button', { name: 'New house ingredient' })).toHaveCount(0);
  await shot(page, 'wide-ingredients');
});
