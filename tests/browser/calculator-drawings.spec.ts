// Every drawing of the calculator's plan is legible on a phone (issue 11: labels were 7–8 px at
// 390 px wide): the cuff in section, the tapered leg and the plain hem. Each word's rendered size
// is measured in the page (screen px per drawing unit times its font size), and must be 12 px or
// more at 390 px (and at 768 px), inside its frame, and clear of every other word.
import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { ready, sharedBrowser } from './browser';

const browser = sharedBrowser();

const field = (page: Page, label: string) => page.getByLabel(label, { exact: true });
const choose = (page: Page, name: string) => page.locator('label', { has: page.getByRole('radio', { name, exact: true }) }).click();

/** Each word of a drawing: its text, rendered font size in px, whether it is inside the frame, and its box. */
async function words(page: Page, name: string | RegExp) {
  const figure = page.getByRole('img', { name });
  await figure.waitFor({ timeout: 10_000 });
  return figure.evaluate((svg) => {
    const frame = svg.getBoundingClientRect();
    return [...svg.querySelectorAll('text')]
      .filter((t) => (t.textContent ?? '').trim() !== '')
      .map((t) => {
        const box = t.getBoundingClientRect();
        const px = (box.height / (t as SVGTextElement).getBBox().height) * parseFloat(getComputedStyle(t).fontSize);
        return {
          text: t.textContent ?? '',
          px,
          inside: box.left >= frame.left - 1 && box.right <= frame.right + 1,
          l: box.left,
          r: box.right,
          t: box.top,
          b: box.bottom,
        };
      });
  });
}

function problems(found: Awaited<ReturnType<typeof words>>): string[] {
  const small = found.filter((w) => w.px < 12).map((w) => `${w.text}: ${w.px.toFixed(1)} px`);
  const outside = found.filter((w) => !w.inside).map((w) => `${w.text}: outside the frame`);
  const clashes = found.flatMap((a, i) =>
    found
      .slice(i + 1)
      .filter((b) => Math.min(a.r, b.r) - Math.max(a.l, b.l) > 2 && Math.min(a.b, b.b) - Math.max(a.t, b.t) > 4)
      .map((b) => `${a.text} / ${b.text}`),
  );
  return [...small, ...outside, ...clashes];
}

describe('the plan’s drawings on a phone', () => {
  for (const width of [390, 768]) {
    it(`keeps every word of the cuff, the tapered leg and the plain hem at 12 px or more at ${width} px`, async () => {
      const context = await browser().newContext({ baseURL: inject('baseURL'), viewport: { width, height: 900 }, hasTouch: true });
      const page = await context.newPage();
      await page.goto('/');
      await ready(page);
      await field(page, 'Cuff depth').fill('1 1/2');
      await field(page, 'Cloth below the mark').fill('5');
      await page.getByText('Tapered leg: check the width').click();
      await field(page, 'Width at the finished edge').fill('8');
      await field(page, 'Width higher up').fill('10');
      await field(page, '…measured this high above the edge').fill('12');
      await field(page, 'Seam allowance (optional)').fill('1/2');
      // Measured once the drawing has settled: a plan answered while typing redraws it (polled, not slept).
      const taper = await words(page, /^The leg flat, drawn to scale/);
      expect(taper.length).toBeGreaterThan(3);
      await expect
        .poll(
          async () => ({ cuff: problems(await words(page, 'The cuff drawn to scale')), taper: problems(await words(page, /^The leg flat, drawn to scale/)) }),
          {
            timeout: 10_000,
          },
        )
        .toEqual({ cuff: [], taper: [] });
      await page.screenshot({ path: `test-results/calculator-drawings-cuff-${width}.png`, fullPage: true });
      await choose(page, 'Plain hem');
      const hem = await words(page, /^The plain hem drawn to scale/);
      expect(hem.length).toBeGreaterThan(5);
      await expect.poll(async () => problems(await words(page, /^The plain hem drawn to scale/)), { timeout: 10_000 }).toEqual([]);
      await page.screenshot({ path: `test-results/calculator-drawings-hem-${width}.png`, fullPage: true });
      await context.close();
    });
  }
});
