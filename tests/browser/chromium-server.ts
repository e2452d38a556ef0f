// The browser stories' Chromium (Debian's, never a downloaded one): how it is started, once per run
// of the stories by the global setup, or by a file run without it. No vitest imports: the global
// setup loads this outside any test file.
import { chromium, type BrowserServer, type LaunchOptions } from 'playwright-core';

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

/** Headless Chromium from CHROMIUM_PATH (set by scripts/test.mjs) or /usr/bin/chromium. */
export const chromiumOptions = (): LaunchOptions => ({ executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium', args: ARGS });

/** Starts the run's Chromium, which the test files connect to (global setup). */
export function startBrowserServer(): Promise<BrowserServer> {
  return chromium.launchServer(chromiumOptions());
}
