// A shop's queue-list version (drizzle/0018: one row, moved by triggers with every write the list
// shows), read for every queue request: most of a 304's work. On the embedded database this process
// is the only writer (one PGlite per folder), and each move is told on a channel at its commit
// (drizzle/0022), so versions read here are kept until a move is heard (lookupCache: a read begun
// before it is neither kept nor shared after it). On PostgreSQL other servers write too: the version
// is read from the database every time.
import { db } from '@/db';
import { listenEmbedded } from '@/db/notifications';
import { lookupCache } from '@/lib/server/lookup-cache';

/** The channel the version's triggers notify, with the shop's id as payload. */
export const LIST_VERSION_CHANNEL = 'shop_list_version';

const kept = lookupCache<string>(Number.POSITIVE_INFINITY, 10_000);
let listening: Promise<boolean> | undefined;

type VersionClient = { query(text: string, values: unknown[]): Promise<{ rows: { v: string }[] }> };
const VERSION_SQL = 'select version::text as v from shop_list_versions where shop_id = $1';

// Asked of the driver's client (PGlite or pg's pool, same call), not through Drizzle: through
// Drizzle PGlite copies its whole table of type parsers per query (half the read's CPU, measured).
async function readVersion(shopId: string): Promise<string> {
  const { rows } = await (db as unknown as { $client: VersionClient }).$client.query(VERSION_SQL, [shopId]);
  return rows[0]?.v ?? '0';
}

/** The shop's queue-list version ('0' for a shop not written since). */
export async function listVersion(shopId: string): Promise<string> {
  listening ??= listenEmbedded(LIST_VERSION_CHANNEL, () => kept.clear());
  if (!(await listening)) return readVersion(shopId);
  return kept.get(shopId, async () => ({ value: await readVersion(shopId) }));
}
