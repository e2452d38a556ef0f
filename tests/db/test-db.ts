// A fresh, migrated database for one test file: PGlite from the snapshot, or a new database on
// the PostgreSQL server at TEST_DATABASE_URL (CI). Use it through vi.mock('@/db', …).
import { readFileSync } from 'node:fs';
import { randomUUID } from 'node:crypto';
import { PGlite } from '@electric-sql/pglite';
import pg from 'pg';
import { inject } from 'vitest';
import { openDatabase, type DbHandle } from '@/db/open';

/** Opens this file's database; close() drops it again on a server. */
export async function openTestDb(): Promise<DbHandle> {
  const serverUrl = process.env.TEST_DATABASE_URL;
  if (serverUrl) {
    const name = `cw_test_${randomUUID().replace(/-/g, '').slice(0, 12)}`;
    const admin = new pg.Client({ connectionString: serverUrl });
    await admin.connect();
    await admin.query(`CREATE DATABASE ${name}`);
    await admin.end();
    const url = new URL(serverUrl);
    url.pathname = `/${name}`;
    const handle = openDatabase({ url: url.toString() });
    await handle.migrate();
    return {
      ...handle,
      close: async () => {
        await handle.close();
        const drop = new pg.Client({ connectionString: serverUrl });
        await drop.connect();
        await drop.query(`DROP DATABASE IF EXISTS ${name}`);
        await drop.end();
      },
    };
  }
  const snapshot = readFileSync(inject('pgliteSnapshot'));
  const pglite = new PGlite({ loadDataDir: new Blob([snapshot]) });
  const handle = openDatabase({ pglite });
  await handle.migrate();
  return handle;
}
