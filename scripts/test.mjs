// npm test: unit, property and API tests, then the browser stories and HTTP tests against a built
// server; ends with one plain line counting every test of both runs.
import { spawnSync } from 'node:child_process';
import { mkdirSync, readFileSync, rmSync } from 'node:fs';
import { ensureChromium } from './chromium.mjs';

const chromium = ensureChromium();
const env = { ...process.env, CHROMIUM_PATH: chromium };
const vitest = 'node_modules/.bin/vitest';
const extra = process.argv.slice(2);
// `npm test -- some/file` filters both runs: the one without a match passes with no tests.
if (extra.length > 0) extra.push('--passWithNoTests');
mkdirSync('test-results', { recursive: true });

const steps = [
  ['unit, property and API tests', 'unit', []],
  ['browser stories and HTTP tests', 'browser', ['--config', 'vitest.browser.config.ts']],
];
let passed = 0;
let failed = 0;
for (const [name, id, config] of steps) {
  console.log(`\n=== ${name} ===`);
  const report = `test-results/vitest-${id}.json`;
  rmSync(report, { force: true });
  const args = ['run', ...config, '--reporter=default', '--reporter=json', `--outputFile.json=${report}`, ...extra];
  const r = spawnSync(vitest, args, { stdio: 'inherit', env });
  try {
    const counts = JSON.parse(readFileSync(report, 'utf8'));
    passed += counts.numPassedTests;
    failed += counts.numFailedTests;
  } catch {
    // No report: the run died before writing it; its exit status below says so.
  }
  if (r.status !== 0) {
    console.error(`\n${name} failed.`);
    console.log(`tests: ${passed} passed, ${failed} failed`);
    process.exit(r.status ?? 1);
  }
}
console.log(`tests: ${passed} passed, ${failed} failed`);
