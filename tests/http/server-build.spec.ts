// The built server carries drizzle-orm and drizzle-zod in its own chunks: loaded from node_modules
// drizzle-orm was 113 small files for Node to resolve, read and link before the first answer (issue
// 12: `npm start` → first 200 in 2 s). zod stays a package: better-auth loads its own copy anyway, and
// two copies cost about 40 MB while a batch printed.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const dist = process.env.TEST_DIST_DIR || '.test-dist';
const BUNDLED = ['drizzle-orm', 'drizzle-zod'];

/** Every .mjs file under dir. */
function modules(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true, recursive: true })
    .filter((e) => e.isFile() && e.name.endsWith('.mjs'))
    .map((e) => join(e.parentPath, e.name));
}

const PACKAGE = `["']((?:@[\\w.-]+/)?[\\w.-]+)(?:/[^"']*)?["']`;
// A built module's static imports start their line (Rollup writes them so); comments quoting an
// import do not. Dynamic imports may sit anywhere.
const STATIC = new RegExp(`^(?:import|export)\\b[^;'"]*?(?:from\\s*)?${PACKAGE}`, 'gm');
const DYNAMIC = new RegExp(`\\bimport\\(\\s*${PACKAGE}\\s*\\)`, 'g');

/** The bare package names a built module imports, statically or dynamically. */
function importedPackages(code: string): string[] {
  return [...code.matchAll(STATIC), ...code.matchAll(DYNAMIC)].map((m) => m[1]!);
}

describe('the built server', () => {
  it('imports drizzle-orm and drizzle-zod from none of its modules (they are bundled)', () => {
    const files = modules(join(dist, 'server'));
    expect(files.length).toBeGreaterThan(10);
    const offenders = files.flatMap((f) =>
      importedPackages(readFileSync(f, 'utf8'))
        .filter((p) => BUNDLED.includes(p))
        .map((p) => `${f}: ${p}`),
    );
    expect(offenders).toEqual([]);
  });

  it('carries drizzle itself (its query builder is in the chunks), and imports zod as a package', () => {
    const code = modules(join(dist, 'server'))
      .map((f) => readFileSync(f, 'utf8'))
      .join('\n');
    // drizzle-orm's entity marker, as its source writes it.
    expect(code).toContain('drizzle:entityKind');
    expect(
      modules(join(dist, 'server'))
        .flatMap((f) => importedPackages(readFileSync(f, 'utf8')))
        .includes('zod'),
    ).toBe(true);
  });

  it('reads an import the way the check above needs (static, dynamic, subpath, scoped)', () => {
    const code = `import{z}from"zod";\nimport a from 'drizzle-orm/pg-core';\nimport 'side-effect';\n * import { union } from 'in-a-comment'\nconst b = import("@x/y/z");`;
    expect(importedPackages(code)).toEqual(['zod', 'drizzle-orm', 'side-effect', '@x/y']);
  });
});
