// Rate-limit counters in the database, so every server process counts together. A hit locks its
// keys' rows (FOR UPDATE, in key order) and either counts on all of them or on none: two processes
// asking at once are counted one after the other, never both let through on a stale count.
import { createHash } from 'node:crypto';
import { asc, eq, inArray, lt, sql } from 'drizzle-orm';
import { db, type Db } from '@/db';
import { rateLimits } from '@/db/schema';
import { afterHit, expiresAt, waitMs, type Counter, type Rule } from '@/lib/server/rate-limit-rules';

/** One limit to count a request against. */
export interface Limit {
  key: string;
  rule: Rule;
}

/** The outcome of a hit: counted, or refused with the whole seconds to wait and the limit that refused. */
export type HitResult = { ok: true } | { ok: false; retryAfter: number; key: string };

/** A key for `kind` and its subject (an e-mail, an address…), hashed so the table holds neither. */
export function limitKey(kind: string, ...subject: string[]): string {
  return `${kind}:${createHash('sha256').update(subject.join('\n')).digest('base64url').slice(0, 24)}`;
}

const SWEEP_EVERY_MS = 60_000;
let lastSweep = 0;

/** Deletes counters that no longer matter; every process does so at most once a minute after a hit. */
export async function sweepRateLimits(now = new Date(), database: Db = db): Promise<number> {
  const gone = await database.delete(rateLimits).where(lt(rateLimits.expiresAt, now)).returning({ key: rateLimits.key });
  return gone.length;
}

/** Counts one hit on every limit, or on none when any says wait. */
export async function hitLimits(limits: Limit[], now = new Date(), database: Db = db): Promise<HitResult> {
  const byKey = new Map(limits.map((l) => [l.key, l.rule]));
  const keys = [...byKey.keys()].sort();
  if (keys.length === 0) return { ok: true };
  const t = now.getTime();
  const result = await database.transaction(async (tx): Promise<HitResult> => {
    // Rows first (a new key gets an empty counter), so FOR UPDATE has something to lock.
    await tx
      .insert(rateLimits)
      .values(keys.map((key) => ({ key, count: 0, windowStart: now, lastAt: now, expiresAt: now })))
      .onConflictDoNothing();
    const rows = await tx.select().from(rateLimits).where(inArray(rateLimits.key, keys)).orderBy(asc(rateLimits.key)).for('update');
    const counters = new Map<string, Counter>(rows.map((r) => [r.key, { count: r.count, windowStart: r.windowStart.getTime(), lastAt: r.lastAt.getTime() }]));
    let refused: HitResult = { ok: true };
    for (const key of keys) {
      const wait = waitMs(byKey.get(key)!, counters.get(key), t);
      if (wait > 0 && (refused.ok || wait > refused.retryAfter * 1000)) refused = { ok: false, retryAfter: Math.ceil(wait / 1000), key };
    }
    if (!refused.ok) return refused;
    for (const key of keys) {
      const rule = byKey.get(key)!;
      const next = afterHit(rule, counters.get(key), t);
      await tx
        .update(rateLimits)
        .set({ count: next.count, windowStart: new Date(next.windowStart), lastAt: new Date(next.lastAt), expiresAt: new Date(expiresAt(rule, next)) })
        .where(eq(rateLimits.key, key));
    }
    return { ok: true };
  });
  if (t - lastSweep > SWEEP_EVERY_MS) {
    lastSweep = t;
    await sweepRateLimits(now, database);
  }
  return result;
}

/** Takes back one hit on each key: the attempt turned out not to be what the limit counts. */
export async function unhitLimits(keys: string[], database: Db = db): Promise<void> {
  if (keys.length === 0) return;
  await database
    .update(rateLimits)
    .set({ count: sql`greatest(${rateLimits.count} - 1, 0)` })
    .where(inArray(rateLimits.key, keys));
}

/** Runs a counted request; the counts are given back if it throws, so a crash costs no one a try. */
export async function runCounted(keys: string[], run: () => Promise<Response>): Promise<Response> {
  try {
    return await run();
  } catch (e) {
    await unhitLimits(keys);
    throw e;
  }
}

/** Forgets the keys' counts altogether (a correct password ends its streak of failures). */
export async function clearLimits(keys: string[], database: Db = db): Promise<void> {
  if (keys.length === 0) return;
  await database.delete(rateLimits).where(inArray(rateLimits.key, keys));
}
