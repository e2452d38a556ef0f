// Issue 14: a ready notice can be sent again once it has gone. Each re-send is a new notices row
// numbered after the last (its own delivery state; the first send's record untouched), audited
// as notice.resent; refused before the first has gone, while the last is undelivered (retry that
// one), for a ticket not ready, and for another shop's ticket.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

const mail = vi.hoisted(() => ({ sent: [] as { to: string; subject: string; text: string }[], fail: false }));
vi.mock('astro:env/server', async () => (await import('./server-env')).serverEnv());
vi.mock('@/lib/server/mail', () => ({
  sendMail: vi.fn(async (m: { to: string; subject: string; text: string }) => {
    if (mail.fail) throw new Error('connection refused (test)');
    mail.sent.push(m);
  }),
}));
vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { auditEvents, customers, notices, tickets } = await import('@/db/schema');
const { and, asc, eq } = await import('drizzle-orm');
const prices = await import('@/services/counter/prices');
const notice = await import('@/services/notices');
const { makeShop, TEST_PRICES } = await import('./fixtures');

let a: Shop;
let b: Shop;
let ticketNo = 9700;

async function readyTicket(status: 'ready' | 'received' = 'ready') {
  ticketNo += 1;
  const [c] = await db.insert(customers).values({ shopId: a.shopId, name: 'Bertil Quern', email: 'bertil.quern@example.com' }).returning();
  const [t] = await db.insert(tickets).values({ shopId: a.shopId, number: ticketNo, customerId: c!.id, status }).returning();
  return t!;
}

const readyRows = (ticketId: string) =>
  db
    .select()
    .from(notices)
    .where(and(eq(notices.ticketId, ticketId), eq(notices.kind, 'ready')))
    .orderBy(asc(notices.sequence));

beforeAll(async () => {
  a = await makeShop('Resend Hems');
  b = await makeShop('Resend Stranger');
  await prices.savePriceList(a.lead, { currency: 'EUR', hours: 'Wed–Sat 10:00–16:00', location: '', autoReadyNotice: false, items: [...TEST_PRICES] });
});
afterAll(() => handle.close());

describe('sending the ready notice again', () => {
  it('makes a new numbered notice, delivered, leaving the first one as it was, and audits it', async () => {
    const t = await readyTicket();
    mail.fail = false;
    const first = await notice.sendReadyNotice(a.counter, t.id);
    expect(first.status).toBe('sent');
    await expect(notice.sendReadyNotice(a.counter, t.id)).rejects.toMatchObject({ status: 409 });
    mail.sent.length = 0;
    const again = await notice.resendReadyNotice(a.counter, t.id);
    expect([again.sequence, again.status, again.attempts, again.to]).toEqual([2, 'sent', 1, 'bertil.quern@example.com']);
    expect(mail.sent.map((m) => m.subject)).toEqual([`Ready to collect: ticket RH ${t.number}`]);
    const third = await notice.resendReadyNotice(a.lead, t.id);
    expect(third.sequence).toBe(3);
    const rows = await readyRows(t.id);
    expect(rows.map((r) => [r.sequence, r.status])).toEqual([
      [1, 'sent'],
      [2, 'sent'],
      [3, 'sent'],
    ]);
    expect(rows[0]).toEqual(first);
    const audit = await db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.subject, t.id), eq(auditEvents.action, 'notice.resent')));
    expect(audit.map((e) => (e.detail as { sequence: number }).sequence).sort()).toEqual([2, 3]);
    expect(audit.map((e) => e.actorId).sort()).toEqual([a.counter.userId, a.lead.userId].sort());
  });

  it('is refused before the first has gone, while the last is undelivered, for a ticket not ready, and for another shop', async () => {
    const t = await readyTicket();
    await expect(notice.resendReadyNotice(a.counter, t.id)).rejects.toMatchObject({ status: 409, message: expect.stringMatching(/send it first/) });
    mail.fail = true;
    const failed = await notice.sendReadyNotice(a.counter, t.id);
    expect(failed.status).toBe('failed');
    await expect(notice.resendReadyNotice(a.counter, t.id)).rejects.toMatchObject({ status: 409, message: expect.stringMatching(/retry that one/) });
    mail.fail = false;
    await notice.retryNotice(a.counter, t.id, failed.id);
    await expect(notice.resendReadyNotice(b.counter, t.id)).rejects.toMatchObject({ status: 404 });
    const early = await readyTicket('received');
    await expect(notice.resendReadyNotice(a.counter, early.id)).rejects.toMatchObject({ status: 422 });
    expect((await notice.resendReadyNotice(a.counter, t.id)).sequence).toBe(2);
  });
});
