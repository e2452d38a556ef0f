// The calculator at the bench: a tailor plans a cuff in inches, then in millimetres, mistypes,
// and changes the finish with the keyboard alone. Ends with a screenshot to look at.
import { mkdirSync } from 'node:fs';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { launch, ready, tabletPage } from './browser';

let browser: Browser;
let page: Page;
const offsite: string[] = [];

beforeAll(async () => {
  browser = await launch();
  page = await tabletPage(browser);
  const origin = new URL(inject('baseURL')).origin;
  page.on('request', (r) => {
    if (!r.url().startsWith(origin) && !r.url().startsWith('data:')) offsite.push(r.url());
  });
  await page.goto('/');
  await ready(page);
});

afterAll(async () => {
  await browser?.close();
});

const cut = () => page.getByTestId('cut-line');
const cutText = () =>
  cut()
    .textContent({ timeout: 5_000 })
    .catch(() => null);
const field = (label: string) => page.getByLabel(label, { exact: true });
// Tap the switch segment, as a finger would: the radio inside it is visually hidden.
const choose = (name: string) => page.locator('label', { has: page.getByRole('radio', { name, exact: true }) }).click();

describe('the hem and cuff calculator', () => {
  it('reads 4 1/2 in off the cutting line for a 1 1/2 in cuff with 5 in of cloth', async () => {
    expect(await page.title()).toBe('Hem and cuff calculator · Cuffwright');
    await field('Cuff depth').fill('1 1/2');
    await field('Cloth below the mark').fill('5');
    await expect.poll(cutText, { timeout: 10_000 }).toBe('4 1/2 in');
    await expect.poll(() => page.getByText('Enough cloth.').isVisible()).toBe(true);
    const rows = await page.getByRole('table').first().getByRole('row').allInnerTexts();
    expect(rows.slice(1).map((r) => r.replace(/\s+/g, ' ').trim())).toEqual([
      '1 Finished edge 0 in 5 in',
      '2 Cuff top 1 1/2 in 3 1/2 in',
      '3 Inner fold 3 in 2 in',
      '4 Cutting line 4 1/2 in 1/2 in',
    ]);
    // The cutting line is big and in the cut colour: readable at arm's length.
    const style = await cut().evaluate((el) => {
      const s = getComputedStyle(el);
      return { size: parseFloat(s.fontSize), color: s.color };
    });
    expect(style.size).toBeGreaterThanOrEqual(56);
    expect(style.color).toBe('rgb(163, 34, 27)');
    expect(await page.getByRole('img', { name: 'The cuff drawn to scale' }).isVisible()).toBe(true);
  });

  it('switches to millimetres, carries the cloth over as measured, and reads the metric cut for a 40 mm cuff', async () => {
    await choose('mm');
    // 5 in = 127 mm (NBS 1959).
    expect(await field('Cloth below the mark').inputValue()).toBe('127');
    await field('Cuff depth').fill('40');
    await expect.poll(cutText, { timeout: 10_000 }).toBe('120 mm');
    // 5 in = 127 mm (NBS 1959): 7 mm to spare below the cut.
    await expect.poll(() => page.getByText('Spare: 7 mm.').isVisible()).toBe(true);
  });

  it('shows the message beside the field for "abc" and keeps what was typed', async () => {
    await field('Cuff depth').fill('abc');
    const error = page.locator('#f-cuffDepth-error');
    await expect.poll(() => error.textContent().catch(() => null), { timeout: 10_000 }).toMatch(/not a length/);
    expect(await field('Cuff depth').getAttribute('aria-describedby')).toContain('f-cuffDepth-error');
    expect(await field('Cuff depth').getAttribute('aria-invalid')).toBe('true');
    expect(await field('Cuff depth').inputValue()).toBe('abc');
    expect(await field('Cloth below the mark').inputValue()).toBe('127');
    expect(await page.getByRole('alert').first().textContent()).toMatch(/do not cut by them/);
    await field('Cuff depth').fill('40');
    await expect.poll(() => error.count(), { timeout: 10_000 }).toBe(0);
    await expect.poll(cutText).toBe('120 mm');
  });

  it('reaches the finish switch with the keyboard alone and changes it to a plain hem', async () => {
    await page.goto('/');
    await ready(page);
    let reached = false;
    for (let i = 0; i < 20 && !reached; i++) {
      await page.keyboard.press('Tab');
      reached = await page.evaluate(() => (document.activeElement as HTMLInputElement | null)?.name === 'finish');
    }
    expect(reached).toBe(true);
    // Focus is visible on the switch itself, not lost on a hidden radio.
    const outline = await page.evaluate(() => getComputedStyle(document.activeElement!.closest('label')!).outlineStyle);
    expect(outline).toBe('solid');
    await page.keyboard.press('ArrowRight');
    expect(await page.getByRole('radio', { name: 'Plain hem' }).isChecked()).toBe(true);
    expect(await field('Hem allowance').isVisible()).toBe(true);
    // A plain hem with the usual allowance (1 1/2 in, powersewing.com range) cuts 1 1/2 in below the mark.
    await expect.poll(cutText, { timeout: 10_000 }).toBe('1 1/2 in');
  });

  it('says the server’s own words beside a length too long or cleared, checked in the page', async () => {
    await page.goto('/');
    await ready(page);
    const error = page.locator('#f-cuffDepth-error');
    const message = () => error.textContent({ timeout: 5_000 }).catch(() => null);
    // 41 characters: over the 40 the API takes for a length.
    const long = '1 1/2 + 1/8 + 1/8 + 1/8 + 1/8 + 1/8 + 1/8';
    await field('Cuff depth').fill(long);
    await expect.poll(message).toBe('Cuff depth is too long: type a length such as 1 1/2.');
    expect(await field('Cuff depth').getAttribute('aria-invalid')).toBe('true');
    // The same words as the API answers for the same entry.
    const answer = await page.request.post('/api/plan', { data: { kind: 'cuff', unit: 'in', precision: 8, cuffDepth: long } });
    expect(answer.status()).toBe(422);
    expect((await answer.json()).issues.cuffDepth).toBe(await message());
    await field('Cuff depth').fill('');
    await expect.poll(message).toBe('Enter the cuff depth.');
    await field('Cuff depth').fill('1 1/2');
    await expect.poll(() => error.count()).toBe(0);
  });

  it('keeps every tap target at least 44 px tall and loads nothing from elsewhere', async () => {
    await choose('Cuff');
    await field('Cuff depth').fill('1 1/2');
    await field('Cloth below the mark').fill('4');
    await page.getByText('Tapered leg: check the width').click();
    await field('Width at the finished edge').fill('8');
    await field('Width higher up').fill('10');
    await field('…measured this high above the edge').fill('12');
    await field('Seam allowance (optional)').fill('1/2');
    await expect.poll(() => page.getByRole('heading', { name: 'Tapered leg' }).isVisible(), { timeout: 10_000 }).toBe(true);
    await expect.poll(() => page.getByText(/Short by/).isVisible()).toBe(true);
    const small = await page.evaluate(() =>
      [...document.querySelectorAll('main button, main input:not([type=radio]), main summary, main label:has(input[type=radio])')]
        .filter((el) => el.getBoundingClientRect().height < 44)
        .map((el) => el.outerHTML.slice(0, 80)),
    );
    expect(small).toEqual([]);
    expect(offsite).toEqual([]);
    mkdirSync('test-results', { recursive: true });
    await page.screenshot({ path: 'test-results/calculator.png', fullPage: true });
  });
});
