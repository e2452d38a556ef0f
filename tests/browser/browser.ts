// Shared Chromium launch for the browser stories (Debian's Chromium, never a downloaded one).
import { chromium, type Browser, type Page } from 'playwright-core';
import { mkdirSync } from 'node:fs';
import { afterAll, beforeAll, inject } from 'vitest';

const ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/** Launches headless Chromium from CHROMIUM_PATH (set by scripts/test.mjs) or /usr/bin/chromium. */
export function launch(): Promise<Browser> {
  return chromium.launch({ executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium', args: ARGS });
}

/** Launches one Chromium for a test file (closed after its tests); screenshots go to test-results/. */
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
