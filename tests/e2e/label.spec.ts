import fs from 'node:fs';

import { expect, test } from '@playwright/test';

import { openNav, PHONE, shot, signIn, WIDE } from './helpers';

test('a developer reads both bases of the panel on a phone; the owner enters lab values on a wide screen and downloads the files', async ({
  browser,
}) => {
  const developer = await (await browser.newContext({ viewport: PHONE })).newPage();
  await signIn(developer, 'rafi@wrenfield.example', 'wrenfield-developer');
  await openNav(developer, 'Recipes');
  await developer.getByRole('link', { name: 'Rhubarb Custard Tart' }).click();
  await developer.getByRole('radio', { name: 'Label' }).click();
  const formulated = developer.getByRole('group', { name: 'Nutrition Facts, As formulated (estimate)' });
  const conditioned = developer.getByRole('group', { name: 'Nutrition Facts, After conditioning (estimate)' });
  await expect(formulated).toBeVisible();
  await expect(conditioned).toBeVisible();
  // A 473 mL bottle is under 200 % of 360 mL: one serving, the whole bottle (21 CFR 101.9(b)(6)).
  await expect(formulated.getByText('1 bottle (473 mL)')).toBeVisible();
  await expect(formulated.getByText('Calories', { exact: true })).toBeVisible();
  // Shortbread brings wheat and milk.
  await expect(developer.getByText(/^Contains: .*Wheat/)).toBeVisible();
  await expect(developer.getByText(/Estimates only/)).toBeVisible();
  // A serving the rule does not know is said so, and the panel keeps the rule's serving.
  await developer.getByLabel('Serving').fill('lots');
  await expect(developer.getByText('The serving must be a number of mL.')).toBeVisible();
  await expect(formulated.getByText('1 bottle (473 mL)')).toBeVisible();
  await developer.getByLabel('Serving').fill('');
  // Developers read the lab values; they do not enter them.
  await expect(developer.getByRole('button', { name: 'Save lab values' })).toHaveCount(0);
  await shot(developer, 'phone-developer-label');
  // The page scrolls inside the shell: the panels are photographed themselves.
  await formulated.screenshot({ path: `${__dirname}/screenshots/phone-label-as-formulated.png` });
  await conditioned.screenshot({ path: `${__dirname}/screenshots/phone-label-after-conditioning.png` });

  const owner = await (await browser.newContext({ viewport: WIDE })).newPage();
  await signIn(owner, 'imogen@wrenfield.example', 'wrenfield-owner');
  await openNav(owner, 'Recipes');
  await owner.getByRole('link', { name: 'Rhubarb Custard Tart' }).click();
  await owner.getByRole('radio', { name: 'Label' }).click();
  await expect(owner.getByRole('group', { name: 'Nutrition Facts, As formulated (estimate)' })).toBeVisible();
  await owner.getByLabel('Total Sugars').fill('1.2');
  await owner.getByLabel('Total Carbohydrate').fill('1.5');
  await owner.getByLabel('Calories').fill('9');
  await owner.getByLabel('Lab and report').fill('Riverside lab, report 2211');
  await owner.getByRole('button', { name: 'Save lab values' }).click();
  const lab = owner.getByRole('group', { name: 'Nutrition Facts, From the lab' });
  await expect(lab).toBeVisible();
  // Per 100 mL × 4.73: sugars 1.2 → 5.676 g → 6 g; calories 9 → 42.57 → 45 (5-calorie steps to 50).
  await expect(lab.getByText('Total Sugars 6 g', { exact: true })).toBeVisible();
  await expect(lab.getByText('45', { exact: true })).toBeVisible();
  await expect(owner.getByText(/entered by Imogen Thale/)).toBeVisible();
  await shot(owner, 'wide-owner-label-lab');
  await lab.scrollIntoViewIfNeeded();
  await owner.screenshot({ path: `${__dirname}/screenshots/wide-owner-label-panels.png` });

  const [pdf] = await Promise.all([
    owner.waitForEvent('download'),
    owner.getByRole('link', { name: 'Download From the lab as PDF' }).click(),
  ]);
  expect(
    fs
      .readFileSync((await pdf.path())!)
      .subarray(0, 5)
      .toString(),
  ).toBe('%PDF-');
  const [png] = await Promise.all([
    owner.waitForEvent('download'),
    owner.getByRole('link', { name: 'Download From the lab as PNG' }).click(),
  ]);
  expect(png.suggestedFilename()).toMatch(/^nutrition-\d+-v\d+-lab\.png$/);
  expect(
    fs
      .readFileSync((await png.path())!)
      .subarray(1, 4)
      .toString(),
  ).toBe('PNG');
  const [csv] = await Promise.all([
    owner.waitForEvent('download'),
    owner.getByRole('link', { name: 'Download the values as CSV' }).click(),
  ]);
  expect(fs.readFileSync((await csv.path())!, 'utf8')).toMatch(/^basis,nutrient,unit,per_100_ml/);

  // The developer's panel follows the lab.
  await developer.reload();
  await developer.getByRole('radio', { name: 'Label' }).click();
  await expect(developer.getByRole('group', { name: 'Nutrition Facts, From the lab' })).toBeVisible();
});
