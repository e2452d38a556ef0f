// The queue list's version (issue 12): every write that changes what the list shows moves the
// shop's version in the database (triggers, drizzle/0018_list-versions.sql), so a client's old ETag
// gets the changed list, never a 304 and never an answer kept from before; another shop's list and
// version stay as they were; a kept answer never goes to another shop or to a role that sees less.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { QueueAnswer } from '@/services/queue';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { eq, sql } = await import('drizzle-orm');
const { auditEvents, customers, garments, shopListVersions, user } = await import('@/db/schema');
const { readQueue } = await import('@/services/queue');
const { addGarment, moveGarment, updateGarment } = await import('@/services/garments');
const { stepBackGarment } = await import('@/services/garment-step-back');
const { moveTicket } = await import('@/services/tickets');
const { eraseCustomer, updateCustomer } = await import('@/services/customers');
const { pickUp } = await import('@/services/counter/payments');
const { addLine } = await import('@/services/counter/prices');
const { makeShop } = await import('./fixtures');
const { openTicket } = await import('./garment-fixtures');

const OPEN = { view: 'open', limit: 50 } as const;
let a: Shop;
let b: Shop;
beforeAll(async () => {
  a = await makeShop('Version Shop A');
  b = await makeShop('Version Shop B');
});
afterAll(() => handle.close());

const versionOf = async (shopId: string) => {
  const [row] = await db
    .select({ v: sql<string>`${shopListVersions.version}::text` })
    .from(shopListVersions)
    .where(eq(shopListVersions.shopId, shopId));
  return row?.v ?? '0';
};
const rowOf = (answer: QueueAnswer, id: string) => answer.rows?.find((r) => r.id === id);

/** Reads A's list (keeping the answer), runs the write, and reads again with the old ETag: the
 * version moved, the answer is a 200 with the change, and shop B's list is still a 304. */
async function afterWrite(write: () => Promise<unknown>): Promise<QueueAnswer> {
  const before = await readQueue(a.lead, OPEN, null);
  const other = await readQueue(b.lead, OPEN, null);
  const [va, vb] = [await versionOf(a.shopId), await versionOf(b.shopId)];
  await write();
  expect(BigInt(await versionOf(a.shopId))).toBeGreaterThan(BigInt(va));
  expect(await versionOf(b.shopId)).toBe(vb);
  expect((await readQueue(b.lead, OPEN, other.etag)).body).toBeNull();
  const after = await readQueue(a.lead, OPEN, before.etag);
  expect(after.etag).not.toBe(before.etag);
  expect(after.body).not.toBeNull();
  expect(JSON.parse(Buffer.from(after.body!).toString())).toEqual(after.rows);
  return after;
}

