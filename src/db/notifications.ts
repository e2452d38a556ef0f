// Notifications from the embedded database to its one process. PGlite calls a listener in a
// microtask queued while it reads the committing statement's answer, so before the writer's own
// code goes on: nothing this process does after a write can find what the write replaced.
import type { PGlite } from '@electric-sql/pglite';
import { db, handle } from './index';

/** Listens on `channel` when the database is the embedded one (one process, every writer here);
 * resolves true once listening, false on a PostgreSQL server (other servers write too) or on failure. */
export async function listenEmbedded(channel: string, onNotice: (payload: string) => void): Promise<boolean> {
  if (handle.kind !== 'pglite') return false;
  try {
    await (db as unknown as { $client: PGlite }).$client.listen(channel, onNotice);
    return true;
  } catch {
    return false;
  }
}
