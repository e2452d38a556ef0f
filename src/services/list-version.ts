// A shop's queue-list version (drizzle/0018: one row, moved by triggers with every write the list
// shows), read for every queue request: most of a 304's work. On the embedded database this process
// is the only writer (one PGlite per folder), and each move is told on a channel at its commit
// (drizzle/0022), so a version read here is kept until the shop's next move is heard. On PostgreSQL
// other servers write too: the version is read from the database every time.
import type { PGlite } from '@electric-sql/pglite';
import { db, handle } from '@/db';

/** The channel the version's triggers notify, with the shop's id as payload. */
export const LIST_VERSION_CHANNEL = 'shop_list_version';

const KEPT_MAX = 10_000;
const kept = new Map<string, string>();
// Moves heard since start: a version read while one was heard may be the old one, so it is not kept.
let heard = 0;
let listening: Promise<boolean> | undefined;

type VersionClient = { query(text: string, values: unknown[]): Promise<{ rows: { v: string }[] }> };
const VERSION_SQL = 'select version::text as v from shop_list_versions where shop_id = $1';

// Asked of the driver's client (PGlite or pg's pool, same call), not through Drizzle: through
// Drizzle PGlite copies its whole table of type parsers per query (half the read's CPU, measured).
async function readVersion(shopId: string): Promise<string> {
  const { rows } = await (db as unknown as { $client: VersionClient }).$client.query(VERSION_SQL, [shopId]);
  return rows[0]?.v ?? '0';
}

/** Starts listening for moves (once); true when versions may be kept (the embedded database). */
function listen(): Promise<boolean> {
  listening ??= (async () => {
    if (handle.kind !== 'pglite') return false;
    const client = (db as unknown as { $client: PGlite }).$client;
    // PGlite calls this in a microtask queued while it reads the commit's answer, so before the
    // writer's own code goes on: no request after a write finds the version it replaced.
    await client.listen(LIST_VERSION_CHANNEL, (shopId) => {
      heard += 1;
      kept.delete(shopId);
    });
    return true;
  })().catch(() => false);
  return listening;
}

// Reads running now, per shop, with the moves heard when each began: requests meanwhile (every tab
// after a move) share one while no further move has been heard.
const reading = new Map<string, { heard: number; version: Promise<string> }>();

async function readAndKeep(shopId: string, before: number): Promise<string> {
  try {
    const version = await readVersion(shopId);
    if (heard === before) {
      if (kept.size >= KEPT_MAX) kept.delete(kept.keys().next().value!);
      kept.set(shopId, version);
    }
    return version;
  } finally {
    if (reading.get(shopId)?.heard === before) reading.delete(shopId);
  }
}

/** The shop's queue-list version ('0' for a shop not written since). */
export async function listVersion(shopId: string): Promise<string> {
  if (!(await listen())) return readVersion(shopId);
  const known = kept.get(shopId);
  if (known !== undefined) return known;
  const running = reading.get(shopId);
  if (running && running.heard === heard) return running.version;
  const version = readAndKeep(shopId, heard);
  reading.set(shopId, { heard, version });
  return version;
}
