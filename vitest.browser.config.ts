import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// Browser stories and HTTP tests (role × route matrix, cookies, cross-site, rate limit): one built
// server for the whole run (tests/browser/global-setup.ts), with the local mail capture; browser
// stories drive Debian's Chromium. Files run one after another: the machine has 2 cores.
export default defineConfig({
  // The same `@/*` alias as tsconfig, for src modules the HTTP tests import directly.
  resolve: { alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) } },
  test: {
    include: ['tests/browser/**/*.spec.ts', 'tests/http/**/*.spec.ts'],
    globalSetup: ['tests/browser/global-setup.ts'],
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
