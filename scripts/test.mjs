// npm test: unit, property and API tests, then the browser stories against a built server.
import { spawnSync } from 'node:child_process';
import { ensureChromium } from './chromium.mjs';

const chromium = ensureChromium();
const env = { ...process.env, CHROMIUM_PATH: chromium };
const vitest = 'node_modules/.bin/vitest';
const extra = process.argv.slice(2);

const steps = [
  ['unit, property and API tests', [vitest, 'run', ...extra]],
  ['browser stories', [vitest, 'run', '--config', 'vitest.browser.config.ts', ...extra]],
];
for (const [name, [cmd, ...args]] of steps) {
  console.log(`\n=== ${name} ===`);
  const r = spawnSync(cmd, args, { stdio: 'inherit', env });
  if (r.status !== 0) {
    console.error(`\n${name} failed.`);
    process.exit(r.status ?? 1);
  }
}
