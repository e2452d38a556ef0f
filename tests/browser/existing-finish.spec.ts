// The counter takes in a pair that arrives with cuffs and says so at intake; after the fitting
// decides on a cuff again, pricing the ticket from its garments brings the list's "cuff let down
// and re-made" line by itself. The fitting goes through the API (the fitting form has its own story).
import { describe, expect, it } from 'vitest';
import { call, DEMO, signIn } from '../http/client';
import { ready, sharedBrowser, tabletPage } from './browser';
import { signInAs } from './sign-in';

const browser = sharedBrowser();

describe('a pair that comes in with cuffs', () => {
  it('is noted at intake, shown on the garment, and priced as a cuff let down and re-made', async () => {
    const page = await tabletPage(browser());
    await signInAs(page, 'counter', '/tickets/new');
    await page.getByRole('radio', { name: 'A new customer' }).check();
    await page.getByLabel('Name', { exact: true }).fill('Aurelio Penhallow');
    await page.getByLabel('Garment 1', { exact: true }).fill('Black barathea trousers');
    const existing = page.getByLabel('Existing finish', { exact: true });
    // A pair is taken to have a plain hem until the counter says otherwise.
    await expect(existing.inputValue()).resolves.toBe('plain-hem');
    await existing.selectOption({ label: 'Cuff' });
    await existing.focus();
    await page.screenshot({ path: 'test-results/intake-existing-cuff.png', fullPage: true });
    await page.getByRole('button', { name: 'Open ticket' }).click();
    await page.waitForURL(/\/tickets\/[0-9a-f-]{36}$/);
    const ticketId = new URL(page.url()).pathname.split('/').pop()!;

    const tailor = await signIn(DEMO.tailor);
    const garmentId = (await call('GET', `/api/tickets/${ticketId}`, { cookie: tailor })).body.garments[0].id;
    const garment = await call('GET', `/api/garments/${garmentId}`, { cookie: tailor });
    expect(garment.body.existingFinish).toBe('cuff');
    const leg = { finish: 'cuff', backPin: '31 1/2', cuffDepth: '1 1/2', available: '5 1/2' };
    const fitted = await call('PUT', `/api/garments/${garmentId}/measurements`, { cookie: tailor, body: { unit: 'in', legs: { left: leg, right: leg } } });
    expect(fitted.status).toBe(200);

    await page.reload();
    await ready(page);
    const price = page.getByRole('region', { name: 'Price' });
    await page.getByRole('button', { name: 'Price from the garments' }).click();
    await price.getByText('Cuff let down and re-made — Black barathea trousers').waitFor();
    // The demo list's amount for that line (src/services/demo-counter-seed.ts: 2950 cents).
    await expect(price.getByRole('row', { name: /Total/ }).textContent()).resolves.toContain('€29.50');
    expect(await price.getByRole('row', { name: /Cuff from a plain hem/ }).count()).toBe(0);
    await page.screenshot({ path: 'test-results/ticket-existing-cuff-priced.png', fullPage: true });

    await page.goto(`/garments/${garmentId}`);
    await ready(page);
    await page.getByText('Cuff: let down and press out the old creases first').waitFor();
    await page.screenshot({ path: 'test-results/garment-existing-cuff.png', fullPage: true });
    await page.context().close();

    // The tailor finds at the fitting that the old cuffs were faced, not turned: a plain hem after all.
    const bench = await tabletPage(browser());
    await signInAs(bench, 'tailor', `/garments/${garmentId}`);
    await bench.getByRole('button', { name: 'Change description, due date, who or existing finish' }).click();
    const edit = bench.getByRole('form', { name: 'Edit the garment' });
    await expect(edit.getByLabel('Existing finish', { exact: true }).inputValue()).resolves.toBe('cuff');
    await edit.getByLabel('Existing finish', { exact: true }).selectOption({ label: 'Plain hem' });
    await bench.screenshot({ path: 'test-results/garment-edit-existing-finish.png', fullPage: true });
    await edit.getByRole('button', { name: 'Save' }).click();
    await edit.waitFor({ state: 'detached' });
    await bench.getByText('Existing finish: Cuff → Plain hem').waitFor();
    const after = await call('GET', `/api/garments/${garmentId}`, { cookie: tailor });
    expect(after.body.existingFinish).toBe('plain-hem');
    await bench.context().close();
  });
});
