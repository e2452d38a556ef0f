// Issue 14, text messages: the ready notice and the pay link go by the customer's preference
// (e-mail, text, both) through the SMS service's SDK to the local fake (scripts/sms-fake.mjs);
// the fake's signed status callback reaches the real route handler (a small HTTP bridge below
// stands for the app's address) and its delivery report lands on the notice. Without texts set
// up, or without a phone number, the e-mail goes and the notice says why. The callback refuses
// unsigned and wrongly signed reports (403), and a report naming another shop's notice changes nothing.
import { createServer, type Server } from 'node:http';
import type { APIContext } from 'astro';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import twilio from 'twilio';
import type { Shop } from './fixtures';

const sms = await vi.hoisted(async () => {
  const { startSmsFake } = await import('../../scripts/sms-fake.mjs');
  const { createServer: listen } = await import('node:net');
  // A free port for the bridge that stands for the app's public address (BETTER_AUTH_URL).
  const appPort = await new Promise<number>((resolve) => {
    const probe = listen().listen(0, '127.0.0.1', () => {
      const port = (probe.address() as { port: number }).port;
      probe.close(() => resolve(port));
    });
  });
  const account = { accountSid: 'AC0123456789abcdef0123456789abcdef', authToken: 'f00dfeedf00dfeedf00dfeedf00dfeed' };
  const fake = await startSmsFake({ port: 0, ...account, quiet: true, callbackDelayMs: 20 });
  return { fake, account, appUrl: `http://127.0.0.1:${appPort}`, appPort, on: true };
});
const mail = vi.hoisted(() => ({ sent: [] as { to: string; subject: string; text: string }[] }));
vi.mock('astro:env/server', () => ({
  BODY_IDLE_SECONDS: 20,
  NOTICE_LEASE_SECONDS: 180,
  PAYMENTS_API_KEY: undefined,
  PAYMENTS_API_BASE: undefined,
  PAYMENTS_WEBHOOK_SECRET: undefined,
  BETTER_AUTH_URL: sms.appUrl,
  // Switched off by a test to see the shop without texts set up.
  get SMS_ACCOUNT_SID() {
    return sms.on ? sms.account.accountSid : undefined;
  },
  get SMS_AUTH_TOKEN() {
    return sms.on ? sms.account.authToken : undefined;
  },
  SMS_FROM: '+15005550006',
  SMS_API_BASE: sms.fake.base,
}));
vi.mock('@/lib/server/mail', () => ({ sendMail: vi.fn(async (m: { to: string; subject: string; text: string }) => void mail.sent.push(m)) }));
vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { customers, notices, paymentLinks, sentMail, tickets } = await import('@/db/schema');
const { and, asc, eq } = await import('drizzle-orm');
const prices = await import('@/services/counter/prices');
const notice = await import('@/services/notices');
const { POST } = await import('@/pages/api/sms/status');
const { makeShop, TEST_PRICES } = await import('./fixtures');

let a: Shop;
let b: Shop;
let bridge: Server;
let ticketNo = 9800;

/** Hands a request to the callback route as the built server would. */
async function callRoute(request: Request): Promise<Response> {
  return POST({ request, url: new URL(request.url) } as unknown as APIContext);
}

beforeAll(async () => {
  a = await makeShop('Textline Hems');
  b = await makeShop('Other Town Turn-ups');
  for (const s of [a, b])
    await prices.savePriceList(s.lead, { currency: 'EUR', hours: 'Tue–Sat 9:30–17:30', location: '', autoReadyNotice: false, items: [...TEST_PRICES] });
  // The app's address: the fake's status callbacks come here and go to the real route handler.
  bridge = createServer(async (req, res) => {
    const chunks: Buffer[] = [];
    for await (const c of req) chunks.push(c as Buffer);
    const headers = new Headers();
    for (const [k, v] of Object.entries(req.headers)) if (typeof v === 'string') headers.set(k, v);
    const answer = await callRoute(new Request(new URL(req.url ?? '/', sms.appUrl), { method: req.method, headers, body: Buffer.concat(chunks) }));
    res.writeHead(answer.status, { 'content-type': 'application/json' });
    res.end(await answer.text());
  });
  await new Promise<void>((r) => bridge.listen(sms.appPort, '127.0.0.1', () => r()));
});
afterAll(async () => {
  await new Promise((r) => bridge.close(r));
  await sms.fake.close();
  await handle.close();
});