describe('every write the queue shows moves the shop version', () => {
  beforeAll(async () => {
    // B has work of its own, so "B unchanged" is a kept, non-empty list.
    await openTicket(b, { customer: { name: 'B Customer' }, garments: [{ description: 'B flannels' }] });
  });

  it('intake: a new ticket appears', async () => {
    let id = '';
    const after = await afterWrite(async () => {
      id = (await openTicket(a, { customer: { name: 'Intake Customer' }, garments: [{ description: 'New chinos' }] })).garment.id;
    });
    expect(rowOf(after, id)).toMatchObject({ description: 'New chinos', customerName: 'Intake Customer', status: 'received' });
  });

  it('a garment added to a ticket appears', async () => {
    const { ticket } = await openTicket(a, { customer: { name: 'Adding Customer' }, garments: [{ description: 'First pair' }] });
    let id = '';
    const after = await afterWrite(async () => {
      id = (await addGarment(a.lead, ticket.id, { description: 'Second pair', dueOn: null, assigneeId: null, existingFinish: 'plain-hem' })).id;
    });
    expect(rowOf(after, id)).toMatchObject({ description: 'Second pair' });
  });

  it('a move on, a step back, and a whole ticket moved', async () => {
    const { ticket, garment } = await openTicket(a, { customer: { name: 'Moving Customer' }, garments: [{ description: 'Moving pair' }] });
    expect(rowOf(await afterWrite(() => moveGarment(a.lead, garment.id, 'marked')), garment.id)).toMatchObject({ status: 'marked' });
    expect(rowOf(await afterWrite(() => stepBackGarment(a.lead, garment.id, 'marked')), garment.id)).toMatchObject({ status: 'received' });
    expect(rowOf(await afterWrite(() => moveTicket(a.lead, ticket.id, 'marked')), garment.id)).toMatchObject({ status: 'marked' });
  });

  it('pickup: the collected garment leaves the open list', async () => {
    const { ticket, garment } = await openTicket(a, { customer: { name: 'Pickup Customer' }, garments: [{ description: 'Ready pair' }] });
    for (const to of ['marked', 'cut', 'stitched', 'pressed'] as const) await moveTicket(a.lead, ticket.id, to);
    const ready = await afterWrite(() => moveTicket(a.lead, ticket.id, 'ready'));
    expect(rowOf(ready, garment.id)).toMatchObject({ status: 'ready', readyAt: expect.any(String) });
    await addLine(a.counter, ticket.id, { source: 'no-charge', reason: 'Pressed only, as a favour' });
    expect(rowOf(await afterWrite(() => pickUp(a.counter, ticket.id)), garment.id)).toBeUndefined();
  });

  it('a garment edited: description, due day, assignee', async () => {
    const { garment } = await openTicket(a, { customer: { name: 'Edit Customer' }, garments: [{ description: 'Plain pair' }] });
    expect(rowOf(await afterWrite(() => updateGarment(a.lead, garment.id, { description: 'Cord pair' })), garment.id)).toMatchObject({
      description: 'Cord pair',
    });
    expect(rowOf(await afterWrite(() => updateGarment(a.lead, garment.id, { dueOn: '2031-05-06' })), garment.id)).toMatchObject({ dueOn: '2031-05-06' });
    expect(rowOf(await afterWrite(() => updateGarment(a.lead, garment.id, { assigneeId: a.tailor.userId })), garment.id)).toMatchObject({
      assigneeId: a.tailor.userId,
      assigneeName: a.tailor.userName,
    });
  });

  it("the customer's name and phone changed, and the customer erased", async () => {
    const { ticket, garment } = await openTicket(a, { customer: { name: 'Old Name', phone: '555 010 1111' }, garments: [{ description: 'Their pair' }] });
    const customerId = ticket.customerId!;
    expect(rowOf(await afterWrite(() => updateCustomer(a.lead, customerId, { name: 'New Name' })), garment.id)).toMatchObject({ customerName: 'New Name' });
    expect(rowOf(await afterWrite(() => updateCustomer(a.lead, customerId, { phone: '555 010 2222' })), garment.id)).toMatchObject({
      customerPhone: '555 010 2222',
    });
    const erased = rowOf(await afterWrite(() => eraseCustomer(a.lead, customerId)), garment.id);
    expect(erased?.customerName).not.toBe('New Name');
    expect(erased?.customerPhone ?? null).toBeNull();
  });

  it("an assignee's name changed (better-auth's update-user writes the user row)", async () => {
    const { garment } = await openTicket(a, {
      customer: { name: 'Assigned Customer' },
      garments: [{ description: 'Assigned pair', assigneeId: a.tailor.userId }],
    });
    const after = await afterWrite(() => db.update(user).set({ name: 'Tailor Renamed' }).where(eq(user.id, a.tailor.userId)));
    expect(rowOf(after, garment.id)).toMatchObject({ assigneeName: 'Tailor Renamed' });
  });

  it('writes straight into the database (a script, another program): garment, customer, the ready event', async () => {
    const { ticket, garment } = await openTicket(a, { customer: { name: 'Raw Customer' }, garments: [{ description: 'Raw pair' }] });
    const raw = await afterWrite(() => db.update(garments).set({ description: 'Raw edit' }).where(eq(garments.id, garment.id)));
    expect(rowOf(raw, garment.id)).toMatchObject({ description: 'Raw edit' });
    const renamed = await afterWrite(() => db.update(customers).set({ name: 'Raw Renamed' }).where(eq(customers.id, ticket.customerId!)));
    expect(rowOf(renamed, garment.id)).toMatchObject({ customerName: 'Raw Renamed' });
    await db.execute(sql`update garments set status = 'ready' where id = ${garment.id}`);
    const at = new Date('2030-02-03T04:05:06.000Z');
    const event = await afterWrite(() =>
      db.insert(auditEvents).values({ shopId: a.shopId, actorId: a.lead.userId, action: 'garment.moved', subject: garment.id, detail: { to: 'ready' }, at }),
    );
    expect(rowOf(event, garment.id)).toMatchObject({ readyAt: at.toISOString() });
    await afterWrite(() => db.delete(garments).where(eq(garments.id, garment.id)));
  });

  it('a write that changes nothing the list shows leaves the version, so the ETag still answers 304', async () => {
    await openTicket(a, { customer: { name: 'Quiet Customer' }, garments: [{ description: 'Quiet pair' }] });
    const before = await readQueue(a.lead, OPEN, null);
    await db.insert(auditEvents).values({ shopId: a.shopId, actorId: a.lead.userId, action: 'price-kind.added', subject: null, detail: {} });
    const again = await readQueue(a.lead, OPEN, before.etag);
    expect([again.etag, again.body]).toEqual([before.etag, null]);
  });
});

