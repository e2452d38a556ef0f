// Shared Chromium for the browser stories: one browser per run of the stories, started by the
// global setup (chromium-server.ts), which each test file connects to; a file's contexts close with
// its connection. A launch for every file cost 1.15 s of CPU and 0.68 s against 0.58 s and 0.31 s
// for a connection (DEVELOPERS.md, where CI's time goes).
import { chromium, type Browser, type Page } from 'playwright-core';
import { mkdirSync } from 'node:fs';
import { afterAll, beforeAll, inject } from 'vitest';

/** A connection of this file's own to the run's Chromium (the global setup's); closing it closes the file's contexts. */
export function launch(): Promise<Browser> {
  return chromium.connect(inject('browserEndpoint'));
}

/** One connection to Chromium for a test file (closed after its tests); screenshots go to test-results/. */
export function sharedBrowser(): () => Browser {
  let browser: Browser | undefined;
  beforeAll(async () => {
    mkdirSync('test-results', { recursive: true });
    browser = await launch();
  });
  afterAll(async () => {
    await browser?.close();
  });
  return () => {
    if (!browser) throw new Error('The browser is launched in beforeAll: use it inside a test.');
    return browser;
  };
}

/** A tablet held in landscape, as a context's options. */
export const TABLET = { viewport: { width: 1180, height: 820 }, hasTouch: true };

/** A fresh page in its own context, sized like a tablet held in landscape. */
export async function tabletPage(browser: Browser): Promise<Page> {
  const context = await browser.newContext({ baseURL: inject('baseURL'), ...TABLET });
  return context.newPage();
}

/** Waits until the page's islands are live: Astro drops their ssr marker (the element itself has no box). */
export async function ready(page: Page): Promise<void> {
  await page.waitForSelector('astro-island:not([ssr])', { state: 'attached', timeout: 15_000 });
}
