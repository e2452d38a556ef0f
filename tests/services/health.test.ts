// The health report: current after migrating; "behind" when the database misses the newest
// migration this build ships; unreachable (not a throw) when the database is gone.
import { describe, expect, it, vi } from 'vitest';
import { sql } from 'drizzle-orm';

vi.mock('@/db', () => import('../db/db-mock'));
const { db, handle } = await import('@/db');
const { health } = await import('@/services/health');

describe('health', () => {
  it('is ok with every shipped migration applied', async () => {
    const h = await health();
    expect(h).toMatchObject({ ok: true, database: 'reachable', migrations: 'current' });
    expect(h.applied).toBe(h.shipped);
  });

  it('says "behind" when the newest shipped migration is missing from the database', async () => {
    await db.execute(sql`delete from drizzle.__drizzle_migrations where created_at = (select max(created_at) from drizzle.__drizzle_migrations)`);
    expect(await health()).toMatchObject({ ok: false, database: 'reachable', migrations: 'behind' });
  });

  it('says unreachable, without throwing, when the database is closed', async () => {
    await handle.close();
    expect(await health()).toMatchObject({ ok: false, database: 'unreachable', migrations: 'unknown' });
  });
});
