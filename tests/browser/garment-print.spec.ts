// The garment page at the fitting: each length shows what it was read as, the pinned length stays as
// typed and reaches the plan; printing with unsaved changes saves first (or says so), and a garment
// with no fitting says why in the page instead of opening a page of JSON.
// 31 3/4 + 1/8 = 31 7/8 in (plain arithmetic).
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { ready, sharedBrowser, tabletPage } from './browser';
import { freshGarment } from './fresh-garment';
import { signInAs } from './sign-in';

const browser = sharedBrowser();

const field = (page: Page, label: string) => page.getByLabel(label, { exact: true });
const PIN = 'Pin at the back (finished length)';

async function garmentPage(description: string): Promise<{ page: Page; id: string }> {
  const page = await tabletPage(browser());
  await signInAs(page, 'tailor', '/queue');
  const id = await freshGarment(page, description, 'Perpetua Lindqvist');
  await page.goto(`/garments/${id}`);
  await ready(page);
  return { page, id };
}

describe('typing lengths at the fitting', () => {
  it('reads each length back, keeps the pinned sum as typed and shows the finished length in the plan', async () => {
    const { page } = await garmentPage('Moss cord trousers');
    await field(page, PIN).fill('31 3/4 + 1/8');
    await field(page, 'Cuff depth').fill('38 mm');
    expect(await page.getByTestId('m-legs-left-backPin-reading').textContent()).toContain('= 31 7/8 in');
    // 38 mm = 1.496 in: 1 1/2 in to the eighth.
    expect(await page.getByTestId('m-legs-left-cuffDepth-reading').textContent()).toContain('= 1 1/2 in');
    await expect
      .poll(
        () =>
          page
            .getByTestId('finished-left')
            .textContent()
            .catch(() => null),
        { timeout: 10_000 },
      )
      .toBe('Finished length (back pin): 31 3/4 + 1/8 in = 31 7/8 in');
    await page.getByRole('button', { name: 'Save measurements' }).click();
    await page.getByText('Saved both legs.').waitFor();
    await page.reload();
    await ready(page);
    expect(await field(page, PIN).inputValue()).toBe('31 3/4 + 1/8');
    await page.context().close();
  });
});

describe('printing from the garment page', () => {
  it('says the fitting is unsaved, saves it, then prints what is now saved', async () => {
    const { page } = await garmentPage('Rust twill trousers');
    await field(page, PIN).fill('30 1/2');
    await field(page, 'Cuff depth').fill('1 1/2');
    await page.locator('label', { has: page.getByRole('radio', { name: 'Right leg', exact: true }) }).click();
    await page.getByRole('button', { name: 'Same as the left leg' }).click();
    await page.getByRole('button', { name: 'Save measurements' }).click();
    await page.getByText('Saved both legs.').waitFor();

    // The right leg is on screen: its cuff goes deeper, not yet saved.
    await field(page, 'Cuff depth').fill('1 3/4');
    const puts: string[] = [];
    page.on('request', (r) => {
      if (r.method() === 'PUT' && r.url().includes('/measurements')) puts.push(r.postData() ?? '');
    });
    await page.getByRole('button', { name: 'Print cut sheet' }).click();
    const warning = page.getByRole('alert').filter({ hasText: 'not saved' });
    expect(await warning.textContent()).toContain('The sheet prints what is saved, not what is on screen.');
    expect(puts).toEqual([]);

    const sheet = page.waitForResponse((r) => /\/api\/garments\/[^/]+\/sheet$/.test(new URL(r.url()).pathname));
    await page.getByRole('button', { name: 'Save, then print' }).click();
    const r = await sheet;
    expect(r.status()).toBe(200);
    expect(r.headers()['content-type']).toBe('application/pdf');
    // The save went out first, with the new depth.
    expect(puts).toHaveLength(1);
    expect(JSON.parse(puts[0]!).legs.right.cuffDepth).toBe('1 3/4');
    await page.getByText('Saved both legs.').waitFor();
    await page.context().close();
  });

  it('says in the page that a garment with no fitting has nothing to print yet', async () => {
    const { page } = await garmentPage('Plum velvet trousers');
    const pages: string[] = [];
    page.context().on('page', (p) => pages.push(p.url()));
    await page.getByRole('button', { name: 'Print cut sheet' }).click();
    const alert = page.getByRole('alert').filter({ hasText: 'fitting' });
    expect(await alert.textContent()).toBe('This garment has no fitting measurements yet: save the fitting first.');
    expect(pages).toEqual([]);
    expect(await page.locator('body').textContent()).not.toContain('{"error"');
    await page.screenshot({ path: 'test-results/garment-print-no-fitting.png', fullPage: false });
    await page.context().close();
  });
});