async function readyTicket(shop: Shop, customer: { email?: string | null; phone?: string | null; contactBy: 'email' | 'text' | 'both' }) {
  ticketNo += 1;
  const [c] = await db
    .insert(customers)
    .values({ shopId: shop.shopId, name: 'Ysolde Marrow', email: customer.email ?? null, phone: customer.phone ?? null, contactBy: customer.contactBy })
    .returning();
  const [t] = await db.insert(tickets).values({ shopId: shop.shopId, number: ticketNo, customerId: c!.id, status: 'ready' }).returning();
  await prices.addLine(shop.counter, t!.id, { source: 'list', key: 'plain-hem' });
  return t!;
}

const rowsOf = (ticketId: string) => db.select().from(notices).where(eq(notices.ticketId, ticketId)).orderBy(asc(notices.channel));
const textsTo = (to: string) => sms.fake.messages.filter((m: { to: string }) => m.to === to);

async function until<T>(read: () => Promise<T>, ok: (v: T) => boolean): Promise<T> {
  for (let i = 0; i < 100; i += 1) {
    const v = await read();
    if (ok(v)) return v;
    await new Promise((r) => setTimeout(r, 50));
  }
  return read();
}

/** A status report signed as the service signs them (the SDK's own signing function). */
function signedReport(noticeId: string, fields: Record<string, string>, token = sms.account.authToken, signature?: string | null) {
  const url = `${sms.appUrl}/api/sms/status?notice=${noticeId}`;
  const headers: Record<string, string> = { 'content-type': 'application/x-www-form-urlencoded' };
  const sig = signature === undefined ? twilio.getExpectedTwilioSignature(token, url, fields) : signature;
  if (sig !== null) headers['x-twilio-signature'] = sig;
  return new Request(url, { method: 'POST', headers, body: new URLSearchParams(fields).toString() });
}

describe('the ready notice by the customer preference', () => {
  it('goes by text to a customer who prefers texts: read back from the SMS fake, recorded, and delivered by the signed callback', async () => {
    sms.on = true;
    mail.sent.length = 0;
    const t = await readyTicket(a, { email: 'ysolde@example.com', phone: '+44 7700 900123', contactBy: 'text' });
    const first = await notice.sendReadyNotice(a.counter, t.id);
    expect([first.channel, first.status, first.to]).toEqual(['sms', 'sent', '+44 7700 900123']);
    const [text] = textsTo('+447700900123');
    expect(text!.body).toContain(`ticket TH ${t.number} are ready to collect`);
    expect(text!.body).toContain('Due at pickup: €18.00');
    expect(first.providerId).toBe(text!.sid);
    expect(mail.sent).toEqual([]);
    const [recorded] = await db.select().from(sentMail).where(eq(sentMail.messageId, text!.sid));
    expect([recorded!.shopId, recorded!.channel, recorded!.kind, recorded!.body]).toEqual([a.shopId, 'sms', 'ready-notice', text!.body]);
    const [delivered] = await until(
      () => rowsOf(t.id),
      (rows) => rows[0]?.delivery === 'delivered',
    );
    expect([delivered!.delivery, delivered!.deliveryError]).toEqual(['delivered', null]);
    // The fake notes the app's answer once it arrives (after the row is written).
    await until(
      async () => text!.callbacks.length,
      (n) => n > 0,
    );
    expect(text!.callbacks).toEqual([{ status: 'delivered', answer: 200 }]);
  });

  it('goes both ways to a customer who wants both, one row per channel', async () => {
    sms.on = true;
    mail.sent.length = 0;
    const t = await readyTicket(a, { email: 'both@example.com', phone: '07700 900456', contactBy: 'both' });
    await notice.sendReadyNotice(a.counter, t.id);
    const rows = await rowsOf(t.id);
    expect(rows.map((r) => [r.channel, r.to, r.status, r.note])).toEqual([
      ['email', 'both@example.com', 'sent', null],
      ['sms', '07700 900456', 'sent', null],
    ]);
    expect(mail.sent.map((m) => m.to)).toEqual(['both@example.com']);
    expect(textsTo('07700900456')).toHaveLength(1);
  });

  it('records the failure the service reports for a number it cannot reach', async () => {
    sms.on = true;
    const t = await readyTicket(a, { phone: '+1 555 010 9999', contactBy: 'text' });
    await notice.sendReadyNotice(a.counter, t.id);
    const [row] = await until(
      () => rowsOf(t.id),
      (rows) => rows[0]?.delivery === 'failed',
    );
    expect([row!.status, row!.delivery, row!.deliveryError]).toEqual(['sent', 'failed', 'error 30003']);
  });

  it('goes by e-mail, saying why, when texts are not set up or there is no phone number', async () => {
    sms.on = false;
    mail.sent.length = 0;
    const off = await readyTicket(a, { email: 'off@example.com', phone: '07700 900789', contactBy: 'text' });
    const sent = await notice.sendReadyNotice(a.counter, off.id);
    expect([sent.channel, sent.to, sent.note]).toEqual(['email', 'off@example.com', 'Text messages are not set up for this shop: sent by e-mail instead.']);
    sms.on = true;
    const noPhone = await readyTicket(a, { email: 'nophone@example.com', contactBy: 'text' });
    const viaMail = await notice.sendReadyNotice(a.counter, noPhone.id);
    expect([viaMail.channel, viaMail.note]).toEqual(['email', 'Not sent by text: no phone number: sent by e-mail instead.']);
    expect(mail.sent.map((m) => m.to)).toEqual(['off@example.com', 'nophone@example.com']);
    const nobody = await readyTicket(a, { phone: '07700 900321', contactBy: 'text' });
    sms.on = false;
    await expect(notice.sendReadyNotice(a.counter, nobody.id)).rejects.toMatchObject({
      status: 422,
      message: 'Text messages are not set up for this shop, and the customer has no e-mail address: add one, or call them.',
    });
    expect(await rowsOf(nobody.id)).toEqual([]);
    sms.on = true;
  });

  it('sends again on every channel of the customer, numbered after the last', async () => {
    sms.on = true;
    const t = await readyTicket(a, { email: 'again@example.com', phone: '07700 900654', contactBy: 'both' });
    await notice.sendReadyNotice(a.counter, t.id);
    await notice.resendReadyNotice(a.counter, t.id);
    const rows = await db.select().from(notices).where(eq(notices.ticketId, t.id)).orderBy(asc(notices.sequence), asc(notices.channel));
    expect(rows.map((r) => [r.sequence, r.channel, r.status])).toEqual([
      [1, 'email', 'sent'],
      [1, 'sms', 'sent'],
      [2, 'email', 'sent'],
      [2, 'sms', 'sent'],
    ]);
  });
});

