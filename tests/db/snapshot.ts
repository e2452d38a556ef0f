// The migrated PGlite snapshot, made once per test run by whichever worker needs it first; the
// others wait for it. A lock folder (mkdir is atomic) keeps two workers from making it at once.
import { existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { openDatabase } from '@/db/open';

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** The snapshot's bytes from `dir`, making it first when no worker has yet. */
export async function migratedSnapshot(dir: string): Promise<Buffer> {
  const file = join(dir, 'migrated.tar');
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
      // A plain tar, checkpointed first: no file unzips it in JS as it opens its database (about
      // 0.3 s of CPU less for each of some sixty files, measured: 1.3 s against 1.6 s).
      await pglite.query('CHECKPOINT');
      const dump = await pglite.dumpDataDir('none');
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
