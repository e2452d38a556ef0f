// Folders the app reads from its own install, not from wherever it was started: the migrations
// ship beside the code, and the default data folder is the app's `data/`.
import { existsSync } from 'node:fs';
import { dirname, isAbsolute, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

let root: string | undefined;

/** The app's folder: the nearest folder above this module holding `drizzle/meta/_journal.json`
 * (the source tree in tests and dev, the install above dist/ when built). */
export function appRoot(): string {
  if (root) return root;
  for (let dir = dirname(fileURLToPath(import.meta.url)); ; dir = dirname(dir)) {
    if (existsSync(join(dir, 'drizzle', 'meta', '_journal.json'))) return (root = dir);
    if (dirname(dir) === dir) throw new Error('Cuffwright cannot find its drizzle/ migrations folder above its code.');
  }
}

/** The migrations folder shipped with the app. */
export function migrationsDir(): string {
  return join(appRoot(), 'drizzle');
}

/** DATA_DIR as set (relative to the folder the server was started in), or the app's `data/`. */
export function dataDir(setting: string | undefined): string {
  if (!setting) return join(appRoot(), 'data');
  return isAbsolute(setting) ? setting : resolve(setting);
}
