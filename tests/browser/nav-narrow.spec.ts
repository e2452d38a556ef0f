// The signed-in header on a phone (390 px) and a tablet held upright (768 px): the lead's links,
// name and sign-out wrap onto more lines, nothing runs off the side, and every link stays a
// finger-sized target. Screenshots in test-results/nav-*.png.
import type { Page } from 'playwright-core';
import { describe, expect, inject, it } from 'vitest';
import { ready, sharedBrowser } from './browser';
import { signInAs } from './sign-in';

const browser = sharedBrowser();

async function pageAt(width: number): Promise<Page> {
  const context = await browser().newContext({ baseURL: inject('baseURL'), viewport: { width, height: 900 }, hasTouch: true });
  return context.newPage();
}

const overflow = (page: Page) => page.evaluate(() => ({ scroll: document.documentElement.scrollWidth, inner: window.innerWidth }));

describe('signed-in nav on narrow screens', () => {
  for (const width of [390, 768]) {
    it(`wraps without running off the side at ${width} px`, async () => {
      const page = await pageAt(width);
      // The lead has the most links. Every screen's own content, for every role and at 1024 px
      // too, is checked in sweep.spec.ts; here the lead's screens reached from the nav.
      await signInAs(page, 'lead', '/queue');
      for (const path of ['/presets', '/tickets/new', '/prices', '/staff', '/bench-settings', '/queue']) {
        await page.goto(path);
        await ready(page);
        const { scroll, inner } = await overflow(page);
        expect(scroll, path).toBeLessThanOrEqual(inner);
      }
      const nav = page.getByRole('navigation', { name: 'Shop' });
      const links = nav.getByRole('link');
      expect(await links.count()).toBeGreaterThanOrEqual(5);

      // Every link, the name and sign-out lie inside the screen and stay at least 44 px tall.
      const boxes = [...(await links.all()), page.getByRole('button', { name: 'Sign out' })];
      for (const item of boxes) {
        const box = (await item.boundingBox())!;
        expect(box.x).toBeGreaterThanOrEqual(0);
        expect(box.x + box.width).toBeLessThanOrEqual(width);
        expect(box.height).toBeGreaterThanOrEqual(44);
      }
      // Keyboard: the first link takes focus from the skip link onward and shows it.
      await page.keyboard.press('Tab');
      await page.keyboard.press('Tab');
      await page.keyboard.press('Tab');
      const focused = await page.evaluate(() => document.activeElement?.textContent?.trim());
      expect(focused).toBe('Queue');
      await page.screenshot({ path: `test-results/nav-${width}.png` });
      await page.context().close();
    });
  }
});
