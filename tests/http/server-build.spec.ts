// The built server carries zod, drizzle-orm and drizzle-zod in its own chunks: loaded from
// node_modules they were 215 small files for Node to resolve, read and link before the first answer
// (issue 12: `npm start` → first 200 in 2 s). Packages loaded only later (better-auth) may keep theirs.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const dist = process.env.TEST_DIST_DIR || '.test-dist';
const BUNDLED = ['zod', 'drizzle-orm', 'drizzle-zod'];

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
  it('imports zod, drizzle-orm and drizzle-zod from none of its modules (they are bundled)', () => {
    const files = modules(join(dist, 'server'));
    expect(files.length).toBeGreaterThan(10);
    const offenders = files.flatMap((f) =>
      importedPackages(readFileSync(f, 'utf8'))
        .filter((p) => BUNDLED.includes(p))
        .map((p) => `${f}: ${p}`),
    );
    expect(offenders).toEqual([]);
  });

  it('still carries the packages themselves (a query builder and a schema parser are in its chunks)', () => {
    const code = modules(join(dist, 'server'))
      .map((f) => readFileSync(f, 'utf8'))
      .join('\n');
    // drizzle-orm's entity marker and zod's error class name, as their sources write them.
    expect(code).toContain('drizzle:entityKind');
    expect(code).toContain('ZodError');
  });

  it('reads an import the way the check above needs (static, dynamic, subpath, scoped)', () => {
    const code = `import{z}from"zod";\nimport a from 'drizzle-orm/pg-core';\nimport 'side-effect';\n * import { union } from 'in-a-comment'\nconst b = import("@x/y/z");`;
    expect(importedPackages(code)).toEqual(['zod', 'drizzle-orm', 'side-effect', '@x/y']);
  });
});
