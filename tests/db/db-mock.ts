// Stands in for @/db in a test file, each file with its own database:
// vi.mock('@/db', () => import('../db/db-mock')).
import { openTestDb } from './test-db';

/** This test file's migrated database. */
export const handle = await openTestDb();
/** Drizzle on it, as @/db exports it. */
export const db = handle.db;
