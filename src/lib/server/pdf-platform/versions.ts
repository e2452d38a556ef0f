// The version of an installed package, read from its own package.json. pdfkit and fontkit list
// no "./package.json" in their exports, so the file is found from the package's entry point,
// walking up to the folder whose package.json carries the package's name.
import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';

const require = createRequire(import.meta.url);

/** The installed version of `pkg`, as resolved from the package `via` (the copy that package loads), or null if it cannot be found. */
export function installedVersion(pkg: string, via?: string): string | null {
  try {
    const from = via ? createRequire(packageJsonOf(via, require) ?? require.resolve(via)) : require;
    const file = packageJsonOf(pkg, from);
    return file ? ((JSON.parse(readFileSync(file, 'utf8')) as { version?: string }).version ?? null) : null;
  } catch {
    return null;
  }
}

function packageJsonOf(pkg: string, from: NodeJS.Require): string | null {
  let dir = dirname(from.resolve(pkg));
  for (;;) {
    const file = join(dir, 'package.json');
    if (existsSync(file) && (JSON.parse(readFileSync(file, 'utf8')) as { name?: string }).name === pkg) return file;
    const up = dirname(dir);
    if (up === dir) return null;
    dir = up;
  }
}
