/// <reference types="vitest" />
import { getViteConfig } from 'astro/config';

// Files whose modules keep state a test changes (the PDF speed patches, the sheet's font and layout
// caches, a database per file): each runs in a fresh module graph.
// openapi-responses loads every route module (a database in a throwaway folder, astro:env mocked).
const ISOLATED = [
  'tests/services/**',
  'tests/db/**',
  'tests/lib/cut-sheet/**',
  'tests/lib/pdf-platform/**',
  'tests/lib/render-pdf.test.ts',
  'tests/lib/openapi-responses.test.ts',
];

// Unit, property and API tests. Browser stories live in vitest.browser.config.ts.
export default getViteConfig({
  test: {
    exclude: ['tests/browser/**', 'node_modules/**'],
    // Migrated PGlite snapshot for the database tests (tests/db/test-db.ts).
    globalSetup: ['tests/db/global-setup.ts'],
    // The message catalog, every language registered, for components rendered outside their pages.
    setupFiles: ['tests/setup-catalog.ts'],
    testTimeout: 30_000,
    hookTimeout: 60_000,
    // Two forks for the isolated project (the only one on forks; vitest 3 reads pool sizes from the
    // root config only): its files wait on PGlite and the PDF renderer as much as on a core, and the
    // default on 2 cores is one fork. Each of its files is a new process that compiles PGlite's (and
    // yoga's) WebAssembly afresh, and V8's optimising tier costs more than it gives back within one
    // file: baseline code only (--liftoff-only) took the project from 214 to 177 s (CPU 413 to
    // 337 s, 2026-12-05). Tests only: the app's server runs with Node's defaults.
    poolOptions: { forks: { maxForks: 2, execArgv: ['--liftoff-only'] } },
    projects: [
      // The rest share one module graph per worker thread: loading the engine, zod and the catalog
      // once instead of per file is most of this run's time (CI's unit phase, measured).
      {
        extends: true,
        test: {
          name: 'shared',
          include: ['tests/**/*.test.ts', 'tests/**/*.test.tsx'],
          exclude: ['tests/browser/**', 'node_modules/**', ...ISOLATED],
          pool: 'threads',
          isolate: false,
        },
      },
      { extends: true, test: { name: 'isolated', include: ISOLATED.map((g) => (g.endsWith('**') ? `${g}/*.test.{ts,tsx}` : g)) } },
    ],
  },
});
