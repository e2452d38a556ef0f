// Jeans keeping the original hem, from intake to the printed sheet: the counter takes a pair of
// jeans in (its own fresh ticket: no shared demo garment is touched) asking for the original hem
// kept, the tailor records the fitting on that finish and reads where to chalk, prints the sheet,
// and the ticket is priced at the list's "Jeans, original hem kept".
// Check values (derived, docs/KINDS.md "Jeans keeping the factory hem", worked by hand): 2 in off a
// 5/8 in factory hem with the usual 3/8 in join allowance (common practice (no source)): the join
// 5/8 in above the pin mark, the leg cut 3/8 − 5/8 = 1/4 in above it, the band cut 2 − 5/8 − 3/8 = 1 in
// below, 2 − 2 × 3/8 = 1 1/4 in cut away. Taper: (9 − 8)/10 × 2 in = 1/5 in flat at the join, over the
// 1/8 in tolerance (TRADE.md): 1/4 in at each seam as printed (each side 1/10 in to the nearest 1/16).
// The price is the demo list's (src/services/demo-counter-seed.ts: 2200 cents, invented).
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { ready, sharedBrowser, TABLET } from './browser';
import { printSheetText, priceFromGarments } from './printed-sheet';
import { squash } from '../lib/cut-sheet/poppler';
import { signedInPage } from './sign-in';

const browser = sharedBrowser();

const field = (page: Page, label: string) => page.getByLabel(label, { exact: true });
// Segmented switches hide the radio itself: tap its label, as a finger would.
const choose = (page: Page, name: string) => page.locator('label', { has: page.getByRole('radio', { name, exact: true }) }).click();

describe('jeans keeping the original hem', () => {
  it('are taken in, fitted, chalked from the plan, printed and priced', async () => {
    const errors: string[] = [];

    // The counter takes the jeans in, asking for the original hem kept (priced as an estimate).
    const counter = await signedInPage(browser(), 'counter', '/tickets/new', TABLET);
    counter.on('pageerror', (e) => errors.push(e.message));
    await counter.getByRole('radio', { name: 'A new customer' }).check();
    await field(counter, 'Name').fill('Isolde Marchbank');
    await field(counter, 'Garment 1').fill('Indigo jeans, keep the hem');
    await counter.getByLabel('Finish asked for (priced as an estimate)').selectOption({ label: 'Original hem, kept' });
    await counter.getByRole('button', { name: 'Open ticket' }).click();
    await counter.waitForURL(/\/tickets\/[0-9a-f-]{36}$/);
    await ready(counter);
    const price = counter.getByRole('region', { name: 'Price' });
    await price.getByText('Jeans, original hem kept — Indigo jeans, keep the hem').waitFor();
    const ticketId = new URL(counter.url()).pathname.split('/').pop()!;
    const garmentId = await counter.evaluate(async (id) => (await (await fetch(`/api/tickets/${id}`)).json()).garments[0].id as string, ticketId);

    // The tailor records the fitting on the kept original hem and reads where to chalk.
    const tailor = await signedInPage(browser(), 'tailor', `/garments/${garmentId}`, TABLET);
    tailor.on('pageerror', (e) => errors.push(e.message));
    await choose(tailor, 'Original hem, kept');
    await field(tailor, 'Pin at the back (finished length)').fill('30');
    await field(tailor, 'Present edge below the pin mark').fill('2');
    await field(tailor, 'Factory hem depth').fill('5/8');
    await field(tailor, 'Width at the finished edge (flat)').fill('8');
    await field(tailor, 'Width higher up (flat)').fill('9');
    await field(tailor, 'Height of that width above the edge').fill('10');
    const legCut = tailor.getByTestId('original-line-leg-cut');
    await expect.poll(() => legCut.textContent().catch(() => null), { timeout: 10_000 }).toContain('1/4 in above');
    expect(await tailor.getByTestId('original-line-join').textContent()).toContain('5/8 in above');
    expect(await tailor.getByTestId('original-line-band-cut').textContent()).toContain('1 in below');
    expect(await tailor.getByTestId('original-sum-left').textContent()).toBe(
      'Shorten by 2 in = 1 1/4 in cut away + the seam allowance taken twice (2 × 3/8 in = 3/4 in).',
    );
    expect(await tailor.getByTestId('summary-cut').textContent()).toBe('1/4 in above');
    expect(await tailor.getByTestId('original-note-take-in-leg-above-join').textContent()).toContain('take the leg in');
    await tailor.screenshot({ path: 'test-results/jeans-original-hem-plan.png', fullPage: true });
    await choose(tailor, 'Right leg');
    await tailor.getByRole('button', { name: 'Same as the left leg' }).click();
    await tailor.getByRole('button', { name: /^Save measurements/ }).click();
    await tailor.getByText('Saved both legs.').waitFor();
    await tailor.getByTestId('history').getByText('Left leg, Present edge below the pin mark: nothing → 2 in').waitFor();

    // Printed from the garment page: the sheet comes back as a PDF with the chalk lines in words.
    const text = await printSheetText(tailor, garmentId);
    for (const words of [
      'Original hem kept, factory hem 5/8 in deep',
      'CUT · Cut the leg',
      '1/4 in above',
      'CUT · Cut off the hem band',
      'Shorten by 2 in = 1 1/4 in cut away + the seam allowance taken twice (2 × 3/8 in = 3/4 in).',
      'the leg and the band top differ by 1/4 in flat',
      'stitch 3/8 in from the edge',
      'a denim needle',
      'Finished length (back pin) 30 in',
    ])
      expect(text).toContain(squash(words));
    await tailor.context().close();

    // Back at the counter, the ticket priced from its garments keeps the jeans' own line.
    await priceFromGarments(counter, price, 'Jeans, original hem kept — Indigo jeans, keep the hem', '€22.00');
    expect(await price.getByRole('row', { name: /Plain hem/ }).count()).toBe(0);
    await counter.screenshot({ path: 'test-results/jeans-original-hem-ticket.png', fullPage: true });
    expect(errors).toEqual([]);
    await counter.context().close();
  });
});
