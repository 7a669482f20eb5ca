import { expect, test } from '@playwright/test';

import { consoleLink, openNav, PHONE, shot, signIn, url, WIDE } from './helpers';

test('an owner signs up, invites a brewer through the outbox, and the brewer cannot open Team', async ({ browser }) => {
  const stamp = Date.now();
  const ownerEmail = `owner-${stamp}@e2e.test`;
  const brewerEmail = `brewer-${stamp}@e2e.test`;

  // The owner, on a phone.
  const ownerContext = await browser.newContext({ viewport: PHONE });
  const owner = await ownerContext.newPage();
  await owner.goto(url('/sign-up'));
  await owner.getByRole('button', { name: 'Create brewery account' }).click();
  await expect(owner.getByText('Enter the brewery name.')).toBeVisible();
  await shot(owner, 'phone-sign-up-errors');
  await owner.getByLabel('Brewery name').fill('Sloe Meadow Ferments');
  await owner.getByLabel('Your name').fill('Ottilie Brand');
  await owner.getByLabel('E-mail', { exact: true }).fill(ownerEmail);
  await owner.getByLabel('Password', { exact: true }).fill('owner-pass-123');
  await owner.getByRole('button', { name: 'Create brewery account' }).click();
  // Nothing exists until the address is confirmed; this server has no SMTP, so the screen says how to get the link.
  await expect(owner.getByText('Check your e-mail', { exact: true })).toBeVisible();
  await expect(owner.getByText(`npm run reset-link -- ${ownerEmail}`)).toBeVisible();
  await shot(owner, 'phone-sign-up-check-mail');
  await owner.goto(url(consoleLink(ownerEmail)));
  await owner.getByRole('button', { name: 'Confirm and create the account' }).click();
  await expect(owner.getByRole('heading', { name: 'Hello, Ottilie' })).toBeVisible();
  await expect(owner.getByText('Sloe Meadow Ferments').first()).toBeVisible();
  await shot(owner, 'phone-owner-home');

  await openNav(owner, 'Team');
  await owner.getByLabel('E-mail of the person to invite').fill(brewerEmail);
  await owner.getByRole('radio', { name: 'Brewer' }).click();
  await owner.getByRole('button', { name: 'Send invitation' }).click();
  await expect(owner.getByText(`Invitation sent to ${brewerEmail}`)).toBeVisible();
  await expect(owner.getByText(brewerEmail).last()).toBeVisible();
  await shot(owner, 'phone-owner-team');

  await openNav(owner, 'Mail outbox');
  await owner.getByRole('listitem', { name: new RegExp(`to ${brewerEmail}`) }).click();
  const link = owner.getByRole('link', { name: /accept-invitation\?token=/ });
  await expect(link).toBeVisible();
  await shot(owner, 'phone-owner-outbox');
  const href = await link.getAttribute('href');
  expect(href).toMatch(/^\/accept-invitation\?token=/);

  // The brewer, on their own wide screen, follows the link.
  const brewerContext = await browser.newContext({ viewport: WIDE });
  const brewer = await brewerContext.newPage();
  await brewer.goto(url(href!));
  await expect(brewer.getByRole('heading', { name: 'Join Sloe Meadow Ferments' })).toBeVisible();
  await shot(brewer, 'wide-accept-invitation');
  await brewer.getByLabel('Your name').fill('Bram Tiller');
  await brewer.getByLabel('Password', { exact: true }).fill('brewer-pass-123');
  await brewer.getByRole('button', { name: 'Join the brewery' }).click();
  await expect(brewer.getByRole('heading', { name: 'Hello, Bram' })).toBeVisible();

  // Sign out and back in with the new password.
  await brewer.getByRole('button', { name: 'Sign out' }).click();
  await expect(brewer.getByRole('heading', { name: 'Sign in' })).toBeVisible();
  await signIn(brewer, brewerEmail, 'brewer-pass-123');
  await expect(brewer.getByRole('heading', { name: 'Hello, Bram' })).toBeVisible();
  await expect(brewer.getByText('Brewer', { exact: true }).first()).toBeVisible();
  await expect(brewer.getByRole('link', { name: 'Team' })).toHaveCount(0);
  await shot(brewer, 'wide-brewer-home');

  await brewer.goto(url('/team'));
  await expect(brewer.getByText('Owners only')).toBeVisible();
  const api = await brewer.request.get(url('/api/team'));
  expect(api.status()).toBe(403);
  await shot(brewer, 'wide-brewer-team-refused');

  // The owner's team now lists the brewer as a member.
  await openNav(owner, 'Team');
  await expect(owner.getByText('Bram Tiller')).toBeVisible();
  await ownerContext.close();
  await brewerContext.close();
});

test('the demo owner signs in on a wide screen and sees the side rail', async ({ browser }) => {
  const context = await browser.newContext({ viewport: WIDE });
  const page = await context.newPage();
  await signIn(page, 'imogen@wrenfield.example', 'wrong-password');
  await expect(page.getByText('That e-mail and password do not match an account.')).toBeVisible();
  await signIn(page, 'imogen@wrenfield.example', 'wrenfield-owner');
  await expect(page.getByRole('heading', { name: 'Hello, Imogen' })).toBeVisible();
  await expect(page.getByRole('navigation', { name: 'Main' })).toBeVisible();
  await shot(page, 'wide-demo-owner-home');
  await openNav(page, 'Team');
  await expect(page.getByText('Juno Marsh')).toBeVisible();
  // The brewery settings every check reads: the warm day, the sugar helpers' margin and whether the brewery may make alcoholic drinks.
  await expect(page.getByLabel('Warmest the bottles may meet')).toHaveValue('35');
  await expect(page.getByLabel('Most sugar: share of the bottle rating')).toHaveValue('80');
  await expect(page.getByRole('radio', { name: 'No', exact: true })).toHaveAttribute('aria-checked', 'true');
  await expect(page.getByText(/cannot be approved, with or without an override/)).toBeVisible();
  await shot(page, 'wide-demo-owner-team');
  await context.close();
});

test('forgot password: the reset link works once', async ({ browser }) => {
  const context = await browser.newContext({ viewport: PHONE });
  const page = await context.newPage();
  await page.goto(url('/forgot-password'));
  await page.getByLabel('E-mail', { exact: true }).fill('juno@wrenfield.example');
  await page.getByRole('button', { name: 'Send reset link' }).click();
  await expect(page.getByText('Check your e-mail')).toBeVisible();
  await shot(page, 'phone-forgot-password');
  // The outbox is closed in this run (as in production without SMTP): the brewer reads their own mail.
  await signIn(page, 'juno@wrenfield.example', 'wrenfield-brewer');
  await expect(page.getByRole('heading', { name: 'Hello, Juno' })).toBeVisible();
  const outbox = await page.request.get(url('/api/outbox'));
  const { messages } = (await outbox.json()) as { messages: { text: string }[] };
  const resetPath = /http:\/\/[^/]+(\/reset-password\?token=\S+)/.exec(messages[0].text)![1];
  await page.goto(url(resetPath));
  await page.getByLabel('New password', { exact: true }).fill('juno-new-pass-1');
  await page.getByRole('button', { name: 'Save new password' }).click();
  await expect(page.getByRole('heading', { name: 'Hello, Juno' })).toBeVisible();
  await page.goto(url(resetPath));
  await page.getByLabel('New password', { exact: true }).fill('juno-other-pass-2');
  await page.getByRole('button', { name: 'Save new password' }).click();
  await expect(page.getByText(/already been used/)).toBeVisible();
  await context.close();
});
