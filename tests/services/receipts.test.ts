// Issue 14, receipts: a payment's receipt read back from its PDF (poppler) carries the shop's
// details, the live lines (a voided one neither shown nor counted), every payment with how and
// when, refunds and the credit owed; another shop, or another ticket's payment, is a 404; the
// e-mailed receipt goes to the customer with the PDF attached, and is refused without an address.
// Amounts are invented (cents).
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

const sent = vi.hoisted(
  () =>
    [] as {
      mail: { to: string; subject: string; text: string; attachments?: { filename: string; content: Buffer; contentType: string }[] };
      origin: unknown;
    }[],
);
vi.mock('astro:env/server', async () => (await import('./server-env')).serverEnv());
vi.mock('@/lib/server/mail', () => ({ sendMail: vi.fn(async (mail: (typeof sent)[number]['mail'], origin: unknown) => void sent.push({ mail, origin })) }));
vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { auditEvents, customers, tickets } = await import('@/db/schema');
const { eq } = await import('drizzle-orm');
const prices = await import('@/services/counter/prices');
const pay = await import('@/services/counter/payments');
const { settleCredit } = await import('@/services/counter/refunds');
const { receiptPdf, emailReceipt } = await import('@/services/counter/receipts');
const { makeShop, TEST_PRICES } = await import('./fixtures');
const { flatText, layoutText, pdfFile } = await import('../lib/cut-sheet/poppler');

let a: Shop;
let b: Shop;
let ticketNo = 9400;

async function ticketFor(shop: Shop, email: string | null = 'odile.farthing@example.com') {
  ticketNo += 1;
  const [c] = await db.insert(customers).values({ shopId: shop.shopId, name: 'Odile Farthing', email }).returning();
  const [t] = await db.insert(tickets).values({ shopId: shop.shopId, number: ticketNo, customerId: c!.id, status: 'ready' }).returning();
  return t!;
}

beforeAll(async () => {
  a = await makeShop('Tackstitch Alterations');
  b = await makeShop('Other Seam Shop');
  await prices.savePriceList(a.lead, {
    currency: 'EUR',
    hours: 'Mon–Sat 9:00–17:00',
    location: '12 Selvedge Yard, Nethercombe',
    autoReadyNotice: false,
    items: [...TEST_PRICES],
  });
});
afterAll(() => handle.close());

/** A ticket: cuff 26.00, a wrong line voided, two cash payments 10.00 + 16.00, then -6.00 goodwill and 2.00 given back: 4.00 owed. */
async function paidTicket(email?: string | null) {
  const t = await ticketFor(a, email);
  await prices.addLine(a.counter, t.id, { source: 'list', key: 'cuff-from-hem' });
  const wrong = await prices.addLine(a.counter, t.id, { source: 'adjust', label: 'Wrong tape charge', amountMinor: 999, reason: 'typed twice' });
  await prices.voidLine(a.counter, t.id, wrong.id, { reason: 'entered by mistake' });
  await pay.takePayment(a.counter, t.id, { method: 'cash', amountMinor: 1000 });
  await pay.takePayment(a.counter, t.id, { method: 'card', amountMinor: 1600 });
  await prices.addLine(a.lead, t.id, { source: 'adjust', label: 'Goodwill', amountMinor: -600, reason: 'late' });
  const after = await settleCredit(a.counter, t.id, { method: 'cash', amountMinor: 200, reason: 'part back' });
  return { t, payments: after.payments };
}

describe('a payment receipt', () => {
  it('reads back with the shop, the live lines, each payment with how and when, refunds and the credit owed', async () => {
    const { t, payments } = await paidTicket();
    const { pdf, fileName } = await receiptPdf(a.counter, t.id, payments[1]!.id);
    expect(fileName).toBe(`receipt-${t.number}.pdf`);
    const file = pdfFile(pdf);
    const text = flatText(file);
    for (const words of [
      'Tackstitch Alterations',
      '12 Selvedge Yard, Nethercombe',
      'Hours: Mon–Sat 9:00–17:00',
      'RECEIPT',
      `Ticket TA ${t.number}`,
      'Odile Farthing',
      'taken by counter of Tackstitch Alterations',
    ]) {
      expect(text).toContain(words);
    }
    expect(text).not.toContain('Wrong tape charge');
    const rows = layoutText(file);
    expect(rows).toMatch(/Received with thanks\s+€16\.00/);
    expect(text).toMatch(/By card at the counter, \d{1,2} \w{3} \d{4}, \d\d:\d\d, taken by counter of Tackstitch/);
    expect(rows).toMatch(/Cuff from a plain hem\s+€26\.00/);
    expect(rows).toMatch(/Goodwill \(late\)\s+-€6\.00/);
    expect(rows).toMatch(/Total\s+€20\.00/);
    expect(rows).toMatch(/Paid .*, cash\s+€10\.00/);
    expect(rows).toMatch(/Paid .*, card at the counter\s+€16\.00/);
    expect(rows).toMatch(/Cash given back .*\s+-€2\.00/);
    expect(rows).toMatch(/Balance due\s+€0\.00/);
    expect(rows).toMatch(/Owed to you\s+€4\.00/);
  });

  it('is a 404 for another shop, for a payment of another ticket, and for a malformed id', async () => {
    const { t, payments } = await paidTicket();
    const other = await paidTicket();
    await expect(receiptPdf(b.counter, t.id, payments[0]!.id)).rejects.toMatchObject({ status: 404 });
    await expect(receiptPdf(a.counter, other.t.id, payments[0]!.id)).rejects.toMatchObject({ status: 404 });
    await expect(receiptPdf(a.counter, t.id, 'not-a-uuid')).rejects.toMatchObject({ status: 404 });
  });
});

describe('an e-mailed receipt', () => {
  it('goes to the customer as shop mail of kind receipt, the PDF attached, and is audited', async () => {
    const { t, payments } = await paidTicket('odile.f@example.com');
    sent.length = 0;
    expect(await emailReceipt(a.counter, t.id, payments[0]!.id)).toEqual({ to: 'odile.f@example.com' });
    expect(sent).toHaveLength(1);
    const [{ mail, origin }] = sent as [(typeof sent)[number]];
    expect(origin).toEqual({ shopId: a.shopId, kind: 'receipt' });
    expect(mail.subject).toBe(`Receipt for ticket TA ${t.number}: €10.00`);
    expect(mail.attachments?.[0]).toMatchObject({ filename: `receipt-${t.number}.pdf`, contentType: 'application/pdf' });
    expect(flatText(pdfFile(new Uint8Array(mail.attachments![0]!.content)))).toMatch(/Received with thanks €10\.00 By cash, /);
    const events = await db.select().from(auditEvents).where(eq(auditEvents.subject, t.id));
    expect(events.map((e) => e.action)).toContain('receipt.emailed');
  });

  it('is refused with a clear message when the customer has no e-mail address', async () => {
    const { t, payments } = await paidTicket(null);
    sent.length = 0;
    await expect(emailReceipt(a.counter, t.id, payments[0]!.id)).rejects.toMatchObject({ status: 422, message: expect.stringMatching(/no e-mail address/) });
    expect(sent).toHaveLength(0);
  });
});
