// Kept session lookups on the embedded database (drizzle/0023): a write to what a lookup reads (a
// session, a user, a membership, a shop's name) forgets them at its commit, told by the database;
// other writes (a garment moved) leave them, so a busy screen does not look its sessions up again
// after every move. On PostgreSQL every write request forgets them, as before.
import { beforeAll, describe, expect, it, vi } from 'vitest';

vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { eq } = await import('drizzle-orm');
const { garments, member, organization, user } = await import('@/db/schema');
const { forgetSessionsAfterWrite, keptSessionLookups, listenForSessionChanges, lookUpSession } = await import('@/services/session-lookup');
const { makeShop } = await import('./fixtures');
const { openTicket } = await import('./garment-fixtures');

const embedded = handle.kind === 'pglite';
/** A lookup kept: a token better-auth does not know is kept as signed out for the TTL. */
async function keepOne(): Promise<void> {
  expect(await lookUpSession(new Headers({ cookie: 'better-auth.session_token=unknown-token.sig' }))).toEqual({ user: null, member: null });
  expect(keptSessionLookups()).toBe(1);
}

describe('kept session lookups', () => {
  beforeAll(async () => {
    await listenForSessionChanges();
  });

  it.runIf(embedded)('stay after a write request that changed no session, user, member or shop', async () => {
    const shop = await makeShop('Lookup Shop');
    const { garment } = await openTicket(shop, { customer: { name: 'Lookup Customer' }, garments: [{ description: 'Lookup pair' }] });
    await keepOne();
    await db.update(garments).set({ description: 'Moved pair' }).where(eq(garments.id, garment.id));
    forgetSessionsAfterWrite();
    expect(keptSessionLookups()).toBe(1);
  });

  it.runIf(embedded)('go at the commit of a write to a session, a user, a member or a shop, whoever writes it', async () => {
    const shop = await makeShop('Told Shop');
    const writes = [
      () => db.update(user).set({ name: 'Renamed Lead' }).where(eq(user.id, shop.lead.userId)),
      () => db.update(member).set({ role: 'tailor' }).where(eq(member.userId, shop.tailor.userId)),
      () => db.update(organization).set({ name: 'Told Shop, renamed' }).where(eq(organization.id, shop.shopId)),
      () => db.transaction(async (tx) => tx.delete(member).where(eq(member.userId, shop.apprentice.userId))),
    ];
    for (const write of writes) {
      await keepOne();
      await write();
      expect(keptSessionLookups()).toBe(0);
    }
  });

  it.runIf(!embedded)('go after every write request on PostgreSQL (other servers write too)', async () => {
    await keepOne();
    forgetSessionsAfterWrite();
    expect(keptSessionLookups()).toBe(0);
  });
});
