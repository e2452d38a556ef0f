// A tailor at the bench with a tapered leg under a plain hem, on a pair let down first: the taper
// widths are asked for a plain hem too, the check shows beside the plan, and the width measured at
// the cutting line replaces the taper followed down. An unfinished pair is not asked for that width.
// Figures: TRADE.md's tapered example (7 in flat at the edge, 8 in 12 in up: Fit For A Queen 2012),
// the let-down ones arithmetic on it.
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { ready, sharedBrowser, tabletPage } from './browser';
import { freshGarment } from './fresh-garment';
import { signInAs } from './sign-in';

const browser = sharedBrowser();

const field = (page: Page, label: string) => page.getByLabel(label, { exact: true });
const choose = (page: Page, name: string) => page.locator('label', { has: page.getByRole('radio', { name, exact: true }) }).click();

/** The cutting line's row of the plain hem's taper check, as its text. */
const cutRow = (page: Page) =>
  page
    .getByTestId('hem-taper')
    .getByRole('row', { name: /Cutting line/ })
    .textContent({ timeout: 5_000 })
    .catch(() => null);

describe('a plain hem on a tapered leg, let down first', () => {
  it('checks the taper of a plain hem and uses the width measured at the cutting line', async () => {
    const page = await tabletPage(browser());
    await signInAs(page, 'tailor', '/queue');
    const id = await freshGarment(page, 'Fawn twill trousers', 'Halvard Quince', { existingFinish: 'plain-hem' });
    await page.goto(`/garments/${id}`);
    await ready(page);

    await choose(page, 'Plain hem');
    await field(page, 'Pin at the back (finished length)').fill('32');
    await field(page, 'Width at the finished edge (flat)').fill('7');
    await field(page, 'Width higher up (flat)').fill('8');
    await field(page, 'Height of that width above the edge').fill('12');
    // 1 1/2 in hem (the usual): the leg it lies against is 7 1/8 in, the taper followed down 6 7/8 in: let out 1/4 in.
    await page.getByRole('heading', { name: 'Tapered leg under a plain hem' }).waitFor();
    await page.getByTestId('hem-taper').getByText('7 1/8 in', { exact: true }).waitFor();
    await expect.poll(() => cutRow(page), { timeout: 10_000 }).toMatch(/6 7\/8 in\s*let out\s*1\/4 in\s*1\/8 in$/);

    // The old hem flared: 7 1/2 in measured at the cut, so the seams come in 3/8 in there.
    await field(page, 'Width at the cutting line (flat)').fill('7 1/2');
    await expect.poll(() => cutRow(page), { timeout: 10_000 }).toMatch(/7 1\/2 in\s*measured\s*take in\s*3\/8 in\s*3\/16 in$/);
    await page.getByTestId('measured-cut-left').getByText('7 1/2 in').waitFor();
    await page.screenshot({ path: 'test-results/bench-hem-taper-let-down.png', fullPage: true });

    // A width of 0 is refused on its field at save, and what was typed stays.
    await field(page, 'Width at the cutting line (flat)').fill('0');
    await page.getByRole('button', { name: /^Save measurements/ }).click();
    await page.getByText('Width at the cutting line must be more than 0.').first().waitFor();
    // The plan (and its short bar) may say it before the save's answer marks the field: wait for the field.
    await expect.poll(() => field(page, 'Width at the cutting line (flat)').getAttribute('aria-invalid')).toBe('true');

    await field(page, 'Width at the cutting line (flat)').fill('7 1/2');
    await page.getByRole('button', { name: /^Save measurements/ }).click();
    await page.getByText('Saved both legs.').waitFor();
    await page.getByTestId('history').getByText('Left leg, Width at the cutting line (flat): nothing → 7 1/2 in').waitFor();
    await page.context().close();
  });

  it('does not ask an unfinished pair for the width at the cutting line', async () => {
    const page = await tabletPage(browser());
    await signInAs(page, 'tailor', '/queue');
    const id = await freshGarment(page, 'New sand chinos', 'Halvard Quince', { existingFinish: 'unfinished' });
    await page.goto(`/garments/${id}`);
    await ready(page);
    await choose(page, 'Plain hem');
    await field(page, 'Width at the finished edge (flat)').waitFor();
    expect(await field(page, 'Width at the cutting line (flat)').count()).toBe(0);
    await page.context().close();
  });
});
