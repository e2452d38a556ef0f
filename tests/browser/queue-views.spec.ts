// Issue 15, the queue: ready work waiting for its customer stands apart from bench work with its
// own wait ("Ready 3 days"), only bench work is overdue; the filters, sort and search live in the
// address; on a phone the work comes first with the filters behind one button; a long list is
// drawn a page at a time; an apprentice's Tailor filter offers only what can match.
// Each story but the apprentice's works in a shop of its own, made through sign-up.
import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { ready, sharedBrowser, tabletPage } from './browser';
import { signInAs } from './sign-in';

const browser = sharedBrowser();

/** Signs up a new shop in the page's context (the context keeps the lead's cookie); returns a customer id. */
async function newShop(
  page: Page,
  name: string,
): Promise<{ customerId: string; post: (path: string, data: unknown) => Promise<{ status: number; body: { id: string; number: number } }> }> {
  const headers = { origin: inject('baseURL') };
  const email = `${name.toLowerCase().replace(/\W+/g, '-')}-${Date.now().toString(36)}@example.com`;
  const shop = await page.request.post('/api/shops', { headers, data: { shopName: name, name: `${name} Lead`, email, password: 'a-long-password' } });
  expect(shop.status()).toBe(201);
  const post = async (path: string, data: unknown) => {
    const r = await page.request.post(path, { headers, data });
    return { status: r.status(), body: await r.json() };
  };
  const c = await post('/api/customers', { name: 'Wendeline Ashcombe', phone: '555 0134 22' });
  expect(c.status).toBe(201);
  return { customerId: c.body.id, post };
}

