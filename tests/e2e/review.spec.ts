import { expect, test } from '@playwright/test';

import { openNav, PHONE, shot, signIn, url, WIDE } from './helpers';

test('a developer submits, the owner follows the e-mail and approves, the brewer scales the approved version', async ({
  browser,
}) => {
  const developer = await (await browser.newContext({ viewport: WIDE })).newPage();
  await signIn(developer, 'rafi@wrenfield.example', 'wrenfield-developer');
  await openNav(developer, 'Recipes');
  await developer.getByRole('link', { name: 'Hedgerow Bramble' }).click();
  await developer.getByRole('radio', { name: 'Review' }).click();
  await developer.getByLabel('Message to the owners').fill('Fruit sugar alone gives a gentle fizz.');
  await developer.getByRole('button', { name: /Submit version \d+ for review/ }).click();
  await expect(developer.getByText('Waiting for review').first()).toBeVisible();

  const owner = await (await browser.newContext({ viewport: PHONE })).newPage();
  await signIn(owner, 'imogen@wrenfield.example', 'wrenfield-owner');
  await expect(owner.getByText('Waiting for your review')).toBeVisible();
  await expect(owner.getByRole('link', { name: 'Hedgerow Bramble' })).toBeVisible();
  await expect(owner.getByText('Safety caution').first()).toBeVisible();
  await shot(owner, 'phone-owner-home-review-queue');
  // The owner reads the review e-mail (the outbox stands in for the mail server) and follows its link.
  const outbox = await owner.request.get(url('/api/outbox'));
  const { messages } = (await outbox.json()) as { messages: { subject: string; text: string }[] };
  const mail = messages.find((m) => m.subject.startsWith('Review: Hedgerow Bramble'))!;
  expect(mail.text).toContain('Fruit sugar alone gives a gentle fizz.');
  const path = /http:\/\/[^/]+(\/recipes\/\d+)/.exec(mail.text)![1];
  await owner.goto(url(path));
  await owner.getByRole('radio', { name: 'Review' }).click();
  await expect(owner.getByText(/before you decide/)).toBeVisible();
  await shot(owner, 'phone-owner-review');
  await owner.getByLabel('Comment').fill('Approved for the December run.');
  await owner.getByRole('button', { name: /Approve version \d+/ }).click();
  await expect(owner.getByText('Approved for production').first()).toBeVisible();

  const brewer = await (await browser.newContext({ viewport: PHONE })).newPage();
  await signIn(brewer, 'juno@wrenfield.example', 'wrenfield-brewer');
  await expect(brewer.getByText('Approved for production')).toBeVisible();
  await brewer.getByRole('link', { name: 'Hedgerow Bramble' }).click();
  await expect(brewer.getByText(/approved for production\.$/)).toBeVisible();
  await brewer.getByLabel('Number of bottles').fill('150');
  await expect(brewer.getByText(/Batch: 150 bottles of Glass crown cap 473 mL/)).toBeVisible();
  await expect(brewer.getByText(/^1\. Steep /)).toBeVisible();
  // The floor sees the worst finding and the rating against the worst case before it starts.
  await expect(brewer.getByText('Safety: caution')).toBeVisible();
  await expect(brewer.getByText(/^Bottle rating 3\.00 bar .*; worst case .* at 35 °C\.$/).first()).toBeVisible();
  await shot(brewer, 'phone-brewer-batch');

  // The printed card: the approved version, its approval, the amounts large; on paper only the card.
  await brewer.getByRole('button', { name: 'Print card' }).click();
  await expect(brewer.getByText(/Approved for production by Imogen Thale/)).toBeVisible();
  await expect(brewer.getByText('Safety: CAUTION')).toBeVisible();
  await expect(brewer.getByText(/^Card code \d+-\d+-b150/)).toBeVisible();
  const code = /Card code (\S+):/.exec((await brewer.getByText(/^Card code /).textContent())!)![1];
  await brewer.setViewportSize({ width: 794, height: 1123 });
  await brewer.emulateMedia({ media: 'print' });
  await expect(brewer.getByRole('button', { name: 'Print' })).toBeHidden();
  await expect(brewer.getByText('Checkpoints')).toBeVisible();
  await shot(brewer, 'print-card-a4');
  // The browser's print, on A4 and on US Letter: one page each, with write-in boxes at least 8 mm high on paper
  // (1 mm = 96 / 25.4 CSS px; measured under print media, so at the card's printed scale).
  const box = await brewer.getByTestId('write-in').first().boundingBox();
  expect((box!.height * 25.4) / 96).toBeGreaterThanOrEqual(8);
  const pages = (pdf: Buffer) => pdf.toString('latin1').match(/\/Type\s*\/Page\b(?!s)/g)?.length ?? 0;
  expect(pages(await brewer.pdf({ format: 'A4', printBackground: true }))).toBe(1);
  expect(pages(await brewer.pdf({ format: 'Letter', printBackground: true }))).toBe(1);
  await brewer.emulateMedia({ media: 'screen' });

  // The short code opens the same card on another phone.
  const other = await (await browser.newContext({ viewport: PHONE })).newPage();
  await signIn(other, 'rafi@wrenfield.example', 'wrenfield-developer');
  await expect(other.getByRole('heading', { name: 'Hello, Rafi' })).toBeVisible();
  await other.goto(url(`/c/${code}`));
  await expect(other.getByRole('heading', { name: /Hedgerow Bramble, version \d+/ })).toBeVisible();
});

