// Jacket sleeves shortened at the cuff, from intake to the printed sheet: the counter takes a jacket
// in as "Jacket or coat sleeves" (its own fresh ticket: no shared demo garment is touched), the
// tailor records the sleeve fitting and reads where to chalk and cut, saves it, prints the sheet and
// reads it back, and the ticket is priced at the list's own sleeves line.
// Check values (docs/KINDS.md "Sleeves shortened at the cuff", worked by hand; defaults common
// practice (no source), kind-defaults.ts): 1 in off, hem 1 1/2 in: the new edge 1 in above the
// present edge, the cut 1 1/2 − 1 = 1/2 in below it; four buttons from 1 1/4 in, 5/8 in apart, each
// moved up 1 in; a 5 in vent leaves 4 in, less the top button (3 1/8 in) and the 1/2 in margin: 3/8 in
// of room; the lining loses 1 in. The price is the demo list's (demo-counter-seed.ts: 3200 cents, invented).
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { ready, sharedBrowser, TABLET } from './browser';
import { printSheetText, priceFromGarments } from './printed-sheet';
import { squash } from '../lib/cut-sheet/poppler';
import { signedInPage } from './sign-in';

const browser = sharedBrowser();

const field = (page: Page, label: string) => page.getByLabel(label, { exact: true });

describe('jacket sleeves shortened at the cuff', () => {
  it('are taken in, fitted, planned, printed and priced', async () => {
    const errors: string[] = [];

    // The counter takes the jacket in as sleeves work: priced at once at the sleeves line.
    const counter = await signedInPage(browser(), 'counter', '/tickets/new', TABLET);
    counter.on('pageerror', (e) => errors.push(e.message));
    await counter.getByRole('radio', { name: 'A new customer' }).check();
    await field(counter, 'Name').fill('Wendel Ashcombe');
    await field(counter, 'Garment 1').fill('Charcoal wool jacket');
    await field(counter, 'Kind').selectOption({ label: 'Jacket or coat sleeves' });
    await counter.getByRole('button', { name: 'Open ticket' }).click();
    await counter.waitForURL(/\/tickets\/[0-9a-f-]{36}$/);
    await ready(counter);
    const price = counter.getByRole('region', { name: 'Price' });
    await price.getByText('Jacket or coat sleeves shortened (the pair) — Charcoal wool jacket').waitFor();
    const ticketId = new URL(counter.url()).pathname.split('/').pop()!;
    const garmentId = await counter.evaluate(async (id) => (await (await fetch(`/api/tickets/${id}`)).json()).garments[0].id as string, ticketId);

    // The tailor records the sleeve fitting and reads the plan as it is typed.
    const tailor = await signedInPage(browser(), 'tailor', `/garments/${garmentId}`, TABLET);
    tailor.on('pageerror', (e) => errors.push(e.message));
    await tailor.getByTestId('garment-kind').getByText('Jacket or coat sleeves').waitFor();
    await field(tailor, 'Shorten by').fill('1');
    await field(tailor, 'Buttonholes').selectOption({ label: 'Decorative: stitched, not cut' });
    await field(tailor, 'Vent length (its top above the edge)').fill('5');
    const cut = tailor.getByTestId('sleeve-line-cut');
    await expect.poll(() => cut.textContent().catch(() => null), { timeout: 10_000 }).toContain('1/2 in below');
    expect(await cut.textContent()).toContain('2 CUT · Cutting line');
    expect(await tailor.getByTestId('sleeve-line-new-edge').textContent()).toContain('1 in above');
    expect(await tailor.getByTestId('sleeve-button-4').textContent()).toBe('4+ 1 in3 1/8 in');
    expect(await tailor.getByTestId('sleeve-vent').textContent()).toBe('Vent after the work: 4 in; room above the top button: 3/8 in.');
    expect(await tailor.getByTestId('sleeve-note-restitch-buttonholes').textContent()).toBe('The buttonholes are decorative: stitch them again 1 in higher.');
    // Buttons past a 3 in vent: said under the field, the plan waits.
    await field(tailor, 'Vent length (its top above the edge)').fill('3');
    await tailor.getByText('The buttons reach past the vent.').first().waitFor();
    await field(tailor, 'Vent length (its top above the edge)').fill('5');
    await cut.waitFor();
    await tailor.screenshot({ path: 'test-results/jacket-sleeves-plan.png', fullPage: true });
    await tailor.getByRole('button', { name: 'Save fitting' }).click();
    await tailor.getByText('Fitting saved.').waitFor();

    // Printed from the garment page: the sheet comes back as a PDF with the chalk lines and sums in words.
    const text = await printSheetText(tailor, garmentId);
    for (const words of [
      'Charcoal wool jacket',
      'Shortened 1 in at the cuff, hem 1 1/2 in deep',
      'Cut 1 1/2 in below the new edge: 1 1/2 in − 1 in = 1/2 in below the present edge',
      'BUTTONS: 4, 5/8 in apart',
      'Vent: 5 in now − 1 in = 4 in after (its top stays).',
      'Room above the top button: 4 in − 3 1/8 in − 1/2 in kept below the vent',
      'Lining: shorten it 1 in, as the sleeve',
      'The buttonholes are decorative: stitch them again 1 in higher.',
      'Iron and steam burn',
      'Needles and pins',
      'CHALK GUIDE 1:1',
    ])
      expect(text).toContain(squash(words));
    await tailor.context().close();

    // Back at the counter, pricing from the garments keeps the sleeves' own line.
    await priceFromGarments(counter, price, 'Jacket or coat sleeves shortened (the pair) — Charcoal wool jacket', '€32.00');
    await counter.screenshot({ path: 'test-results/jacket-sleeves-ticket.png', fullPage: true });
    expect(errors).toEqual([]);
    await counter.context().close();
  });
});