describe('kept answers stay with their shop and role', () => {
  it("never answers another shop, another person's ETag, or a role that sees less", async () => {
    const { garment: theirs } = await openTicket(a, {
      customer: { name: 'Lead Work', phone: '555 010 3333' },
      garments: [{ description: 'Tailor pair', assigneeId: a.tailor.userId }],
    });
    const { garment: open } = await openTicket(a, { customer: { name: 'Open Work' }, garments: [{ description: 'Unassigned pair' }] });
    const lead = await readQueue(a.lead, OPEN, null);
    expect(rowOf(lead, theirs.id)).toMatchObject({ customerPhone: '555 010 3333' });
    // Same shop, same version: the apprentice's answer is their own, without the tailor's work or phones.
    const apprentice = await readQueue(a.apprentice, OPEN, lead.etag);
    expect(apprentice.body).not.toBeNull();
    expect(rowOf(apprentice, theirs.id)).toBeUndefined();
    expect(rowOf(apprentice, open.id)).toBeDefined();
    expect(apprentice.rows!.every((r) => !('customerPhone' in r))).toBe(true);
    expect(Buffer.from(apprentice.body!).toString()).not.toContain('555 010 3333');
    // Another person with the same role sends the lead's ETag: not a 304 (ETags name who asks).
    expect((await readQueue(a.tailor, OPEN, lead.etag)).body).not.toBeNull();
    // Shop B with A's ETag: its own list, none of A's rows.
    const other = await readQueue(b.lead, OPEN, lead.etag);
    expect(other.body).not.toBeNull();
    expect(other.rows!.some((r) => r.id === theirs.id || r.id === open.id)).toBe(false);
    expect(Buffer.from(other.body!).toString()).not.toContain('Lead Work');
  });

  it('a history page is kept per cursor and limit too, and moves with the version', async () => {
    const first = await readQueue(a.lead, { view: 'history', limit: 1 }, null);
    expect(first.rows).toHaveLength(1);
    expect((await readQueue(a.lead, { view: 'history', limit: 1 }, first.etag)).body).toBeNull();
    expect((await readQueue(a.lead, { view: 'history', limit: 2 }, null)).rows!.length).toBeGreaterThanOrEqual(1);
    const { ticket, garment } = await openTicket(a, { customer: { name: 'History Customer' }, garments: [{ description: 'Newest collected' }] });
    for (const to of ['marked', 'cut', 'stitched', 'pressed', 'ready'] as const) await moveTicket(a.lead, ticket.id, to);
    await addLine(a.counter, ticket.id, { source: 'no-charge', reason: 'A favour' });
    await pickUp(a.counter, ticket.id);
    const after = await readQueue(a.lead, { view: 'history', limit: 1 }, first.etag);
    expect(after.rows!.map((r) => r.id)).toEqual([garment.id]);
  });
});

