// The browser stories' Chromium (Debian's, never a downloaded one): how it is started, once per run
// of the stories by the global setup, or by a file run without it. No vitest imports: the global
// setup loads this outside any test file.
import { chromium, type BrowserServer, type LaunchOptions } from 'playwright-core';
import { CHROMIUM_ARGS } from '../../scripts/chromium.mjs';

/** Headless Chromium from CHROMIUM_PATH (set by scripts/test.mjs) or /usr/bin/chromium. */
export const chromiumOptions = (): LaunchOptions => ({ executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium', args: CHROMIUM_ARGS });

/** Starts the run's Chromium, which the test files connect to (global setup). */
export function startBrowserServer(): Promise<BrowserServer> {
  return chromium.launchServer(chromiumOptions());
}
