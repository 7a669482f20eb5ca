import { expect, test } from '@playwright/test';

import { openNav, PHONE, shot, signIn, WIDE } from './helpers';

test('an owner adds a bottle format with its rating; a brewer sees it but cannot change the table', async ({
  browser,
}) => {
  const owner = await (await browser.newContext({ viewport: WIDE })).newPage();
  await signIn(owner, 'imogen@wrenfield.example', 'wrenfield-owner');
  await openNav(owner, 'Bottles');
  await expect(owner.getByText('Glass crown cap 330 mL')).toBeVisible();
  await expect(owner.getByText('Typical value: confirm with your supplier').first()).toBeVisible();
  await owner.getByRole('button', { name: 'Add a format' }).click();
  await owner.getByRole('button', { name: 'Add format' }).click();
  await expect(owner.getByText('Name the format.')).toBeVisible();
  await owner.getByLabel('Name', { exact: true }).fill('Stubby glass 275 mL');
  await owner.getByLabel('Liquid', { exact: true }).fill('275');
  await owner.getByLabel('Headspace', { exact: true }).fill('15');
  await owner.getByLabel('Maximum working pressure').fill('abc');
  await owner.getByLabel('Where the pressure figure comes from').fill('Supplier sheet, March 2026');
  await owner.getByRole('button', { name: 'Add format' }).click();
  await expect(owner.getByText('Maximum working pressure must be a number.')).toBeVisible();
  await owner.getByLabel('Maximum working pressure').fill('3.5');
  await owner.getByRole('button', { name: 'Add format' }).click();
  await expect(owner.getByText('Stubby glass 275 mL')).toBeVisible();
  await expect(owner.getByText('Supplier sheet, March 2026')).toBeVisible();
  await shot(owner, 'wide-owner-bottles');

  const brewer = await (await browser.newContext({ viewport: PHONE })).newPage();
  await signIn(brewer, 'juno@wrenfield.example', 'wrenfield-brewer');
  await openNav(brewer, 'Bottles');
  await expect(brewer.getByText('Stubby glass 275 mL')).toBeVisible();
  await expect(brewer.getByText('Only owners change this table.', { exact: false })).toBeVisible();
  await expect(brewer.getByRole('button', { name: 'Add a format' })).toHaveCount(0);
  await shot(brewer, 'phone-brewer-bottles');

  // Clean up for reruns against the same database: archive it.
  await owner.getByRole('button', { name: 'Archive Stubby glass 275 mL' }).click();
  await expect(owner.getByText('Stubby glass 275 mL')).toHaveCount(0);
});
