import { defineConfig } from 'vitest/config';

// Browser stories: one built server for the whole run (tests/browser/global-setup.ts), driven by
// playwright-core through Debian's Chromium. Files run one after another: the machine has 2 cores.
export default defineConfig({
  test: {
    include: ['tests/browser/**/*.spec.ts'],
    globalSetup: ['tests/browser/global-setup.ts'],
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
