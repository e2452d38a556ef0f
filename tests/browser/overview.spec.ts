// The lead's overview story: from the nav to the overview of the seeded demo shop, each chart's bars
// the same numbers as the table beside them, no script sent, the period chosen in the URL, the CSV
// downloaded; a tailor finds neither the link nor the page.
import { buffer } from 'node:stream/consumers';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { sharedBrowser, tabletPage } from './browser';
import { settled } from './layout-checks';
import { signInAs } from './sign-in';

const browser = sharedBrowser();

/** Every bar's value in a chart, keyed by series and day (or row key). */
async function barsOf(page: Page, chart: string): Promise<Record<string, number>> {
  return page
    .locator(`svg[data-chart="${chart}"] rect[data-value]`)
    .evaluateAll((rects) =>
      Object.fromEntries(
        rects.map((r) => [
          `${r.getAttribute('data-series')}|${r.getAttribute('data-day') ?? r.getAttribute('data-key')}`,
          Number(r.getAttribute('data-value')),
        ]),
      ),
    );
}

/** Every table cell's number for the series, keyed the same way. */
async function cellsOf(page: Page, series: string[], attr = 'data-value'): Promise<Record<string, number>> {
  const sel = series.map((s) => `td[data-series="${s}"]`).join(', ');
  return page
    .locator(sel)
    .evaluateAll(
      (cells, a) =>
        Object.fromEntries(
          cells.map((c) => [
            `${c.getAttribute('data-series')}|${c.getAttribute('data-day') ?? c.getAttribute('data-key')}`,
            Number(c.getAttribute(a as string) ?? c.textContent),
          ]),
        ),
      attr,
    );
}

describe('the lead reads the shop week at a glance', () => {
  it('opens the overview from the nav; charts and tables agree; no script; four weeks; CSV', async () => {
    const page = await tabletPage(browser());
    const scripts: string[] = [];
    page.on('request', (r) => r.resourceType() === 'script' && scripts.push(r.url()));
    await signInAs(page, 'lead', '/queue');
    scripts.length = 0;
    await page.getByRole('navigation', { name: 'Shop' }).getByRole('link', { name: 'Overview' }).click();
    await page.waitForURL((u) => u.pathname === '/overview');
    await settled(page);
    expect(scripts).toEqual([]);
    expect(await page.locator('script[src], script[type="module"]').count()).toBe(0);
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent()).toMatch(/^This week at Pinmark & Hem/);
    // Charts are images with a name and a description, for a screen reader that reads the table.
    await page.getByRole('img', { name: 'Garments taken in and handed over per day' }).waitFor();

    for (const period of ['week', '4w']) {
      if (period === '4w') {
        await page.getByRole('navigation', { name: 'Period' }).getByRole('link', { name: 'Last 4 weeks' }).click();
        await page.waitForURL((u) => u.searchParams.get('period') === '4w');
        await settled(page);
      }
      const rows = await page.locator('table[data-table="days"] tbody tr').count();
      expect(rows).toBe(period === 'week' ? 7 : 28);
      const inOut = await barsOf(page, 'in-out');
      const due = await barsOf(page, 'due');
      const table = await cellsOf(page, ['takenIn', 'handedOver', 'dueDone', 'dueOpen', 'overdue'], 'data-none');
      expect({ ...inOut, ...due }).toEqual(table);
      expect(Object.keys(table)).toHaveLength(rows * 5);
      expect(await barsOf(page, 'waiting')).toEqual(await cellsOf(page, ['waiting'], 'data-none'));
      expect(await barsOf(page, 'takings')).toEqual(await cellsOf(page, ['takings']));
      // The seeded shop: garments at the bench, something taken in.
      expect(Object.values(await barsOf(page, 'waiting')).reduce((a, b) => a + b, 0)).toBeGreaterThan(0);
      expect(
        Object.entries(table)
          .filter(([k]) => k.startsWith('takenIn|'))
          .reduce((s, [, v]) => s + v, 0),
      ).toBeGreaterThan(0);
    }
    // Four weeks of the demo shop: paid by card and in cash.
    // Other stories may add online payments to the shared demo shop: card and cash are there whatever.
    expect(Object.keys(await barsOf(page, 'takings'))).toEqual(expect.arrayContaining(['takings|card', 'takings|cash']));
    await page.screenshot({ path: 'test-results/overview-4w.png', fullPage: true });
    await page.setViewportSize({ width: 390, height: 900 });
    await page.screenshot({ path: 'test-results/overview-390.png', fullPage: true });

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Download CSV' }).click()]);
    expect(download.suggestedFilename()).toMatch(/^cuffwright-overview-\d{4}-\d{2}-\d{2}-to-\d{4}-\d{2}-\d{2}\.csv$/);
    // Read through the connection: the browser is the run's, not this process's.
    const text = (await buffer(await download.createReadStream())).toString('utf8');
    expect(text.trimEnd().split('\r\n')).toHaveLength(28 + 2);
    await page.context().close();
  });

  it('a tailor has no overview link and is refused the page', async () => {
    const page = await tabletPage(browser());
    await signInAs(page, 'tailor', '/queue');
    expect(await page.getByRole('navigation', { name: 'Shop' }).getByRole('link', { name: 'Overview' }).count()).toBe(0);
    const res = await page.goto('/overview');
    expect(res!.status()).toBe(403);
    await page.getByRole('heading', { name: 'The overview is for the lead' }).waitFor();
    await page.context().close();
  });
});