describe('the pay link by text or e-mail', () => {
  it('sends the open link by the channel chosen, and says why when it cannot', async () => {
    sms.on = true;
    mail.sent.length = 0;
    const t = await readyTicket(a, { email: 'payer@example.com', phone: '07700 900111', contactBy: 'email' });
    await expect(notice.sendPayLink(a.counter, t.id, 'sms')).rejects.toMatchObject({ status: 409 });
    const url = 'http://127.0.0.1:9/pay/cs_test_invented';
    await db
      .insert(paymentLinks)
      .values({ shopId: a.shopId, ticketId: t.id, sessionId: `cs_test_${t.id}`, url, amountMinor: 1800, currency: 'EUR', status: 'open' });
    const byText = await notice.sendPayLink(a.counter, t.id, 'sms');
    expect([byText.kind, byText.channel, byText.sequence, byText.status]).toEqual(['pay-link', 'sms', 1, 'sent']);
    expect(textsTo('07700900111').map((m: { body: string }) => m.body)).toEqual([`Textline Hems: pay €18.00 for ticket TH ${t.number} online: ${url}`]);
    const byMail = await notice.sendPayLink(a.counter, t.id, 'email');
    expect([byMail.channel, byMail.to]).toEqual(['email', 'payer@example.com']);
    expect(mail.sent[0]!.text).toContain(url);
    const again = await notice.sendPayLink(a.counter, t.id, 'sms');
    expect(again.sequence).toBe(2);
    sms.on = false;
    await expect(notice.sendPayLink(a.counter, t.id, 'sms')).rejects.toMatchObject({
      status: 422,
      message: 'Text messages are not set up for this shop: send the link by e-mail instead.',
    });
    sms.on = true;
    await expect(notice.sendPayLink(b.counter, t.id, 'sms')).rejects.toMatchObject({ status: 404 });
  });
});

