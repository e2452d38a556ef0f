// What the server loads for its first request: the middleware and everything it imports (the
// session, the database, migrations and the demo seed). Each package here costs start-up time, so
// the heavy ones that only some requests need stay out of this graph (issue 12: start ≤ 2 s).
import { build } from 'esbuild';
import { describe, expect, it } from 'vitest';

/** The packages the middleware's module graph imports, found by bundling it with esbuild
 * (`loadedLater`: only through a dynamic import, so not loaded by the first request). */
async function packagesOfMiddleware(loadedLater = false): Promise<Set<string>> {
  const result = await build({
    entryPoints: ['src/middleware.ts'],
    bundle: true,
    write: false,
    metafile: true,
    platform: 'node',
    format: 'esm',
    packages: 'external',
    logLevel: 'silent',
    plugins: [
      {
        name: 'astro-virtual-modules',
        // astro:* modules and Vite's ?query imports exist only inside Astro's build.
        setup(b) {
          b.onResolve({ filter: /^astro:|\?/ }, (a) => ({ path: a.path, external: true }));
        },
      },
    ],
  });
  const packages = new Set<string>();
  for (const input of Object.values(result.metafile.inputs)) {
    for (const i of input.imports) if (i.external && (i.kind === 'dynamic-import') === loadedLater) packages.add(i.path);
  }
  return packages;
}

describe('the first request', () => {
  it('loads the modules of the middleware, a real graph (better-auth, drizzle-orm, fraction.js)', async () => {
    const packages = await packagesOfMiddleware();
    for (const p of ['better-auth', 'drizzle-orm', 'fraction.js']) expect(packages).toContain(p);
  });

  it('never loads mathjs (half a second at start): the engine adds typed sums with fraction.js', async () => {
    expect(await packagesOfMiddleware()).not.toContain('mathjs');
  });

  it('loads the payment SDK, nodemailer, the S3 SDK and pino only at their first use (dynamic imports)', async () => {
    // better-auth too, behind a dynamic import of src/lib/server/auth.ts, which this bundle cannot tell
    // apart: tests/services/startup-loads.test.ts proves start-up does not load it.
    const first = await packagesOfMiddleware();
    const later = await packagesOfMiddleware(true);
    for (const p of ['stripe', 'nodemailer', '@aws-sdk/client-s3', 'pino']) {
      expect(first).not.toContain(p);
      expect(later).toContain(p);
    }
  });

  it('loads the SMS SDK only when a text goes or a status report comes (a dynamic import)', async () => {
    expect(await packagesOfMiddleware()).not.toContain('twilio');
    expect(await packagesOfMiddleware(true)).toContain('twilio');
  });

  it("loads the PostgreSQL driver (pg, about 0.3 s of CPU with drizzle's side of it) only for a DATABASE_URL", async () => {
    expect(await packagesOfMiddleware()).not.toContain('pg');
    expect(await packagesOfMiddleware(true)).toContain('pg');
  });
});
