// The limits' counters in the database: shared by every process on one database, counted or
// refused as a whole, growing waits for failed sign-ins that never keep the owner out for long,
// and old counters swept away.
import { randomUUID } from 'node:crypto';
import { afterAll, describe, expect, it, vi } from 'vitest';
import { openDatabase, type Db } from '@/db/open';
import { rateLimits } from '@/db/schema';
import { SIGN_IN_RULES, signInLimits } from '@/services/sign-in-limit';
import { hitLimits, limitKey, sweepRateLimits, unhitLimits } from '@/services/rate-limits';
import { createServerDatabase, dropServerDatabase } from '../db/server-database';
import { db } from '../db/db-mock';

vi.mock('@/db', () => import('../db/db-mock'));

const T0 = new Date('2026-03-02T09:00:00Z').getTime();
const at = (ms: number) => new Date(T0 + ms);
const SEC = 1000;
const MIN = 60 * SEC;

/** A second "process": its own client on the same PostgreSQL database, or the same PGlite called concurrently. */
async function twoClients(): Promise<{ a: Db; b: Db; close: () => Promise<void> }> {
  const server = process.env.TEST_DATABASE_URL;
  if (!server) return { a: db, b: db, close: async () => {} };
  const name = `cw_limits_${randomUUID().replace(/-/g, '').slice(0, 10)}`;
  const url = await createServerDatabase(server, name);
  const first = await openDatabase({ url });
  await first.migrate();
  const second = await openDatabase({ url });
  return {
    a: first.db,
    b: second.db,
    close: async () => {
      await first.close();
      await second.close();
      await dropServerDatabase(server, name);
    },
  };
}

describe('counters shared between processes', () => {
  let close = async () => {};
  afterAll(() => close());

  it('twelve hits at once from two clients on one database let exactly the limit through', async () => {
    const clients = await twoClients();
    close = clients.close;
    const limit = [{ key: limitKey('test:shared', randomUUID()), rule: { kind: 'fixed', max: 5, windowMs: MIN } as const }];
    const results = await Promise.all(Array.from({ length: 12 }, (_, i) => hitLimits(limit, at(i), i % 2 ? clients.a : clients.b)));
    expect(results.filter((r) => r.ok)).toHaveLength(5);
    const refused = results.filter((r) => !r.ok);
    expect(refused).toHaveLength(7);
    for (const r of refused) expect(r.ok === false && r.retryAfter).toBeGreaterThan(50);
    // And what one client counted, the other sees.
    expect((await hitLimits(limit, at(20 * SEC), clients.a)).ok).toBe(false);
    // The window began at whichever of the twelve (at 0–11 ms) the database took first: a minute
    // after the last of them, it has ended whatever the order.
    expect((await hitLimits(limit, at(MIN + 12), clients.b)).ok).toBe(true);
  });
});

describe('failed sign-ins', () => {
  it('from one address: 5 free, then waits of 30 s, 60 s, 2 min… at most 5 min; a refused try does not count', async () => {
    const limits = signInLimits('owner@limits.example', '203.0.113.9');
    let t = 0;
    for (let i = 0; i < 5; i += 1) expect((await hitLimits(limits, at((t += SEC)))).ok).toBe(true);
    const refused = await hitLimits(limits, at(t + SEC));
    expect(refused).toMatchObject({ ok: false, retryAfter: 29 });
    expect((await hitLimits(limits, at(t + 29 * SEC))).ok).toBe(false);
    expect((await hitLimits(limits, at((t += 30 * SEC)))).ok).toBe(true);
    expect((await hitLimits(limits, at(t + 59 * SEC))).ok).toBe(false);
    expect((await hitLimits(limits, at((t += 60 * SEC)))).ok).toBe(true);
    for (const wait of [2 * MIN, 4 * MIN, 5 * MIN, 5 * MIN]) {
      expect(await hitLimits(limits, at(t + wait - SEC))).toMatchObject({ ok: false, retryAfter: 1 });
      expect((await hitLimits(limits, at((t += wait)))).ok).toBe(true);
    }
    // Fifteen quiet minutes forget the streak.
    t += 15 * MIN;
    for (let i = 0; i < 5; i += 1) expect((await hitLimits(limits, at((t += SEC)))).ok).toBe(true);
  });

  it("the owner's own address is not held by a stranger's failures; past 10 on the account, everyone waits at most a minute", async () => {
    const email = 'besieged@limits.example';
    let t = 0;
    // A stranger's 5 failures: they now wait, the owner does not. Another stranger fails 4 times.
    for (let i = 0; i < 5; i += 1) expect((await hitLimits(signInLimits(email, '198.51.100.1'), at((t += SEC)))).ok).toBe(true);
    expect((await hitLimits(signInLimits(email, '198.51.100.1'), at(t + SEC))).ok).toBe(false);
    for (let i = 0; i < 4; i += 1) expect((await hitLimits(signInLimits(email, '198.51.100.2'), at((t += SEC)))).ok).toBe(true);
    const owner = signInLimits(email, '192.0.2.10');
    const ownerIn = await hitLimits(owner, at(t + SEC));
    expect(ownerIn.ok).toBe(true);
    // A right password takes its own attempt back (what limitedSignIn does on 200).
    await unhitLimits(owner.filter((l) => !l.key.startsWith('signin:pair:')).map((l) => l.key));
    // A third stranger spends the account's tenth failure: from then on every address waits 5 s, 10 s… at most 60 s.
    const third = signInLimits(email, '198.51.100.3');
    expect((await hitLimits(third, at((t += SEC)))).ok).toBe(true);
    expect(await hitLimits(owner, at(t + SEC))).toMatchObject({ ok: false, retryAfter: 4 });
    expect((await hitLimits(owner, at(t + 5 * SEC))).ok).toBe(true);
    for (let i = 0; i < 8; i += 1) {
      const fourth = signInLimits(email, `198.51.100.${10 + i}`);
      expect((await hitLimits(fourth, at((t += SEC * 60)))).ok).toBe(true);
    }
    const wait = await hitLimits(owner, at(t));
    expect(wait).toMatchObject({ ok: false, retryAfter: SIGN_IN_RULES.account.capMs / SEC });
    expect((await hitLimits(owner, at(t + SIGN_IN_RULES.account.capMs))).ok).toBe(true);
  });

  it('one address: 30 failures over any accounts, then 15 minutes for every account', async () => {
    const address = '203.0.113.44';
    for (let i = 0; i < 30; i += 1) expect((await hitLimits(signInLimits(`guess-${i}@limits.example`, address), at(i * SEC))).ok).toBe(true);
    expect(await hitLimits(signInLimits('another@limits.example', address), at(30 * SEC))).toMatchObject({ ok: false, retryAfter: 15 * 60 - 30 });
    expect((await hitLimits(signInLimits('another@limits.example', address), at(15 * MIN))).ok).toBe(true);
  });
});

describe('old counters', () => {
  it('are swept once they no longer matter, and only those', async () => {
    const old = { key: limitKey('test:old', randomUUID()), rule: { kind: 'fixed', max: 3, windowMs: MIN } as const };
    const fresh = { key: limitKey('test:fresh', randomUUID()), rule: { kind: 'fixed', max: 3, windowMs: 60 * MIN } as const };
    await hitLimits([old, fresh], at(0));
    await sweepRateLimits(at(2 * MIN));
    const keys = (await db.select({ key: rateLimits.key }).from(rateLimits)).map((r) => r.key);
    expect(keys).toContain(fresh.key);
    expect(keys).not.toContain(old.key);
  });
});