test('a danger version: the developer is told on submitting, Approve says it needs a reason, the card shows the override', async ({
  browser,
}) => {
  const developer = await (await browser.newContext({ viewport: PHONE })).newPage();
  await signIn(developer, 'rafi@wrenfield.example', 'wrenfield-developer');
  await openNav(developer, 'Recipes');
  await developer.getByRole('link', { name: 'Sour Cherry Cardamom' }).click();
  await developer.getByRole('radio', { name: 'Review' }).click();
  await expect(developer.getByText(/Version \d+ has a danger finding/)).toBeVisible();
  await shot(developer, 'phone-submit-danger');
  await developer.getByRole('button', { name: /Submit version \d+ for review/ }).click();
  await expect(developer.getByText('Waiting for review').first()).toBeVisible();

  const owner = await (await browser.newContext({ viewport: WIDE })).newPage();
  await signIn(owner, 'imogen@wrenfield.example', 'wrenfield-owner');
  await openNav(owner, 'Recipes');
  await owner.getByRole('link', { name: 'Sour Cherry Cardamom' }).click();
  await owner.getByRole('radio', { name: 'Review' }).click();
  const approve = owner.getByRole('button', { name: /Approve version \d+/ });
  await expect(owner.getByText(/Approve needs your reason first/)).toBeVisible();
  await expect(approve).toBeDisabled();
  await shot(owner, 'wide-approve-needs-reason');
  await owner.getByLabel('Comment').fill('Trial run only, 24 bottles.');
  await owner
    .getByLabel('Why you approve despite the danger finding')
    .fill('Kept in the cold room at 4 °C until sold; never warm.');
  await expect(owner.getByText(/Approve needs your reason first/)).toBeHidden();
  await approve.click();
  await expect(owner.getByText('Approved for production').first()).toBeVisible();

  const brewer = await (await browser.newContext({ viewport: PHONE })).newPage();
  await signIn(brewer, 'juno@wrenfield.example', 'wrenfield-brewer');
  await brewer.getByRole('link', { name: 'Sour Cherry Cardamom' }).click();
  await expect(brewer.getByText('Safety: danger')).toBeVisible();
  await expect(
    brewer.getByText('Approved over a danger finding. Reason: Kept in the cold room at 4 °C until sold; never warm.'),
  ).toBeVisible();
  await brewer.getByRole('button', { name: 'Print card' }).click();
  await expect(brewer.getByText('Safety: DANGER')).toBeVisible();
  await expect(brewer.getByText(/Approved over a danger finding\. Reason: Kept in the cold room/)).toBeVisible();
  await expect(brewer.getByText(/Approval comment: Trial run only, 24 bottles\./)).toBeVisible();
  await shot(brewer, 'phone-card-danger-override');
});
