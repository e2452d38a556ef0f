// A fresh, migrated database for one test file: PGlite from the snapshot, or a new database on
// the PostgreSQL server at TEST_DATABASE_URL (CI). Use it through vi.mock('@/db', …).
import { randomUUID } from 'node:crypto';
import { PGlite } from '@electric-sql/pglite';
import { inject } from 'vitest';
import { openDatabase, type DbHandle } from '@/db/open';
import { createServerDatabase, dropServerDatabase } from './server-database';
import { migratedSnapshot } from './snapshot';

/** Opens this file's database; close() drops it again on a server. */
export async function openTestDb(): Promise<DbHandle> {
  const serverUrl = process.env.TEST_DATABASE_URL;
  if (serverUrl) {
    const name = `cw_test_${randomUUID().replace(/-/g, '').slice(0, 12)}`;
    const handle = openDatabase({ url: await createServerDatabase(serverUrl, name) });
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
  const handle = openDatabase({ pglite });
  await handle.migrate();
  return handle;
}
