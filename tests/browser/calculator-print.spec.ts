// The public calculator says the truth and prints: what each field was read as, lengths carried
// over when the unit changes, "does not fit" when the cloth is short, a Print button that fetches
// the cut sheet, a page that prints whole from the browser, and a drawing legible on a phone.
// 1 in = 25.4 mm exactly (NBS 1959, docs/TRADE.md); a cuff takes three cuff depths below the
// mark (TRADE.md: cuff depth, cuff face, third section), so 1 1/2 in cuts at 4 1/2 in.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { ready, sharedBrowser, tabletPage } from './browser';

const browser = sharedBrowser();
const dir = mkdtempSync(join(tmpdir(), 'calculator-print-'));

const field = (page: Page, label: string) => page.getByLabel(label, { exact: true });
const reading = (page: Page, name: string) =>
  page
    .getByTestId(`f-${name}-reading`)
    .textContent({ timeout: 5_000 })
    .catch(() => null);
const choose = (page: Page, name: string) => page.locator('label', { has: page.getByRole('radio', { name, exact: true }) }).click();

async function calculator(b: Browser, width = 1180): Promise<Page> {
  const page =
    width === 1180
      ? await tabletPage(b)
      : await (await b.newContext({ baseURL: inject('baseURL'), viewport: { width, height: 900 }, hasTouch: true })).newPage();
  await page.goto('/');
  await ready(page);
  return page;
}

/** The text of each page of a PDF, read back with poppler's pdftotext. */
function pdfPages(bytes: Buffer): string[] {
  const file = join(dir, `p-${Date.now()}-${Math.random().toString(36).slice(2)}.pdf`);
  writeFileSync(file, bytes);
  const pages = Number(/Pages:\s+(\d+)/.exec(spawnSync('pdfinfo', [file], { encoding: 'utf8' }).stdout)?.[1] ?? 0);
  return Array.from({ length: pages }, (_, i) =>
    spawnSync('pdftotext', ['-f', String(i + 1), '-l', String(i + 1), file, '-'], { encoding: 'utf8' }).stdout.replace(/\s+/g, ' '),
  );
}

describe('the calculator reads back and carries lengths', () => {
  it('shows beside each length what it was read as, a sum worked out', async () => {
    const page = await calculator(browser());
    await field(page, 'Cuff depth').fill('1 ½');
    await field(page, 'Cloth below the mark').fill('4 1/2 + 1/2');
    // Shown at once, before any answer from the server: 4 1/2 + 1/2 = 5 in.
    expect(await reading(page, 'cuffDepth')).toContain('= 1 1/2 in');
    expect(await reading(page, 'available')).toContain('= 5 in');
    expect(await field(page, 'Cloth below the mark').getAttribute('aria-describedby')).toContain('f-available-reading');
    await field(page, 'Cuff depth').fill('1 1/2 +');
    await expect.poll(() => page.getByTestId('f-cuffDepth-reading').count()).toBe(0);
    await page.context().close();
  });

  it('writes what was typed in the new unit when the unit changes, and flags what it could not read', async () => {
    const page = await calculator(browser());
    await field(page, 'Cuff depth').fill('1 ½');
    await field(page, 'Cloth below the mark').fill('5');
    await field(page, 'Turn-under').fill('1/2 +');
    await choose(page, 'cm');
    // 1 1/2 in = 38.1 mm, to the half millimetre 3.8 cm; 5 in = 127 mm = 12.7 cm.
    expect(await field(page, 'Cuff depth').inputValue()).toBe('3.8');
    expect(await field(page, 'Cloth below the mark').inputValue()).toBe('12.7');
    expect(await field(page, 'Turn-under').inputValue()).toBe('1/2 +');
    expect(await page.locator('#f-turnUnder-note').textContent()).toBe(
      'Left as typed in inches: it could not be read, so it was not changed to centimetres. Check it.',
    );
    // Back in inches, it means what it was typed to mean again: no flag.
    await choose(page, 'mm');
    expect(await page.locator('#f-turnUnder-note').textContent()).toContain('Left as typed in inches');
    await choose(page, 'in · 1/8');
    expect(await page.locator('#f-turnUnder-note').count()).toBe(0);
    expect(await field(page, 'Cuff depth').inputValue()).toBe('1 1/2');
    await page.context().close();
  });
});

describe('short of cloth', () => {
  it('says it does not fit, with what still fits first, and gives no line to cut at', async () => {
    const page = await calculator(browser());
    await field(page, 'Cuff depth').fill('1 1/2');
    await field(page, 'Cloth below the mark').fill('1');
    // Needs 4 1/2 in, has 1 in: short by 3 1/2 in.
    const headline = page.getByRole('heading', { name: /Does not fit/ });
    await expect
      .poll(() => headline.textContent({ timeout: 10_000 }).catch(() => null), { timeout: 10_000 })
      .toBe('Does not fit: do not cut. Short by 3 1/2 in.');
    expect(await page.getByTestId('cut-line').count()).toBe(0);
    expect(await page.getByRole('heading', { name: /Cut at line/i }).count()).toBe(0);
    // The first thing in the plan is the verdict with the alternatives.
    const first = await page.locator('section[aria-label="Plan"] > div > *').first().getAttribute('data-testid');
    expect(first).toBe('no-fit');
    expect(await page.getByTestId('no-fit').textContent()).toMatch(/What still fits:.*A plain hem needs/);
    await page.context().close();
  });
});

