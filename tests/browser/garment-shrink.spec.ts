// A tailor takes up a pair of raw jeans not yet washed: on a plain hem she picks "Raw denim", sees the
// hem left long to shrink to the pin on the garment page, prints the sheet and reads the same figures.
// Raw denim 10 % (SHRINKAGE_PERCENT, from memory); rule derived (docs/KINDS.md): over a 30 in inseam
// the edge goes 30 × 0.1/0.9 = 3 1/3 → 3 3/8 in below the mark (eighths, up), the 1 1/2 in hem is cut
// 1 1/2/0.9 = 1 2/3 → 1 3/4 in, so the cut is 5 1/8 in below the mark; from the pin at 31 1/2 in the
// edge is chalked at 34 7/8 in and the cut at 36 5/8 in (plain arithmetic).
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { flatText, pdfFile, squash } from '../lib/cut-sheet/poppler';
import { ready, sharedBrowser, tabletPage } from './browser';
import { freshGarment } from './fresh-garment';
import { signInAs } from './sign-in';

const browser = sharedBrowser();

const field = (page: Page, label: string) => page.getByLabel(label, { exact: true });
const choose = (page: Page, name: string) => page.locator('label', { has: page.getByRole('radio', { name, exact: true }) }).click();

/** Presses Print and reads the sheet the page fetched (its URL, with the page's unit and paper), again through the page's cookies: the response event keeps no body. */
async function printedSheet(page: Page, click: () => Promise<void>): Promise<Uint8Array> {
  const response = page
    .context()
    .waitForEvent('response', { predicate: (r) => /\/api\/garments\/[^/]+\/sheet$/.test(new URL(r.url()).pathname), timeout: 30_000 });
  await click();
  const r = await response;
  expect(r.status()).toBe(200);
  expect(r.headers()['content-type']).toBe('application/pdf');
  const again = await page.request.get(r.url());
  expect(again.status()).toBe(200);
  return new Uint8Array(await again.body());
}

describe('unwashed cloth at the fitting', () => {
  it('a tailor picks raw denim on a plain hem, sees the hem left long, prints the sheet and reads it', async () => {
    const page = await tabletPage(browser());
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(e.message));
    await signInAs(page, 'tailor', '/queue');
    const id = await freshGarment(page, 'Raw indigo jeans, unwashed', 'Wendeline Obst');
    await page.goto(`/garments/${id}`);
    await ready(page);
    await choose(page, 'Plain hem');
    await field(page, 'Pin at the back (finished length)').fill('31 1/2');
    await field(page, 'Hem allowance').fill('1 1/2');
    // The cloth is a labelled select, chosen from the keyboard: focused, the arrow keys step through its options.
    const cloth = field(page, 'Cloth not yet washed');
    await cloth.focus();
    await page.keyboard.press('ArrowDown');
    expect(await cloth.inputValue()).toBe('raw-denim');
    await field(page, 'Length that shrinks to the mark').fill('30');

    const shrink = page.getByTestId('shrink-left');
    await shrink.waitFor({ timeout: 10_000 });
    const saidFirst = (await shrink.textContent()) ?? '';
    expect(saidFirst).toContain('Raw denim: expected to shrink 10% in length at the first wash (source: from memory');
    // The box shows from the back pin first (31 1/2 in → 3 1/2 in) until the typed 30 in reaches the plan: wait for it.
    await expect
      .poll(() => page.getByTestId('shrink-left-edge').textContent(), { timeout: 10_000 })
      .toBe('Chalk the finished edge 3 3/8 in below the pin mark.');
    const said = (await shrink.textContent()) ?? '';
    expect(await page.getByTestId('shrink-left-hem').textContent()).toBe('Unwashed hem allowance: 1 3/4 in.');
    expect(await page.getByTestId('shrink-left-cut').textContent()).toBe('Cut 5 1/8 in below the pin mark.');
    expect(said).toContain('wash and dry the trousers as they will be washed before altering, when the customer can');
    expect(said).toContain('A hot wash or the dryer');
    // One set of lines: the live plan's own chalk lines are the shrink figures (edge 3 3/8 in, cut
    // 5 1/8 in below the mark), never the plain plan's (edge at the mark, cut 1 1/2 in below it).
    const rows = page.getByTestId('plan-left').locator('tbody tr');
    await expect
      .poll(async () => rows.evaluateAll((trs) => trs.map((tr) => tr.querySelector('td')?.textContent ?? '')), { timeout: 10_000 })
      .toEqual(['3 3/8 in', '5 1/8 in']);
    expect(said).toContain('The plan’s chalk lines above are already these');
    // Cloth for the plain cut (1 1/2 in) but not the shrink cut: the page says so.
    await field(page, 'Cloth below the mark').fill('4');
    await page.getByTestId('no-fit').waitFor({ timeout: 10_000 });
    const noFit = (await page.getByTestId('no-fit').textContent()) ?? '';
    // 5 1/8 − 4 = 1 1/8 in short (plain arithmetic); the 4 in is said as typed, not less the edge.
    expect(noFit).toContain('1 1/8 in');
    expect(noFit).toMatch(/5 1\/8 in/);
    expect(noFit).toMatch(/4 in/);
    await field(page, 'Cloth below the mark').fill('');

    await page.locator('label', { has: page.getByRole('radio', { name: 'Right leg', exact: true }) }).click();
    await page.getByRole('button', { name: 'Same as the left leg' }).click();
    await page.getByRole('button', { name: 'Save measurements' }).click();
    await page.getByText('Saved both legs.').waitFor();

    const text = squash(flatText(pdfFile(await printedSheet(page, () => page.getByRole('button', { name: 'Print cut sheet' }).click()))));
    expect(text).toContain(squash('Pin mark 31 1/2 in + shrink allowance 3 3/8 in = finished edge (line 1) chalked at 34 7/8 in.'));
    expect(text).toContain(squash('Finished edge 34 7/8 in + unwashed hem allowance 1 3/4 in = cut (line 2) at 36 5/8 in, 5 1/8 in below the pin mark.'));
    // The sheet's plan is the same: a 1 3/4 in hem, cut 5 1/8 in below the pin mark.
    expect(text).toContain(squash('Plain hem, 1 3/4 in allowance'));
    expect(text).not.toContain(squash('These lines replace'));
    expect(text).toContain(squash('Caution: a hot wash or the dryer shrinks more than this'));
    // The bench's words reach the island compiled (an uncompiled catalog throws in the page).
    expect(errors).toEqual([]);
    await page.context().close();
  });
});
