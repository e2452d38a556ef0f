// Two servers starting on one PostgreSQL: migrations and the demo seed run under one advisory
// lock, so the second waits for the first instead of migrating or seeding beside it. On PGlite
// (one process) the lock is a plain call. The PostgreSQL case runs where TEST_DATABASE_URL is set
// (CI's PostgreSQL run).
import { randomUUID } from 'node:crypto';
import { PGlite } from '@electric-sql/pglite';
import { describe, expect, it } from 'vitest';
import { openDatabase } from '@/db/open';
import { createServerDatabase, dropServerDatabase } from './server-database';

const serverUrl = process.env.TEST_DATABASE_URL;
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Runs two "starts" at once; answers the order of their enter/leave marks. */
async function twoStarts(a: { withStartLock: <T>(fn: () => Promise<T>) => Promise<T> }, b: typeof a): Promise<string[]> {
  const marks: string[] = [];
  const start = (name: string, h: typeof a) =>
    h.withStartLock(async () => {
      marks.push(`${name} in`);
      await sleep(150);
      marks.push(`${name} out`);
    });
  await Promise.all([start('A', a), start('B', b)]);
  return marks;
}

describe('the start lock', () => {
  it.skipIf(!serverUrl)('on PostgreSQL: two handles (two servers) never hold it together, and both migrate', async () => {
    const name = `cw_lock_${randomUUID().replace(/-/g, '').slice(0, 12)}`;
    const url = await createServerDatabase(serverUrl!, name);
    const a = await openDatabase({ url });
    const b = await openDatabase({ url });
    try {
      const marks = await twoStarts(a, b);
      const first = marks[0]!.split(' ')[0];
      const second = first === 'A' ? 'B' : 'A';
      expect(marks).toEqual([`${first} in`, `${first} out`, `${second} in`, `${second} out`]);
      // Racing migrations under the lock both succeed (the second finds nothing to do).
      await Promise.all([a.withStartLock(() => a.migrate()), b.withStartLock(() => b.migrate())]);
    } finally {
      await a.close();
      await b.close();
      await dropServerDatabase(serverUrl!, name);
    }
  });

  it('on PGlite: runs the function and gives back its result', async () => {
    const h = await openDatabase({ pglite: new PGlite() });
    try {
      expect(await h.withStartLock(async () => 42)).toBe(42);
    } finally {
      await h.close();
    }
  });
});
