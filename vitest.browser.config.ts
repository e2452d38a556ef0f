import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// Browser stories and HTTP tests (role × route matrix, cookies, cross-site, rate limit): one built
// server per run (tests/browser/global-setup.ts), with the local mail capture; browser stories
// drive Debian's Chromium. Files run one after another: they share that server's demo shop.
// `npm test` runs two lanes side by side (BROWSER_LANE, see scripts/test.mjs), each a run of its
// own with its own server, database and fakes, so no file of one lane can see the other's data.
// The stories lane also takes HTTP specs that get along with its stories in one demo shop: the
// role × route matrix (about 27 s in CI), the production start (serve.spec.ts: servers of its own,
// about 11 s) and the input limits (input-limits.spec.ts: it only reads the shop, every write it
// tries is refused; mostly 3 s idle-body waits, about 7 s). The sweep is most of the sweep-http
// lane: with only the matrix moved, that lane still ran on alone for 37-40 s after the stories
// ended (CI at 2ea1d48 and 950dede: stories 401-433 s, sweep-http 438-472 s).
const TO_STORIES = ['tests/http/role-route-matrix.spec.ts', 'tests/http/serve.spec.ts', 'tests/http/input-limits.spec.ts'];
const LANES: Record<string, { include: string[]; exclude: string[] }> = {
  stories: { include: ['tests/browser/**/*.spec.ts', ...TO_STORIES], exclude: ['tests/browser/sweep.spec.ts'] },
  'sweep-http': { include: ['tests/browser/sweep.spec.ts', 'tests/http/**/*.spec.ts'], exclude: TO_STORIES },
};
const lane = process.env.BROWSER_LANE ? LANES[process.env.BROWSER_LANE] : undefined;
if (process.env.BROWSER_LANE && !lane) throw new Error(`BROWSER_LANE=${process.env.BROWSER_LANE}: not one of ${Object.keys(LANES).join(', ')}`);

export default defineConfig({
  // The same `@/*` alias as tsconfig, for src modules the HTTP tests import directly.
  resolve: { alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) } },
  test: {
    include: lane?.include ?? ['tests/browser/**/*.spec.ts', 'tests/http/**/*.spec.ts'],
    exclude: ['**/node_modules/**', ...(lane?.exclude ?? [])],
    globalSetup: ['tests/browser/global-setup.ts'],
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
