// Whether this server can serve: the database answers, and its migrations are the ones this
// build ships (a server started before a deploy's migrations ran, or after a newer one, says so).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { sql } from 'drizzle-orm';
import { db, handle } from '@/db';
import { migrationsDir } from '@/db/app-paths';

/** The health report: ok only when the database answers and its migrations are current. */
export interface Health {
  ok: boolean;
  database: 'reachable' | 'unreachable';
  kind: 'pglite' | 'postgres';
  migrations: 'current' | 'behind' | 'ahead' | 'unknown';
  shipped: number;
  applied: number | null;
  error?: string;
}

let shippedWhen: number[] | undefined;

/** The `when` stamps of the migrations this build ships, oldest first. */
function shipped(): number[] {
  shippedWhen ??= (JSON.parse(readFileSync(join(migrationsDir(), 'meta', '_journal.json'), 'utf8')) as { entries: { when: number }[] }).entries.map(
    (e) => e.when,
  );
  return shippedWhen;
}

/** Checks the database with a bounded wait; never throws. */
export async function health(timeoutMs = 3000): Promise<Health> {
  const ours = shipped();
  const base = { kind: handle.kind, shipped: ours.length } as const;
  try {
    // `db` is typed as either driver, so the race loses the result type; cast to the shapes handled.
    const rows = (await Promise.race([
      db.execute<{ n: number; last: string | null }>(sql`select count(*)::int as n, max(created_at)::text as last from drizzle.__drizzle_migrations`),
      new Promise<never>((_, reject) => setTimeout(() => reject(new Error(`no answer in ${timeoutMs} ms`)), timeoutMs).unref()),
    ])) as { rows: unknown[] } | unknown[];
    const row = ('rows' in rows ? rows.rows : rows)[0] as { n: number; last: string | null } | undefined;
    const applied = row?.n ?? 0;
    const last = row?.last == null ? null : Number(row.last);
    const newest = ours[ours.length - 1] ?? null;
    const migrations = last === newest && applied === ours.length ? 'current' : last != null && newest != null && last > newest ? 'ahead' : 'behind';
    return { ok: migrations === 'current', database: 'reachable', migrations, applied, ...base };
  } catch (e) {
    const cause = ((e as { cause?: unknown }).cause ?? e) as { code?: string; message?: string };
    const message = String(cause.message ?? cause);
    // No migrations table (or schema) yet: reachable, nothing applied.
    if (cause.code === '42P01' || cause.code === '3F000') return { ok: false, database: 'reachable', migrations: 'behind', applied: 0, ...base };
    return { ok: false, database: 'unreachable', migrations: 'unknown', applied: null, error: message.slice(0, 200), ...base };
  }
}
