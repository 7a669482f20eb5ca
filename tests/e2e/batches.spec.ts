import { expect, test } from '@playwright/test';

import { openNav, PHONE, shot, signIn, url, WIDE } from './helpers';

const PDF = Buffer.from('%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n');

test('a brewer runs a batch on a phone and the owner releases it on a wide screen', async ({ browser }) => {
  const brewer = await (await browser.newContext({ viewport: PHONE })).newPage();
  await signIn(brewer, 'juno@wrenfield.example', 'wrenfield-brewer');
  await openNav(brewer, 'Recipes');
  await brewer.getByRole('link', { name: 'Ginger Lime Snap' }).click();
  await brewer.getByLabel('Number of bottles').fill('48');
  await brewer.getByRole('button', { name: /Start production batch \(version \d+\)/ }).click();
  await expect(brewer.getByRole('heading', { name: /^Batch WCD-\d{6}-\d{2}$/, level: 1 })).toBeVisible();
  const lotCode = ((await brewer.getByRole('heading', { level: 1 }).textContent()) ?? '').replace('Batch ', '');
  const batchPath = new URL(brewer.url()).pathname;

  // pH of the base, checked at once.
  await brewer.getByRole('textbox', { name: 'pH', exact: true }).fill('3.3');
  await brewer.getByRole('button', { name: 'Record reading' }).click();
  await expect(brewer.getByText('pH recorded: OK')).toBeVisible();
  await expect(brewer.getByText('pH 3.3 is at or below 4.2.').first()).toBeVisible();

  // A test bottle at 20 °C, compared with the recipe's worst case and the rating.
  await brewer.getByRole('radio', { name: 'Test-bottle pressure' }).click();
  await brewer.getByRole('textbox', { name: 'Test-bottle pressure', exact: true }).fill('1.2');
  await brewer.getByLabel('Temperature of the test bottle').fill('20');
  await brewer.getByRole('button', { name: 'Record reading' }).click();
  await expect(brewer.getByText(/1\.2 bar at 20 °C is within the recipe's worst case of/).first()).toBeVisible();

  // The lab's ABV, with its report.
  await brewer.getByRole('radio', { name: 'Alcohol (ABV)' }).click();
  await brewer.getByRole('textbox', { name: 'Alcohol (ABV)', exact: true }).fill('0.3');
  await brewer.getByRole('radio', { name: 'By a lab' }).click();
  await brewer.getByRole('button', { name: 'Record reading' }).click();
  await expect(brewer.getByText('0.3 % ABV is under the 0.5 % limit.').first()).toBeVisible();
  const [chooser] = await Promise.all([
    brewer.waitForEvent('filechooser'),
    brewer.getByRole('button', { name: 'Attach the lab report' }).click(),
  ]);
  await chooser.setFiles({ name: 'lab-report.pdf', mimeType: 'application/pdf', buffer: PDF });
  await expect(brewer.getByText('Lab report kept with the reading.')).toBeVisible();

  // The supplier's lot, quantity as written.
  await brewer.getByRole('textbox', { name: 'Ingredient', exact: true }).fill('Ginger root, raw');
  await brewer.getByLabel('Quantity').fill('3 lb');
  await brewer.getByRole('textbox', { name: 'Supplier', exact: true }).fill('Marsh Lane Growers');
  await brewer.getByLabel("Supplier's lot").fill('MLG-2612-C');
  await brewer.getByRole('button', { name: 'Add lot' }).click();
  await expect(brewer.getByText(/Lot MLG-2612-C: Ginger root, raw, 3 lb/)).toBeVisible();

  // Every step signed off: the batch waits for the owner.
  const signOffs = brewer.getByRole('button', { name: /^Sign off step \d+$/ });
  while ((await signOffs.count()) > 0) {
    const before = await signOffs.count();
    await signOffs.first().click();
    await expect(signOffs).toHaveCount(before - 1);
  }
  await expect(brewer.getByText('Waiting for a decision').first()).toBeVisible();
  await shot(brewer, 'phone-batch-floor');

  const owner = await (await browser.newContext({ viewport: WIDE })).newPage();
  await signIn(owner, 'imogen@wrenfield.example', 'wrenfield-owner');
  await openNav(owner, 'Batches');
  await owner.getByLabel("Supplier's lot code").fill('MLG-2612-C');
  await expect(owner.getByRole('link', { name: lotCode })).toHaveCount(2);
  await owner.goto(url(`/b/${lotCode}`));
  await expect(owner.getByRole('heading', { name: `Batch ${lotCode}`, level: 1 })).toBeVisible();
  expect(new URL(owner.url()).pathname).toBe(batchPath);
  await expect(owner.getByText(/Readings in the order taken/)).toBeVisible();
  await shot(owner, 'wide-batch-decision');
  await owner.getByLabel('Note').last().fill('All readings within limits.');
  await owner.getByRole('button', { name: 'Release the batch' }).click();
  await expect(owner.getByText('Released').first()).toBeVisible();
  const pdf = await owner.request.get(url(`/api${batchPath}/record.pdf`));
  expect(pdf.headers()['content-type']).toBe('application/pdf');
});

test('the demo batch in conditioning shows its caution, and a developer reads it without the floor forms', async ({
  browser,
}) => {
  const page = await (await browser.newContext({ viewport: PHONE })).newPage();
  await signIn(page, 'rafi@wrenfield.example', 'wrenfield-developer');
  await openNav(page, 'Batches');
  await page.getByRole('radio', { name: 'In progress' }).click();
  await page.getByRole('link', { name: /^WCD-\d{6}-02$/ }).click();
  await expect(page.getByText(/within 25 % of the bottle's 3 bar rating: chill the batch now/).first()).toBeVisible();
  await expect(page.getByRole('button', { name: 'Record reading' })).toHaveCount(0);
  await shot(page, 'phone-batch-caution');
});
