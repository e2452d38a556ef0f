// Printing at the bench: a tailor prints a garment's cut sheet in millimetres from its page, and an
// apprentice prints the morning's sheets from the queue as filtered; each opens a PDF in a new tab.
import type { Browser, BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launch, ready, tabletPage } from './browser';
import { signInAs } from './sign-in';

let browser: Browser;

beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

/** Clicks a link that opens in a new tab and answers the response that tab received. */
async function opensPdf(context: BrowserContext, click: () => Promise<void>, path: RegExp) {
  const response = context.waitForEvent('response', { predicate: (r) => path.test(new URL(r.url()).pathname), timeout: 30_000 });
  await click();
  const r = await response;
  return { status: r.status(), type: r.headers()['content-type'], url: new URL(r.url()) };
}

describe('printing cut sheets', () => {
  it('a tailor prints a garment’s sheet in millimetres from the garment page', async () => {
    const page = await tabletPage(browser);
    await signInAs(page, 'tailor', '/queue');
    // Found by the queue's search: other stories add work to the demo shop, and the list shows 50 rows a page.
    await page.getByLabel('Customer or ticket').fill('Navy suit');
    await page.getByRole('link', { name: 'Navy suit trousers' }).first().click();
    await page.waitForURL(/\/garments\/[0-9a-f-]{36}$/);
    await ready(page);
    await page.getByLabel('Sheet in').selectOption('mm');
    // The sheet is fetched by the page (so a refusal can be said in words) and opened from there.
    const r = await opensPdf(page.context(), () => page.getByRole('button', { name: 'Print cut sheet' }).click(), /\/api\/garments\/[^/]+\/sheet$/);
    expect(r.status).toBe(200);
    expect(r.type).toBe('application/pdf');
    expect(r.url.searchParams.get('unit')).toBe('mm');
    await page.context().close();
  });

  it('an apprentice prints the morning’s sheets of the queue as filtered', async () => {
    const page = await tabletPage(browser);
    await signInAs(page, 'apprentice', '/queue');
    await page.getByLabel('Wanted by', { exact: true }).selectOption('today');
    const r = await opensPdf(page.context(), () => page.getByRole('link', { name: 'Print the morning’s sheets' }).click(), /\/api\/queue\/sheets$/);
    expect(r.status).toBe(200);
    expect(r.type).toBe('application/pdf');
    expect(r.url.searchParams.get('due')).toBe('today');
    expect(r.url.searchParams.get('today')).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    await page.context().close();
  });

  it('the counter sees neither button', async () => {
    const page = await tabletPage(browser);
    await signInAs(page, 'counter', '/queue');
    await page.getByTestId('queue-row').first().waitFor();
    expect(await page.getByRole('link', { name: 'Print the morning’s sheets' }).count()).toBe(0);
    // Found by the queue's search: other stories add work to the demo shop, and the list shows 50 rows a page.
    await page.getByLabel('Customer or ticket').fill('Navy suit');
    await page.getByRole('link', { name: 'Navy suit trousers' }).first().click();
    await page.waitForURL(/\/garments\/[0-9a-f-]{36}$/);
    await ready(page);
    expect(await page.getByRole('button', { name: 'Print cut sheet' }).count()).toBe(0);
    await page.context().close();
  });
});