describe('the version, kept on the embedded database until a move is heard (drizzle/0022)', () => {
  type Client = { query: (...args: unknown[]) => Promise<unknown> };
  /** How many queries the database client is asked while fn runs. */
  async function queriesDuring(fn: () => Promise<unknown>): Promise<number> {
    const client = (db as unknown as { $client: Client }).$client;
    const spy = vi.spyOn(client, 'query');
    try {
      await fn();
      return spy.mock.calls.length;
    } finally {
      spy.mockRestore();
    }
  }

  it('an unchanged list answers 304 without asking the database (PGlite); PostgreSQL is asked each time', async () => {
    await openTicket(a, { customer: { name: 'Kept Customer' }, garments: [{ description: 'Kept pair' }] });
    const first = await readQueue(a.lead, OPEN, null);
    await readQueue(a.lead, OPEN, first.etag);
    let again: QueueAnswer | undefined;
    const asked = await queriesDuring(async () => (again = await readQueue(a.lead, OPEN, first.etag)));
    expect(again!.body).toBeNull();
    expect(asked).toBe(handle.kind === 'pglite' ? 0 : 1);
  });

  it('reads racing writes never keep the version a write replaced (6 rounds, reads and a move at once)', async () => {
    const { garment } = await openTicket(a, { customer: { name: 'Racing Customer' }, garments: [{ description: 'Racing pair' }] });
    let forward = true;
    for (let round = 0; round < 6; round++) {
      const move = forward ? moveGarment(a.lead, garment.id, 'marked') : stepBackGarment(a.lead, garment.id, 'marked');
      forward = !forward;
      // Reads before, during and after the write's commit, in one turn of the event loop.
      await Promise.all([readQueue(a.lead, OPEN, null), move, readQueue(a.lead, OPEN, null), readQueue(b.lead, OPEN, null)]);
      const now = await readQueue(a.lead, OPEN, null);
      expect(rowOf(now, garment.id)?.status).toBe(forward ? 'received' : 'marked');
      const fresh = await readQueue(a.lead, OPEN, null);
      expect(fresh.etag).toBe(now.etag);
      // The version the answers are keyed by is the database's own.
      const { listVersion } = await import('@/services/list-version');
      expect(await listVersion(a.shopId)).toBe(await versionOf(a.shopId));
    }
  });
});

describe('the version read after a move, shared', () => {
  it('is read once for the requests that ask while it is read, and again after a further move (PGlite)', async () => {
    const { garment } = await openTicket(a, { customer: { name: 'Shared Customer' }, garments: [{ description: 'Shared pair' }] });
    await moveGarment(a.lead, garment.id, 'marked');
    const { listVersion } = await import('@/services/list-version');
    const client = (db as unknown as { $client: { query: (...args: unknown[]) => Promise<unknown> } }).$client;
    const spy = vi.spyOn(client, 'query');
    try {
      const versions = await Promise.all([listVersion(a.shopId), listVersion(a.shopId), listVersion(a.shopId)]);
      expect(new Set(versions).size).toBe(1);
      expect(spy.mock.calls.length).toBe(handle.kind === 'pglite' ? 1 : 3);
      // A read begun before a move is not shared with a request after it.
      const early = listVersion(b.shopId);
      await stepBackGarment(a.lead, garment.id, 'marked');
      const [, late] = await Promise.all([early, listVersion(a.shopId)]);
      expect(late).toBe(await versionOf(a.shopId));
      expect(late).not.toBe(versions[0]);
    } finally {
      spy.mockRestore();
    }
  });
});