describe('printing the calculator', () => {
  it('prints the cut sheet on A4 in the unit chosen, opening the PDF', async () => {
    const page = await calculator(browser());
    await choose(page, 'cm');
    await field(page, 'Cuff depth').fill('4');
    await field(page, 'Cloth below the mark').fill('13');
    await expect
      .poll(
        () =>
          page
            .getByTestId('cut-line')
            .textContent()
            .catch(() => null),
        { timeout: 10_000 },
      )
      .toBe('12 cm');
    await page.getByLabel('Paper').selectOption('A4');
    const answer = page.waitForResponse((r) => new URL(r.url()).pathname === '/api/plan/sheet');
    const popup = page.context().waitForEvent('page');
    await page.getByRole('button', { name: 'Print cut sheet' }).click();
    const r = await answer;
    expect(r.status()).toBe(200);
    expect(r.headers()['content-type']).toBe('application/pdf');
    expect(r.request().postDataJSON()).toMatchObject({ kind: 'cuff', unit: 'cm', pageSize: 'A4', cuffDepth: '4', available: '13' });
    expect((await popup).url()).toMatch(/^blob:/);
    // The sheet the tailor gets, through the page's own download link.
    const download = page.waitForEvent('download');
    await page.getByRole('link', { name: 'Download the PDF' }).click();
    // Saved where this process can read it: the browser is the run's, reached over a connection.
    const file = join(mkdtempSync(join(tmpdir(), 'cuffwright-download-')), 'sheet.pdf');
    await (await download).saveAs(file);
    const text = pdfPages(readFileSync(file)).join(' ');
    expect(text).toContain('All lengths in centimetres');
    // A4 is 595 × 842 pt.
    expect(spawnSync('pdfinfo', [file], { encoding: 'utf8' }).stdout).toMatch(/Page size:\s+595\.\d* x 841\.\d* pts \(A4\)/);
    await page.context().close();
  });

  it.each([1180, 390])('prints from the browser with the result box whole and no form or nav, from %i px', async (width) => {
    const page = await calculator(browser(), width);
    await field(page, 'Cuff depth').fill('1 1/2');
    await field(page, 'Cloth below the mark').fill('5');
    await expect.poll(() => page.getByText('Enough cloth.').isVisible(), { timeout: 10_000 }).toBe(true);
    await page.emulateMedia({ media: 'print' });
    expect(await page.getByRole('form', { name: 'Measurements' }).isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Print cut sheet' }).isVisible()).toBe(false);
    const pages = pdfPages(await page.pdf({ format: 'Letter', printBackground: true }));
    // The cut box in one piece, on the first page, with the cloth check and every chalk line.
    expect(pages[0]).toMatch(/CUT AT LINE 4 4 1\/2 in below the pin mark 1\/2 in above the raw edge/);
    expect(pages[0]).toContain('Enough cloth');
    expect(pages[0]).toMatch(/4 Cutting line/);
    expect(pages.join(' ')).not.toContain('Measure in');
    // The drawing whole on the next page, the bench steps after it.
    expect(pages[1]).toMatch(/FLAT, FROM THE PIN MARK DOWN.*FINISHED, IN SECTION/);
    expect(pages.length).toBeLessThanOrEqual(3);
    await page.context().close();
  });
});

describe('the fold drawing on a phone', () => {
  for (const width of [390, 768, 1280]) {
    it(`keeps every word of the drawing at 12 px or more, inside the frame, at ${width} px`, async () => {
      const page = await calculator(browser(), width);
      await field(page, 'Cuff depth').fill('1 1/2');
      await field(page, 'Cloth below the mark').fill('5');
      const figure = page.getByRole('img', { name: 'The cuff drawn to scale' });
      await figure.waitFor({ timeout: 10_000 });
      const words = await figure.evaluate((svg) => {
        const frame = svg.getBoundingClientRect();
        return [...svg.querySelectorAll('text')]
          .filter((t) => (t.textContent ?? '').trim() !== '')
          .map((t) => {
            const box = t.getBoundingClientRect();
            // Screen px per drawing unit, from the two boxes, times the font size in drawing units.
            const rendered = (box.height / t.getBBox().height) * parseFloat(getComputedStyle(t).fontSize);
            return {
              text: t.textContent,
              px: rendered,
              inside: box.left >= frame.left - 1 && box.right <= frame.right + 1,
              box: { l: box.left, r: box.right, t: box.top, b: box.bottom },
            };
          });
      });
      // No word runs into another (boxes may touch by a pixel: line boxes are taller than the ink).
      const clashes = words.flatMap((a, i) =>
        words
          .slice(i + 1)
          .filter((b) => Math.min(a.box.r, b.box.r) - Math.max(a.box.l, b.box.l) > 2 && Math.min(a.box.b, b.box.b) - Math.max(a.box.t, b.box.t) > 4)
          .map((b) => `${a.text} / ${b.text}`),
      );
      expect(clashes).toEqual([]);
      expect(words.length).toBeGreaterThan(15);
      expect(words.filter((w) => w.px < 12)).toEqual([]);
      expect(words.filter((w) => !w.inside)).toEqual([]);
      await page.screenshot({ path: `test-results/calculator-drawing-${width}.png`, fullPage: true });
      await page.context().close();
    });
  }
});
