// Issue 14, text messages over HTTP against the built server and the local SMS fake: a customer
// who prefers texts gets the ready notice by SMS (read back from the fake), the fake's signed
// status callback marks it delivered, and the shop's sent messages list the text. The callback
// route refuses an unsigned or wrongly signed report (403) and records nothing for a signed report
// naming a notice whose text it is not (another shop's notice id, replayed).
import { randomInt } from 'node:crypto';
import twilio from 'twilio';
import { inject } from 'vitest';
import { describe, expect, it } from 'vitest';
import { call, DEMO, freshEmail, newShop, signIn } from './client';

interface FakeText {
  sid: string;
  to: string;
  body: string;
  status: string;
}

/** A number no other test uses (the fake is shared by the run). */
const freshPhone = () => `+44 7700 ${String(randomInt(100000, 999998)).padStart(6, '0')}`;
const digits = (p: string) => `+${p.replace(/\D/g, '')}`;

async function textsTo(phone: string): Promise<FakeText[]> {
  const all = (await (await fetch(`${inject('smsBase')}/messages`)).json()) as FakeText[];
  return all.filter((m) => m.to === digits(phone));
}

async function until<T>(read: () => Promise<T>, ok: (v: T) => boolean, ms = 10_000): Promise<T> {
  const end = Date.now() + ms;
  for (;;) {
    const v = await read();
    if (ok(v) || Date.now() > end) return v;
    await new Promise((r) => setTimeout(r, 200));
  }
}

async function readyTicketFor(cookie: string, customer: Record<string, unknown>): Promise<string> {
  const c = await call('POST', '/api/customers', { cookie, body: customer });
  expect(c.status, JSON.stringify(c.body)).toBe(201);
  const t = await call('POST', '/api/tickets', { cookie, body: { customerId: c.body.id, garments: [{ description: 'Slate twill trousers' }] } });
  expect(t.status).toBe(201);
  for (const status of ['marked', 'cut', 'stitched', 'pressed', 'ready']) {
    const moved = await call('PATCH', `/api/tickets/${t.body.id}`, { cookie, body: { status } });
    expect(moved.status).toBe(200);
  }
  return t.body.id;
}

/** POSTs a status report to the app, signed with `token` over the app's public address (as the service signs). */
async function report(noticeId: string, fields: Record<string, string>, token: string | null, signature?: string) {
  const path = `/api/sms/status?notice=${noticeId}`;
  const headers: Record<string, string> = { 'content-type': 'application/x-www-form-urlencoded' };
  if (token) headers['x-twilio-signature'] = signature ?? twilio.getExpectedTwilioSignature(token, inject('baseURL') + path, fields);
  const res = await fetch(inject('baseURL') + path, { method: 'POST', headers, body: new URLSearchParams(fields).toString() });
  return { status: res.status, body: await res.json() };
}

describe('the ready notice by text', () => {
  it('goes to a customer who prefers texts, is read back from the SMS fake, marked delivered and listed as sent', async () => {
    const lead = await signIn(DEMO.lead);
    const phone = freshPhone();
    const id = await readyTicketFor(lead, { name: 'Corin Hatherley', phone, contactBy: 'text' });
    const sent = await call('POST', `/api/tickets/${id}/notices`, { cookie: lead, body: { kind: 'ready' } });
    expect(sent.status, JSON.stringify(sent.body)).toBe(201);
    expect([sent.body.channel, sent.body.to, sent.body.status]).toEqual(['sms', phone, 'sent']);
    const [text] = await textsTo(phone);
    expect(text!.body).toMatch(/: your trousers on ticket PH \d+ are ready to collect\./);
    expect(sent.body.providerId).toBe(text!.sid);
    const listed = await until(
      async () => (await call('GET', `/api/tickets/${id}/notices`, { cookie: lead })).body as { delivery: string | null }[],
      (rows) => rows[0]?.delivery === 'delivered',
    );
    expect(listed.map((n) => n.delivery)).toEqual(['delivered']);
    const messages = (await call('GET', '/api/sent-messages', { cookie: lead })).body as { channel: string; to: string; text: string }[];
    expect(messages.find((m) => m.channel === 'sms' && m.to === phone)?.text).toBe(text!.body);
  });

  it('is refused for a customer set to texts without a phone number (422)', async () => {
    const lead = await signIn(DEMO.lead);
    const made = await call('POST', '/api/customers', { cookie: lead, body: { name: 'Ilse Parfitt', email: freshEmail('ilse'), contactBy: 'text' } });
    expect([made.status, made.body.issues?.contactBy]).toEqual([422, 'A text message needs a phone number: add one, or choose e-mail.']);
    const ok = await call('POST', '/api/customers', { cookie: lead, body: { name: 'Ilse Parfitt', email: freshEmail('ilse') } });
    const patched = await call('PATCH', `/api/customers/${ok.body.id}`, { cookie: lead, body: { contactBy: 'both' } });
    expect(patched.status).toBe(422);
  });
});

describe('POST /api/sms/status', () => {
  it('refuses unsigned and wrongly signed reports with 403, and records nothing for a report naming another shop’s notice', async () => {
    const token = inject('smsEnv').SMS_AUTH_TOKEN;
    const lead = await signIn(DEMO.lead);
    const phone = freshPhone();
    const id = await readyTicketFor(lead, { name: 'Maud Lintott', phone, contactBy: 'text' });
    const mine = (await call('POST', `/api/tickets/${id}/notices`, { cookie: lead, body: { kind: 'ready' } })).body;
    await until(
      async () => (await call('GET', `/api/tickets/${id}/notices`, { cookie: lead })).body[0].delivery,
      (d) => d === 'delivered',
    );

    const fields = { MessageSid: mine.providerId, MessageStatus: 'failed', ErrorCode: '30008' };
    expect((await report(mine.id, fields, null)).status).toBe(403);
    expect((await report(mine.id, fields, 'not-the-accounts-token')).status).toBe(403);
    expect((await report(mine.id, fields, token, 'AAAA')).status).toBe(403);

    // Another shop's notice, replayed with this shop's text id (validly signed over its address).
    const other = await newShop('Replay Turn-ups');
    const otherPhone = freshPhone();
    const otherTicket = await readyTicketFor(other.cookie, { name: 'Osric Pell', phone: otherPhone, contactBy: 'text' });
    const theirs = (await call('POST', `/api/tickets/${otherTicket}/notices`, { cookie: other.cookie, body: { kind: 'ready' } })).body;
    await until(
      async () => (await call('GET', `/api/tickets/${otherTicket}/notices`, { cookie: other.cookie })).body[0].delivery,
      (d) => d === 'delivered',
    );
    const replay = await report(theirs.id, fields, token);
    expect(replay).toEqual({ status: 200, body: { received: true, recorded: false } });
    expect((await call('GET', `/api/tickets/${otherTicket}/notices`, { cookie: other.cookie })).body[0].delivery).toBe('delivered');
    expect((await call('GET', `/api/tickets/${id}/notices`, { cookie: lead })).body[0].delivery).toBe('delivered');

    // The genuine report is recorded on its own notice.
    expect(await report(mine.id, fields, token)).toEqual({ status: 200, body: { received: true, recorded: true } });
    const after = (await call('GET', `/api/tickets/${id}/notices`, { cookie: lead })).body[0];
    expect([after.delivery, after.deliveryError]).toEqual(['failed', 'error 30008']);
  });
});