/** A date this many days from today on this machine's calendar (as the browser reads due dates). */
function day(offset: number, from = new Date()): string {
  const d = new Date(from);
  d.setDate(d.getDate() + offset);
  return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}-${String(d.getDate()).padStart(2, '0')}`;
}

describe('bench work and work waiting for pickup', () => {
  it('shows them apart: the ready pair says how long it has waited, and only bench work says Overdue', async () => {
    const page = await tabletPage(browser());
    const { customerId, post } = await newShop(page, 'Apart Hems');
    const headers = { origin: inject('baseURL') };
    const bench = await post('/api/tickets', { customerId, garments: [{ description: 'Bench flannels', dueOn: day(-1) }] });
    const done = await post('/api/tickets', { customerId, garments: [{ description: 'Ready chinos', dueOn: day(-1) }] });
    expect([bench.status, done.status]).toEqual([201, 201]);
    for (const status of ['marked', 'cut', 'stitched', 'pressed', 'ready']) {
      expect((await page.request.patch(`/api/tickets/${done.body.id}`, { headers, data: { status } })).status()).toBe(200);
    }
    // Three days on: the browser's calendar says so (timers keep running).
    await page.clock.setFixedTime(new Date(Date.now() + 3 * 86_400_000));
    await page.goto('/queue');
    await ready(page);
    const anyRow = (text: string) => page.getByTestId('queue-row').filter({ hasText: text });
    await anyRow('Bench flannels').getByText('Overdue').waitFor();
    // The ready pair is not late work: no red "Overdue" on it.
    expect(await anyRow('Ready chinos').getByText('Overdue').count()).toBe(0);

    const atBench = page.getByTestId('queue-bench');
    const waiting = page.getByTestId('queue-waiting');
    await atBench.getByRole('heading', { name: /At the bench/ }).waitFor();
    await waiting.getByRole('heading', { name: /Ready, waiting for pickup/ }).waitFor();
    const benchRow = atBench.getByTestId('queue-row').filter({ hasText: 'Bench flannels' });
    const readyRow = waiting.getByTestId('queue-row').filter({ hasText: 'Ready chinos' });
    await benchRow.getByText('Overdue').waitFor();
    expect(await readyRow.getByTestId('ready-age').innerText()).toBe('Ready 3 days');
    expect(await waiting.getByText('Overdue').count()).toBe(0);
    expect(await atBench.getByText('Ready chinos').count()).toBe(0);
    await page.screenshot({ path: 'test-results/queue-apart.png', fullPage: true });

    // The overdue filter is about bench work: the ready pair is not in it.
    await page.getByLabel('Wanted by', { exact: true }).selectOption('overdue');
    await expect.poll(() => page.getByTestId('queue-row').count()).toBe(1);
    await benchRow.waitFor();
    await page.context().close();
  });
});

describe('the queue’s address', () => {
  it('keeps filters, sort and search, so a reload or a shared link opens the same queue', async () => {
    const page = await tabletPage(browser());
    const { customerId, post } = await newShop(page, 'Address Hems');
    for (const description of ['Sage linen trousers', 'Sage cords', 'Rust chinos']) {
      expect((await post('/api/tickets', { customerId, garments: [{ description, dueOn: day(-2) }] })).status).toBe(201);
    }
    await page.goto('/queue');
    await ready(page);
    await expect.poll(() => page.getByTestId('queue-row').count()).toBe(3);
    await page.getByLabel('Customer or ticket').fill('sage');
    await expect.poll(() => new URL(page.url()).searchParams.get('search')).toBe('sage');
    await page.getByLabel('Stage', { exact: true }).selectOption('received');
    await page.getByLabel('Tailor', { exact: true }).selectOption('nobody');
    await page.getByLabel('Wanted by', { exact: true }).selectOption('overdue');
    await page.getByRole('button', { name: 'Ticket no.' }).click();
    await page.getByRole('button', { name: 'Ticket no.' }).click();
    await expect.poll(() => new URL(page.url()).searchParams.get('sort')).toBe('-ticketNumber');
    const url = new URL(page.url());
    expect(Object.fromEntries(url.searchParams)).toEqual({ step: 'received', who: 'nobody', due: 'overdue', search: 'sage', sort: '-ticketNumber' });

    const expectRestored = async (p: Page) => {
      await expect.poll(() => p.getByTestId('queue-row').count()).toBe(2);
      expect(await p.getByLabel('Customer or ticket').inputValue()).toBe('sage');
      expect(await p.getByLabel('Stage', { exact: true }).inputValue()).toBe('received');
      expect(await p.getByLabel('Tailor', { exact: true }).inputValue()).toBe('nobody');
      expect(await p.getByLabel('Wanted by', { exact: true }).inputValue()).toBe('overdue');
      expect(await p.getByRole('columnheader', { name: 'Ticket no.' }).getAttribute('aria-sort')).toBe('descending');
      // Descending: the later ticket (Sage cords) first.
      expect(await p.getByTestId('queue-row').first().innerText()).toContain('Sage cords');
    };
    await page.reload();
    await ready(page);
    await expectRestored(page);
    // The same address opened afresh, as a shared link is (same person, new tab).
    const other = await page.context().newPage();
    await other.goto(url.toString());
    await ready(other);
    await expectRestored(other);
    // Back from a garment opens the queue as it was left.
    await page.getByRole('link', { name: 'Sage cords' }).click();
    await page.waitForURL(/\/garments\//);
    await page.goBack();
    await ready(page);
    await expectRestored(page);
    await page.context().close();
  });
});

describe('the queue on a phone', () => {
  it('shows the first row of work on the first screen, with the filters behind one button', async () => {
    const context = await browser().newContext({ baseURL: inject('baseURL'), viewport: { width: 390, height: 844 }, hasTouch: true });
    const page = await context.newPage();
    await signInAs(page, 'lead', '/queue');
    const first = page.getByTestId('queue-row').first();
    await first.waitFor();
    // Measured once the row stands still: a refetch landing now may redraw it (a detached row has no box).
    const link = first.getByRole('link').first();
    await expect.poll(() => link.boundingBox()).not.toBeNull();
    const box = (await link.boundingBox())!;
    expect(box.y + box.height).toBeLessThanOrEqual(844);
    await page.screenshot({ path: 'test-results/queue-phone.png' });

    const filters = page.getByRole('button', { name: /^Filters/ });
    expect(await filters.getAttribute('aria-expanded')).toBe('false');
    expect(await page.getByLabel('Stage', { exact: true }).isVisible()).toBe(false);
    // Keyboard: the button opens the filters and the focus goes to the first of them.
    await filters.focus();
    await page.keyboard.press('Enter');
    await expect.poll(() => filters.getAttribute('aria-expanded')).toBe('true');
    await expect.poll(() => page.evaluate(() => document.activeElement?.id)).toBe('q-step');
    await page.getByLabel('Wanted by', { exact: true }).selectOption('overdue');
    await page.getByLabel('Wanted by', { exact: true }).focus();
    await page.keyboard.press('Shift+Tab');
    await page.keyboard.press('Shift+Tab');
    await page.keyboard.press('Shift+Tab');
    await page.keyboard.press('Enter');
    await expect.poll(() => filters.getAttribute('aria-expanded')).toBe('false');
    // A filter left on says so on the folded button.
    expect(await filters.innerText()).toContain('1 on');
    await page.screenshot({ path: 'test-results/queue-phone-filtered.png' });
    await context.close();
  });
});

describe('a long queue', () => {
  it('is drawn 50 rows a page, with a pager the keyboard works', async () => {
    const page = await tabletPage(browser());
    const { customerId, post } = await newShop(page, 'Long Hems');
    for (let t = 0; t < 6; t++) {
      const garments = Array.from({ length: 20 }, (_, i) => ({ description: `Pair ${t * 20 + i + 1}` }));
      expect((await post('/api/tickets', { customerId, note: 'many', garments })).status).toBe(201);
    }
    await page.goto('/queue');
    await ready(page);
    // 120 open garments: 50 drawn (every row of the page is counted, whatever its section).
    await page.getByTestId('queue-row').nth(49).waitFor();
    await page.waitForLoadState('networkidle');
    expect(await page.getByTestId('queue-row').count()).toBe(50);
    const bench = page.getByTestId('queue-bench');
    const rows = bench.getByTestId('queue-row');
    await bench.getByRole('heading', { name: 'At the bench (120)' }).waitFor();
    const pager = page.getByRole('navigation', { name: 'Pages of Garments at the bench' });
    await pager.getByText('Page 1 of 3').waitFor();
    expect(await pager.getByRole('button', { name: 'Previous page' }).getAttribute('aria-disabled')).toBe('true');

    await pager.getByRole('button', { name: 'Next page' }).focus();
    await page.keyboard.press('Enter');
    await pager.getByText('Page 2 of 3').waitFor();
    expect(await rows.count()).toBe(50);
    // The focus goes to the section's heading, where the new page starts.
    await expect.poll(() => page.evaluate(() => document.activeElement?.tagName)).toBe('H2');
    await pager.getByRole('button', { name: 'Next page' }).click();
    await pager.getByText('Page 3 of 3').waitFor();
    expect(await rows.count()).toBe(20);
    // The caption tells a screen reader which part of the list this is.
    expect(await bench.locator('caption').innerText()).toContain('101–120 of 120 shown, page 3 of 3');

    // A search narrows the list and starts again from its first page.
    await page.getByLabel('Customer or ticket').fill('Pair 11');
    await expect.poll(() => rows.count()).toBe(11);
    expect(await pager.count()).toBe(0);
    await page.screenshot({ path: 'test-results/queue-long.png' });
    await page.context().close();
  });
});

describe('the apprentice’s Tailor filter', () => {
  it('offers only what can match: their own work and unassigned work, no one else by name', async () => {
    const page = await tabletPage(browser());
    await signInAs(page, 'apprentice', '/queue');
    await page.getByTestId('queue-row').first().waitFor();
    const options = await page.locator('#q-who option').allInnerTexts();
    expect(options).toEqual(['Mine and unassigned', 'Mine', 'Unassigned']);
    expect(await page.getByLabel('Tailor', { exact: true }).count()).toBe(1);
    await page.context().close();
  });
});
