// A fresh, migrated database for one test file: PGlite from the snapshot, or a new database on
// the PostgreSQL server at TEST_DATABASE_URL (CI). Use it through vi.mock('@/db', …).
import { createHash, randomUUID } from 'node:crypto';
import { readdirSync, readFileSync } from 'node:fs';
import { PGlite } from '@electric-sql/pglite';
import { inject } from 'vitest';
import { openDatabase, type DbHandle } from '@/db/open';
import { migratedSnapshot } from './snapshot';

/** Names the migrations, so a template made from other migrations is never reused. */
function migrationsHash(): string {
  const folder = new URL('../../drizzle/', import.meta.url);
  const hash = createHash('sha256').update(readFileSync(new URL('meta/_journal.json', folder)));
  for (const f of readdirSync(folder)
    .filter((n) => n.endsWith('.sql'))
    .sort())
    hash.update(readFileSync(new URL(f, folder)));
  return hash.digest('hex').slice(0, 12);
}

/** Opens this file's database; close() drops it again on a server. */
export async function openTestDb(): Promise<DbHandle> {
  const serverUrl = process.env.TEST_DATABASE_URL;
  if (serverUrl) {
    // Imported here: node-postgres costs a PGlite file about 0.1 s of CPU it has no use for.
    const { createServerDatabase, dropServerDatabase, ensureTemplate } = await import('./server-database');
    const name = `cw_test_${randomUUID().replace(/-/g, '').slice(0, 12)}`;
    const template = `cw_template_${migrationsHash()}`;
    await ensureTemplate(serverUrl, template, async (url) => {
      const building = await openDatabase({ url });
      await building.migrate();
      await building.close();
    });
    const handle = await openDatabase({ url: await createServerDatabase(serverUrl, name, template) });
    await handle.migrate();
    return {
      ...handle,
      close: async () => {
        await handle.close();
        await dropServerDatabase(serverUrl, name);
      },
    };
  }
  const snapshot = await migratedSnapshot(inject('pgliteSnapshotDir'));
  const pglite = new PGlite({ loadDataDir: new Blob([new Uint8Array(snapshot)]) });
  const handle = await openDatabase({ pglite });
  await handle.migrate();
  return handle;
}
