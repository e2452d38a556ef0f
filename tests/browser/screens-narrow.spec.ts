// Every signed-in screen, for each role, on a phone (390 px), a tablet held upright (768 px) and
// one held sideways (1024 px): nothing scrolls sideways, no control hides behind a frame's edge
// (the queue's "Mark …" and Undo included), and every button and field stays finger-sized.
// A screen a role may not use answers its short refusal page, which must fit too.
// Screenshots in test-results/screens/<role>-<screen>-<width>.png.
import { mkdirSync } from 'node:fs';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import type { QueueRow } from '@/lib/bench-types';
import { ROLES } from '@/lib/roles';
import { launch, ready } from './browser';
import { layoutProblems, settled } from './layout-checks';
import { signInAs } from './sign-in';

const WIDTHS = [390, 768, 1024];
const SHOTS = 'test-results/screens';

let browser: Browser;

beforeAll(async () => {
  mkdirSync(SHOTS, { recursive: true });
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

/** The screens, with the demo ticket of two garments and a garment with a fitting on both legs. */
function screens(ticketId: string, garmentId: string): Record<string, string> {
  return {
    calculator: '/',
    queue: '/queue',
    ticket: `/tickets/${ticketId}`,
    'new-ticket': '/tickets/new',
    garment: `/garments/${garmentId}`,
    counter: `/counter/${ticketId}`,
    customers: '/customers',
    presets: '/presets',
    prices: '/prices',
    staff: '/staff',
    'sent-messages': '/sent-messages',
    'bench-settings': '/bench-settings',
    overview: '/overview?period=4w',
  };
}
const SCREEN_NAMES = Object.keys(screens('', ''));

for (const role of ROLES) {
  describe(`${role}: every screen fits at ${WIDTHS.join(', ')} px`, () => {
    let context: BrowserContext;
    let page: Page;
    let paths: Record<string, string>;

    beforeAll(async () => {
      context = await browser.newContext({ baseURL: inject('baseURL'), viewport: { width: WIDTHS[0]!, height: 900 }, hasTouch: true });
      page = await context.newPage();
      await signInAs(page, role, '/queue');
      // Both are in every role's queue: the navy pair is the apprentice's, the chinos nobody's.
      const rows = (await (await page.request.get('/api/garments')).json()) as QueueRow[];
      const navy = rows.find((r) => r.description === 'Navy suit trousers');
      const chinos = rows.find((r) => r.description === 'Stone chinos');
      expect(navy && chinos, 'demo garments in the queue').toBeTruthy();
      paths = screens(chinos!.ticketId, navy!.id);
    });
    afterAll(async () => {
      await context?.close();
    });

    for (const screen of SCREEN_NAMES) {
      it(`${screen}`, async () => {
        await page.setViewportSize({ width: WIDTHS[0]!, height: 900 });
        await page.goto(paths[screen]!);
        await settled(page);
        // Intake with two garments: the second row brings each row's Remove button.
        const another = page.getByRole('button', { name: 'Another garment' });
        if (await another.count()) {
          await another.click();
          await page.getByLabel('Garment 2', { exact: true }).waitFor();
        }
        const found: string[] = [];
        for (const width of WIDTHS) {
          await page.setViewportSize({ width, height: 900 });
          await page.evaluate(() => new Promise(requestAnimationFrame));
          found.push(...(await layoutProblems(page)).map((p) => `${width} px: ${p}`));
          await page.screenshot({ path: `${SHOTS}/${role}-${screen}-${width}.png`, fullPage: true });
        }
        expect(found).toEqual([]);
      });
    }
  });
}

describe('the queue on an upright tablet and a phone', () => {
  it('shows each card whole, its Mark button beside the garment (768 px) or under it (390 px), and Undo after a tap', async () => {
    const context = await browser.newContext({ baseURL: inject('baseURL'), viewport: { width: 768, height: 900 }, hasTouch: true });
    const page = await context.newPage();
    await signInAs(page, 'tailor', '/queue');
    // A ticket of its own, so the tap moves no demo garment another story reads.
    const number = await page.evaluate(async () => {
      const post = await fetch('/api/tickets', {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ customer: { name: 'Oriel Thackwray' }, garments: [{ description: 'Dove grey flannel trousers' }] }),
      });
      return ((await post.json()) as { number: number }).number;
    });
    await page.reload();
    await ready(page);
    await page.getByLabel('Customer or ticket').fill(`PH ${number}`);
    await expect.poll(() => page.getByTestId('queue-row').count()).toBe(1);
    const row = page.getByTestId('queue-row');
    const garment = row.getByRole('link', { name: 'Dove grey flannel trousers' });
    const mark = row.getByRole('button', { name: `Mark Chalk-marked: PH ${number} Dove grey flannel trousers` });

    const [g768, m768, r768] = await Promise.all([garment.boundingBox(), mark.boundingBox(), row.boundingBox()]);
    // Beside: the button starts right of the garment's name, inside the card, at the same height.
    expect(m768!.x).toBeGreaterThan(g768!.x + g768!.width);
    expect(m768!.x + m768!.width).toBeLessThanOrEqual(r768!.x + r768!.width);
    expect(m768!.y).toBeLessThan(g768!.y + g768!.height);
    expect(m768!.height).toBeGreaterThanOrEqual(44);

    await mark.click();
    const undo = row.getByRole('button', { name: `Undo: step PH ${number} Dove grey flannel trousers back to Received` });
    await undo.waitFor();
    for (const width of [768, 390]) {
      await page.setViewportSize({ width, height: 900 });
      await page.evaluate(() => new Promise(requestAnimationFrame));
      expect(await layoutProblems(page)).toEqual([]);
      const box = (await undo.boundingBox())!;
      expect(box.x).toBeGreaterThanOrEqual(0);
      expect(box.x + box.width).toBeLessThanOrEqual(width);
      expect(box.height).toBeGreaterThanOrEqual(44);
      await row.screenshot({ path: `${SHOTS}/queue-card-undo-${width}.png` });
    }
    // On the phone the action runs the card's width under the garment's name.
    const [g390, u390, r390] = await Promise.all([garment.boundingBox(), undo.boundingBox(), row.boundingBox()]);
    expect(u390!.y).toBeGreaterThan(g390!.y + g390!.height);
    expect(u390!.width).toBeGreaterThan(r390!.width * 0.75);
    await undo.click();
    await row.getByRole('status').getByText('Stepped back to Received.').waitFor();
    await context.close();
  });
});
