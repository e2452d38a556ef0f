// The test server runs with NODE_ENV=production (tests/browser/global-setup.ts), so the build it
// runs must be a production build even when vitest (NODE_ENV=test) asks for it.
import { describe, expect, it } from 'vitest';
import { buildEnv } from '../../scripts/build-if-needed.mjs';

describe('buildIfNeeded', () => {
  it('builds for production whatever NODE_ENV the caller runs with, into the folder asked', () => {
    for (const NODE_ENV of ['test', 'development', undefined]) {
      const env = buildEnv('.test-dist-x', { PATH: '/usr/bin', NODE_ENV });
      expect(env).toMatchObject({ NODE_ENV: 'production', ASTRO_OUT_DIR: '.test-dist-x', PATH: '/usr/bin' });
    }
  });
});
