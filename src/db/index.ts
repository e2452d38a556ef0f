// The app's one database: PGlite under DATA_DIR/pglite, or the server named by DATABASE_URL.
// Opened once per process: a second PGlite on the same folder would silently lose writes.
import { join } from 'node:path';
import { DATA_DIR, DATABASE_URL } from 'astro:env/server';
import { openDatabase, type DbHandle } from './open';
import { dataDir } from './app-paths';

const holder = globalThis as typeof globalThis & { __cuffwrightDb?: DbHandle };

// Top-level await: only the driver in use is imported (openDatabase), and this module is ready once it is.
holder.__cuffwrightDb ??= await openDatabase(DATABASE_URL ? { url: DATABASE_URL } : { dataDir: join(dataDir(DATA_DIR), 'pglite') });

/** The open database handle (driver, migrator, closer). */
export const handle: DbHandle = holder.__cuffwrightDb;

/** The Drizzle database every service uses. */
export const db = handle.db;

export type { Db } from './open';