describe('the status callback', () => {
  it('refuses a report that is unsigned, signed with another token, or altered after signing', async () => {
    sms.on = true;
    const t = await readyTicket(a, { phone: '07700 900222', contactBy: 'text' });
    const sent = await notice.sendReadyNotice(a.counter, t.id);
    await until(
      () => rowsOf(t.id),
      (rows) => rows[0]?.delivery === 'delivered',
    );
    const fields = { MessageSid: sent.providerId!, MessageStatus: 'failed', ErrorCode: '30005', AccountSid: sms.account.accountSid };
    expect((await callRoute(signedReport(sent.id, fields, sms.account.authToken, null))).status).toBe(403);
    expect((await callRoute(signedReport(sent.id, fields, 'another-accounts-token'))).status).toBe(403);
    expect((await callRoute(signedReport(sent.id, fields, sms.account.authToken, 'bm90IGEgc2lnbmF0dXJl'))).status).toBe(403);
    const altered = signedReport(sent.id, { ...fields, MessageStatus: 'delivered' });
    const tampered = new Request(altered.url, { method: 'POST', headers: altered.headers, body: new URLSearchParams(fields).toString() });
    expect((await callRoute(tampered)).status).toBe(403);
    const [row] = await rowsOf(t.id);
    expect(row!.delivery).toBe('delivered');
    // A good signature is recorded.
    const good = await callRoute(signedReport(sent.id, fields));
    expect([good.status, await good.json()]).toEqual([200, { received: true, recorded: true }]);
    const [after] = await rowsOf(t.id);
    expect([after!.delivery, after!.deliveryError]).toEqual(['failed', 'error 30005']);
  });

  it('never lands on another shop: a signed report naming shop B’s notice with shop A’s text changes neither', async () => {
    sms.on = true;
    const ta = await readyTicket(a, { phone: '07700 900333', contactBy: 'text' });
    const tb = await readyTicket(b, { phone: '07700 900444', contactBy: 'text' });
    const na = await notice.sendReadyNotice(a.counter, ta.id);
    const nb = await notice.sendReadyNotice(b.counter, tb.id);
    await until(
      () => rowsOf(tb.id),
      (rows) => rows[0]?.delivery === 'delivered',
    );
    await until(
      () => rowsOf(ta.id),
      (rows) => rows[0]?.delivery === 'delivered',
    );
    // Replayed with B's notice id in the address (and a valid signature over it).
    const replay = await callRoute(signedReport(nb.id, { MessageSid: na.providerId!, MessageStatus: 'undelivered', ErrorCode: '30006' }));
    expect([replay.status, await replay.json()]).toEqual([200, { received: true, recorded: false }]);
    const [rowB] = await db
      .select()
      .from(notices)
      .where(and(eq(notices.id, nb.id), eq(notices.shopId, b.shopId)));
    const [rowA] = await db.select().from(notices).where(eq(notices.id, na.id));
    expect([rowA!.delivery, rowB!.delivery]).toEqual(['delivered', 'delivered']);
    // Not a notice id at all: nothing recorded, no error.
    const junk = await callRoute(signedReport('not-an-id', { MessageSid: na.providerId!, MessageStatus: 'failed' }));
    expect([junk.status, await junk.json()]).toEqual([200, { received: true, recorded: false }]);
  });

  it('takes a report that comes before the send is written down, on that text notice only', async () => {
    const t = await readyTicket(a, { email: 'early@example.com', phone: '07700 900555', contactBy: 'both' });
    // As the rows stand between the service's answer and this server writing its id down.
    const [text] = await db
      .insert(notices)
      .values({ shopId: a.shopId, ticketId: t.id, kind: 'ready', channel: 'sms', to: '07700 900555', subject: 's', body: 'b', status: 'queued', attempts: 1 })
      .returning();
    const [email] = await db
      .insert(notices)
      .values({
        shopId: a.shopId,
        ticketId: t.id,
        kind: 'ready',
        channel: 'email',
        to: 'early@example.com',
        subject: 's',
        body: 'b',
        status: 'sent',
        attempts: 1,
      })
      .returning();
    const onEmail = await callRoute(signedReport(email!.id, { MessageSid: 'SMearly000', MessageStatus: 'delivered' }));
    expect(await onEmail.json()).toEqual({ received: true, recorded: false });
    const early = await callRoute(signedReport(text!.id, { MessageSid: 'SMearly000', MessageStatus: 'delivered' }));
    expect(await early.json()).toEqual({ received: true, recorded: true });
    const [row] = await db.select().from(notices).where(eq(notices.id, text!.id));
    expect([row!.providerId, row!.delivery]).toEqual(['SMearly000', 'delivered']);
    // Once written down, another text's report no longer fits it.
    const other = await callRoute(signedReport(text!.id, { MessageSid: 'SMother000', MessageStatus: 'failed' }));
    expect(await other.json()).toEqual({ received: true, recorded: false });
  });
});
