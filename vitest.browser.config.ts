import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// Browser stories and HTTP tests (role × route matrix, cookies, cross-site, rate limit): one built
// server per run (tests/browser/global-setup.ts), with the local mail capture; browser stories
// drive Debian's Chromium. Files run one after another: they share that server's demo shop.
// `npm test` runs two lanes side by side (BROWSER_LANE, see scripts/test.mjs), each a run of its
// own with its own server, database and fakes, so no file of one lane can see the other's data.
// The role × route matrix (about 50 s) rides with the stories: the sweep alone is most of its lane,
// and with the matrix there too that lane ran on alone for over a minute after the stories ended.
const MATRIX = 'tests/http/role-route-matrix.spec.ts';
const LANES: Record<string, { include: string[]; exclude: string[] }> = {
  stories: { include: ['tests/browser/**/*.spec.ts', MATRIX], exclude: ['tests/browser/sweep.spec.ts'] },
  'sweep-http': { include: ['tests/browser/sweep.spec.ts', 'tests/http/**/*.spec.ts'], exclude: [MATRIX] },
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
