/// <reference types="vitest" />
import { getViteConfig } from 'astro/config';

// Unit, property and API tests. Browser stories live in vitest.browser.config.ts.
export default getViteConfig({
  test: {
    include: ['tests/**/*.test.ts', 'tests/**/*.test.tsx'],
    exclude: ['tests/browser/**', 'node_modules/**'],
    // Migrated PGlite snapshot for the database tests (tests/db/test-db.ts).
    globalSetup: ['tests/db/global-setup.ts'],
    // The message catalog, every language registered, for components rendered outside their pages.
    setupFiles: ['tests/setup-catalog.ts'],
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
