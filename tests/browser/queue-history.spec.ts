// The queue screen reads open work first; collected work is history, shown on request a page of
// 50 at a time with "Show older collected work" until it is all there.
import { describe, expect, inject, it } from 'vitest';
import { ready, sharedBrowser, tabletPage } from './browser';

const browser = sharedBrowser();

describe('the queue and its history', () => {
  it('shows open work, then collected work a page at a time on request', async () => {
    const page = await tabletPage(browser());
    const origin = inject('baseURL');
    const headers = { origin };
    // A shop of its own (the page's context keeps the new lead's cookie): 60 collected, 1 open.
    const email = `queue-history-${Date.now().toString(36)}@example.com`;
    const shop = await page.request.post('/api/shops', {
      headers,
      data: { shopName: 'History Hems', name: 'History Lead', email, password: 'a-long-password' },
    });
    expect(shop.status()).toBe(201);
    const c = await page.request.post('/api/customers', { headers, data: { name: 'Ottoline Pageworth' } });
    const customerId = (await c.json()).id;
    for (let t = 0; t < 3; t++) {
      const garments = Array.from({ length: 20 }, (_, i) => ({ description: `Collected pair ${t * 20 + i + 1}` }));
      const r = await page.request.post('/api/tickets', { headers, data: { customerId, note: 'history', garments } });
      expect(r.status()).toBe(201);
      const id = (await r.json()).id;
      // A ticket is handed over only priced: this work goes out with no charge.
      expect((await page.request.post(`/api/tickets/${id}/price-lines`, { headers, data: { source: 'no-charge', reason: 'history fixture' } })).status()).toBe(
        201,
      );
      for (const status of ['marked', 'cut', 'stitched', 'pressed', 'ready', 'collected']) {
        expect((await page.request.patch(`/api/tickets/${id}`, { headers, data: { status } })).status()).toBe(200);
      }
    }
    expect(
      (await page.request.post('/api/tickets', { headers, data: { customerId, note: 'open', garments: [{ description: 'Open flannels' }] } })).status(),
    ).toBe(201);

    await page.goto('/queue');
    await ready(page);
    const rows = page.getByTestId('queue-row');
    await expect.poll(() => rows.count()).toBe(1);
    await page.getByRole('button', { name: 'Show collected work too (history)' }).click();
    await expect.poll(() => rows.count()).toBe(51);
    await page.getByRole('button', { name: 'Show older collected work' }).click();
    await expect.poll(() => rows.count()).toBe(61);
    await page.getByText('That is all the collected work.').waitFor();
    await page.screenshot({ path: 'test-results/queue-history.png', fullPage: true });
    await page.context().close();
  });
});
