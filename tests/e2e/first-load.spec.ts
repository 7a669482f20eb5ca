import { expect, type Page, test } from '@playwright/test';

import { PHONE, url } from './helpers';

/** The goals of a phone's first load (README, performance notes); `npm run bench:web` measures the times. */
const FIRST_VISIT_MAX_BYTES = 360 * 1024;
const REPEAT_VISIT_MAX_BYTES = 20 * 1024;

/** Bytes on the wire (headers and bodies, as the browser's network layer counts them) while `act` runs. */
async function bytesWhile(page: Page, act: () => Promise<void>) {
  const cdp = await page.context().newCDPSession(page);
  await cdp.send('Network.enable');
  const requests = new Map<string, string>();
  const received: { url: string; bytes: number }[] = [];
  cdp.on('Network.requestWillBeSent', (e) => requests.set(e.requestId, e.request.url));
  cdp.on('Network.loadingFinished', (e) =>
    received.push({ url: requests.get(e.requestId) ?? '', bytes: e.encodedDataLength }),
  );
  await act();
  await cdp.detach();
  return { total: received.reduce((sum, r) => sum + r.bytes, 0), urls: received.map((r) => r.url) };
}

test('the sign-in screen’s first visit stays under 360 KB and a repeat visit under 20 KB', async ({ browser }) => {
  const page = await (await browser.newContext({ viewport: PHONE })).newPage();
  const first = await bytesWhile(page, async () => {
    await page.goto(url('/sign-in'));
    await expect(page.getByLabel('E-mail', { exact: true })).toBeVisible();
    await page.waitForLoadState('networkidle');
  });
  console.log(`first visit: ${(first.total / 1024).toFixed(1)} KB in ${first.urls.length} requests`);
  // The mark is drawn from its SVG markup (no SVG library on this path): once loaded, React Native Web keeps an img.
  await expect(page.locator('img[src^="data:image/svg+xml"]').first()).toBeAttached();
  expect(first.total).toBeLessThanOrEqual(FIRST_VISIT_MAX_BYTES);
  // The signed-in screens are one chunk fetched on demand: the sign-in page has one script, the first bundle.
  expect(first.urls.filter((u) => u.endsWith('.js'))).toHaveLength(1);
  // Only the core parts of the typeface: the screen shows no character of the extra parts.
  expect(first.urls.filter((u) => u.includes('/fonts/')).every((u) => u.endsWith('-core.woff2'))).toBe(true);

  const repeat = await bytesWhile(page, async () => {
    await page.goto(url('/sign-in'));
    await expect(page.getByLabel('E-mail', { exact: true })).toBeVisible();
    await page.waitForLoadState('networkidle');
  });
  console.log(`repeat visit: ${(repeat.total / 1024).toFixed(1)} KB`);
  expect(repeat.total).toBeLessThanOrEqual(REPEAT_VISIT_MAX_BYTES);
});
