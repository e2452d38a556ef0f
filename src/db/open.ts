// Opens the database the same way for the app, the scripts and the tests: PGlite in a folder (or
// in memory), or a PostgreSQL server through node-postgres when given a postgres:// URL.
import { mkdirSync } from 'node:fs';
import type { PGlite } from '@electric-sql/pglite';
import type { PgDatabase, PgQueryResultHKT } from 'drizzle-orm/pg-core';
import * as schema from './schema/index';
import { migrationsDir } from './app-paths';

/** The Drizzle database, whichever driver is underneath. */
export type Db = PgDatabase<PgQueryResultHKT, typeof schema>;

/** An open database with its migrator and closer. */
export interface DbHandle {
  db: Db;
  kind: 'pglite' | 'postgres';
  migrate: () => Promise<void>;
  /** Runs fn while holding the start lock: on PostgreSQL a session advisory lock, so of several
   * servers starting together one migrates and seeds while the others wait; PGlite has one process. */
  withStartLock: <T>(fn: () => Promise<T>) => Promise<T>;
  close: () => Promise<void>;
}

/** The advisory lock key of migrations and the demo seed (any fixed 64-bit number of our own). */
export const START_LOCK_KEY = 72_270_420_001;

/**
 * PostgreSQL's page cache inside the embedded database. PGlite keeps it in WebAssembly memory that
 * is resident from the moment it starts: PostgreSQL's default (128 MB) was a quarter of the
 * server's memory (this setting: 125 MB less at idle, and while a batch prints), for data folders
 * of tens of MB, mostly PostgreSQL's own catalogs. Pages beyond it are read from the data folder,
 * through the system's file cache.
 */
export const EMBEDDED_SHARED_BUFFERS = '32MB';

/** Where to open: a postgres:// URL, a PGlite folder, or a ready PGlite instance (tests). */
export type DbTarget = { url: string } | { dataDir: string } | { pglite: PGlite };

/** Opens the database; call migrate() before use. Each driver is imported only when used: the
 * PostgreSQL one (pg and drizzle's node-postgres) cost about 0.3 s of CPU at an embedded start. */
export async function openDatabase(target: DbTarget, migrationsFolder = migrationsDir()): Promise<DbHandle> {
  if ('url' in target) {
    const [{ default: pg }, { drizzle: drizzlePg }, { migrate: migratePg }] = await Promise.all([
      import('pg'),
      import('drizzle-orm/node-postgres'),
      import('drizzle-orm/node-postgres/migrator'),
    ]);
    const pool = new pg.Pool({ connectionString: target.url, max: 10 });
    const db = drizzlePg(pool, { schema });
    return {
      db: db as unknown as Db,
      kind: 'postgres',
      migrate: () => migratePg(db, { migrationsFolder }),
      withStartLock: async (fn) => {
        const client = await pool.connect();
        try {
          await client.query('select pg_advisory_lock($1)', [START_LOCK_KEY]);
          return await fn();
        } finally {
          await client.query('select pg_advisory_unlock($1)', [START_LOCK_KEY]).catch(() => {});
          client.release();
        }
      },
      close: () => pool.end(),
    };
  }
  const [{ PGlite }, { drizzle: drizzlePglite }, { migrate: migratePglite }] = await Promise.all([
    import('@electric-sql/pglite'),
    import('drizzle-orm/pglite'),
    import('drizzle-orm/pglite/migrator'),
  ]);
  let client: PGlite;
  if ('pglite' in target) client = target.pglite;
  else {
    // PGlite creates its folder non-recursively.
    mkdirSync(target.dataDir, { recursive: true });
    client = new PGlite(target.dataDir, { startParams: [...PGlite.defaultStartParams, '-c', `shared_buffers=${EMBEDDED_SHARED_BUFFERS}`] });
  }
  const db = drizzlePglite(client, { schema });
  return {
    db: db as unknown as Db,
    kind: 'pglite',
    migrate: () => migratePglite(db, { migrationsFolder }),
    withStartLock: (fn) => fn(),
    close: () => client.close(),
  };
}
