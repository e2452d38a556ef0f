// npm test: unit, property and API tests, then the browser stories and HTTP tests against a built
// server; ends with one plain line counting every test of both runs.
import { spawn } from 'node:child_process';
import { mkdirSync, readFileSync, rmSync } from 'node:fs';
import { createInterface } from 'node:readline';
import { buildIfNeeded } from './build-if-needed.mjs';
import { ensureChromium } from './chromium.mjs';

const chromium = ensureChromium();
const env = { ...process.env, CHROMIUM_PATH: chromium };
const vitest = 'node_modules/.bin/vitest';
const extra = process.argv.slice(2);
// `npm test -- some/file` filters both runs: the one without a match passes with no tests.
if (extra.length > 0) extra.push('--passWithNoTests');
mkdirSync('test-results', { recursive: true });

let passed = 0;
let failed = 0;

/** One vitest run with its JSON report in test-results/vitest-<id>.json; lines prefixed when runs share the terminal. */
function run(id, config, runEnv, prefix, niceness = 0) {
  const report = `test-results/vitest-${id}.json`;
  rmSync(report, { force: true });
  const args = ['run', ...config, '--reporter=default', '--reporter=json', `--outputFile.json=${report}`, ...extra];
  const [command, commandArgs] = niceness ? ['nice', ['-n', String(niceness), vitest, ...args]] : [vitest, args];
  const child = spawn(command, commandArgs, { stdio: prefix ? ['ignore', 'pipe', 'pipe'] : 'inherit', env: runEnv });
  if (prefix) {
    for (const stream of [child.stdout, child.stderr]) {
      createInterface({ input: stream }).on('line', (line) => (stream === child.stdout ? process.stdout : process.stderr).write(`${prefix} ${line}\n`));
    }
  }
  return new Promise((resolve) => {
    child.on('close', (status) => {
      try {
        const counts = JSON.parse(readFileSync(report, 'utf8'));
        passed += counts.numPassedTests;
        failed += counts.numFailedTests;
      } catch {
        // No report: the run died before writing it; its exit status says so.
      }
      resolve(status ?? 1);
    });
  });
}

const began = Date.now();

/** Ends the run when a phase failed; says how long into the run it ended either way. */
function finish(name, status) {
  console.log(`(${name}: done ${Math.round((Date.now() - began) / 1000)} s into npm test)`);
  if (status === 0) return;
  console.error(`\n${name} failed.`);
  console.log(`tests: ${passed} passed, ${failed} failed`);
  process.exit(status);
}

console.log('\n=== unit, property and API tests ===');
finish('unit, property and API tests', await run('unit', [], env));

console.log('\n=== browser stories and HTTP tests ===');
const browserConfig = ['--config', 'vitest.browser.config.ts'];
if (extra.length > 0) {
  // A filtered run: one server, as `npm run test:browser` starts.
  finish('browser stories and HTTP tests', await run('browser', browserConfig, env));
} else {
  // The whole run: two lanes (vitest.browser.config.ts), each with its own server and demo shop, so
  // their files cannot disturb each other; within a lane files run one after another. Side by side,
  // as each lane spends much of its time waiting on its server or browser. The sweep and HTTP lane
  // runs niced: the stories' waits are paced by what a screen shows, so they get the cores first
  // when both lanes want them. Built once here, before either lane's global setup looks.
  buildIfNeeded(process.env.TEST_DIST_DIR || '.test-dist', env);
  const statuses = await Promise.all([
    run('browser-stories', browserConfig, { ...env, BROWSER_LANE: 'stories' }, '[stories]'),
    run('browser-sweep-http', browserConfig, { ...env, BROWSER_LANE: 'sweep-http' }, '[sweep+http]', 10),
  ]);
  finish('browser stories and HTTP tests', statuses.find((s) => s !== 0) ?? 0);
}
console.log(`tests: ${passed} passed, ${failed} failed`);
