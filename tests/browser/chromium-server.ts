// The browser stories' Chromium (Debian's, never a downloaded one), started once per run of the
// stories by the global setup; the test files connect to it (browser.ts). No vitest imports: the
// global setup loads this outside any test file.
import { chromium, type BrowserServer } from 'playwright-core';
import { chromiumLaunchOptions } from '../../scripts/chromium.mjs';

/** Starts the run's Chromium, which the test files connect to (global setup). */
export function startBrowserServer(): Promise<BrowserServer> {
  return chromium.launchServer(chromiumLaunchOptions());
}
