// Moving a shop from the embedded database to PostgreSQL (scripts/move-to-postgres.mjs, the
// README's command): every row of every table arrives, children after parents, with the same
// values (names in any script, times, JSON); a target that already has accounts is refused.
// Runs where TEST_DATABASE_URL names a PostgreSQL server (CI's PostgreSQL run).
import { randomUUID } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { asc, eq } from 'drizzle-orm';
import { afterAll, describe, expect, it } from 'vitest';
import { openDatabase } from '@/db/open';
import { auditEvents as audit, customers, garments, member, organization, tickets, user } from '@/db/schema';
import { createServerDatabase, dropServerDatabase } from './server-database';
import { moveToPostgres } from '../../scripts/move-to-postgres.mjs';

const serverUrl = process.env.TEST_DATABASE_URL;
const dir = mkdtempSync(join(tmpdir(), 'cw-move-'));
const names: string[] = [];
afterAll(async () => {
  rmSync(dir, { recursive: true, force: true });
  for (const n of names) await dropServerDatabase(serverUrl!, n);
});

/** An embedded database with one shop, its people, customers, a ticket and garments. */
async function embeddedShop(): Promise<string> {
  const h = await openDatabase({ dataDir: join(dir, 'pglite') });
  await h.migrate();
  const shopId = randomUUID();
  await h.db.insert(organization).values({ id: shopId, name: 'Quillon Hems', slug: 'quillon-hems', createdAt: new Date('2026-11-02T09:15:00Z') });
  const userId = randomUUID();
  await h.db
    .insert(user)
    .values({ id: userId, name: 'Ysolde Marchetti', email: 'ysolde@quillon.test', emailVerified: false, createdAt: new Date(), updatedAt: new Date() });
  await h.db.insert(member).values({ id: randomUUID(), organizationId: shopId, userId, role: 'lead', createdAt: new Date() });
  const people = await h.db
    .insert(customers)
    .values(['Αθηνά Κορδάτου', '山田 花子', 'Zoë O’Hare', 'نور حداد'].map((name) => ({ shopId, name, email: null })))
    .returning();
  const [t] = await h.db.insert(tickets).values({ shopId, number: 1001, customerId: people[0]!.id, status: 'received' }).returning();
  for (let i = 0; i < 3; i += 1) await h.db.insert(garments).values({ shopId, ticketId: t!.id, description: `Trousers ${i + 1}`, finish: 'cuff', position: i });
  await h.db.insert(audit).values({ shopId, actorId: userId, action: 'ticket.created', subject: t!.id, detail: { note: 'moved "quoted" \\ text' } });
  await h.close();
  return shopId;
}

describe.skipIf(!serverUrl)('moving from the embedded database to PostgreSQL', () => {
  it('copies every row with the same values, and refuses a target with accounts', async () => {
    const shopId = await embeddedShop();
    const name = `cw_move_${randomUUID().replace(/-/g, '').slice(0, 12)}`;
    names.push(name);
    const url = await createServerDatabase(serverUrl!, name);
    const copied = await moveToPostgres({ dataDir: dir, url });
    expect(copied).toMatchObject({ organization: 1, user: 1, member: 1, customers: 4, tickets: 1, garments: 3 });
    const from = await openDatabase({ dataDir: join(dir, 'pglite') });
    const to = await openDatabase({ url });
    try {
      for (const table of [customers, garments, audit]) {
        const a = await from.db.select().from(table).orderBy(asc(table.id));
        const b = await to.db.select().from(table).orderBy(asc(table.id));
        expect(b).toEqual(a);
      }
      const [shop] = await to.db.select().from(organization).where(eq(organization.id, shopId));
      expect(shop!.createdAt.toISOString()).toBe('2026-11-02T09:15:00.000Z');
    } finally {
      await from.close();
      await to.close();
    }
    await expect(moveToPostgres({ dataDir: dir, url })).rejects.toThrow(/already holds accounts/);
  }, 240_000);
});
