// The migrated PGlite snapshot, made once per test run by whichever worker needs it first; the
// others wait for it. A lock folder (mkdir is atomic) keeps two workers from making it at once.
import { existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { openDatabase } from '@/db/open';

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** The snapshot's bytes from `dir`, making it first when no worker has yet. */
export async function migratedSnapshot(dir: string): Promise<Buffer> {
  const file = join(dir, 'migrated.tar.gz');
  const lock = join(dir, 'making.lock');
  for (let waited = 0; !existsSync(file); waited += 100) {
    let mine = false;
    try {
      mkdirSync(lock);
      mine = true;
    } catch {
      // Another worker is making it.
    }
    if (mine) {
      const pglite = new PGlite();
      await (await openDatabase({ pglite })).migrate();
      const dump = await pglite.dumpDataDir('gzip');
      writeFileSync(`${file}.part`, Buffer.from(await dump.arrayBuffer()));
      renameSync(`${file}.part`, file);
      await pglite.close();
      break;
    }
    if (waited > 120_000) throw new Error('no migrated snapshot after 2 min');
    await sleep(100);
  }
  return readFileSync(file);
}
