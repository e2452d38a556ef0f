// Issue 14, receipts over HTTP against the built server: GET .../payments/[paymentId]/receipt is a
// PDF (application/pdf) whose text names the payment; signed out 401, the apprentice 403, another
// shop 404; POST e-mails it with the PDF attached (recorded as the shop's sent mail, kind receipt),
// and is refused with a message when the customer has no address.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, inject, it } from 'vitest';
import { call, DEMO, freshEmail, newShop, signIn } from './client';
import { waitForMail } from './mail';

let counter = '';
let lead = '';

/** A demo-shop ticket priced from the list (cuff), with one cash payment of 10.00; returns its paths. */
async function paidTicket(email: string | null) {
  const c = await call('POST', '/api/customers', { cookie: counter, body: email ? { name: 'Ivo Gusset', email } : { name: 'Ivo Gusset' } });
  expect(c.status).toBe(201);
  const t = await call('POST', '/api/tickets', { cookie: counter, body: { customerId: c.body.id, garments: [{ description: 'Grey worsted' }] } });
  expect((await call('POST', `/api/tickets/${t.body.id}/price-lines`, { cookie: counter, body: { source: 'list', key: 'cuff-from-hem' } })).status).toBe(201);
  const paid = await call('POST', `/api/tickets/${t.body.id}/payments`, { cookie: counter, body: { method: 'cash', amountMinor: 1000 } });
  expect(paid.status).toBe(201);
  return { number: t.body.number as number, path: `/api/tickets/${t.body.id}/payments/${paid.body.payments[0].id}/receipt` };
}

async function pdfText(path: string, cookie: string): Promise<{ status: number; type: string | null; text: string }> {
  const res = await fetch(inject('baseURL') + path, { headers: { cookie } });
  const bytes = new Uint8Array(await res.arrayBuffer());
  if (res.status !== 200) return { status: res.status, type: res.headers.get('content-type'), text: '' };
  const file = join(mkdtempSync(join(tmpdir(), 'receipt-http-')), 'r.pdf');
  writeFileSync(file, bytes);
  return { status: 200, type: res.headers.get('content-type'), text: spawnSync('pdftotext', [file, '-'], { encoding: 'utf8' }).stdout.replace(/\s+/g, ' ') };
}

beforeAll(async () => {
  counter = await signIn(DEMO.counter);
  lead = await signIn(DEMO.lead);
});

describe('GET a payment receipt', () => {
  it('is a PDF naming the shop, the ticket and the payment, for the counter and the lead', async () => {
    const { number, path } = await paidTicket(null);
    for (const cookie of [counter, lead]) {
      const r = await pdfText(path, cookie);
      expect([r.status, r.type]).toEqual([200, 'application/pdf']);
      expect(r.text).toContain('Pinmark & Hem');
      expect(r.text).toContain(`Ticket PH ${number}`);
      expect(r.text).toContain('Received with thanks €10.00 By cash');
    }
  });

  it('is 401 signed out, 403 for the apprentice and 404 for another shop (and a wrong payment id)', async () => {
    const { path } = await paidTicket(null);
    expect((await call('GET', path)).status).toBe(401);
    expect((await call('GET', path, { cookie: await signIn(DEMO.apprentice) })).status).toBe(403);
    const other = await newShop('Receipt Stranger Shop');
    const theirs = await call('GET', path, { cookie: other.cookie });
    expect(theirs.status).toBe(404);
    expect(JSON.stringify(theirs.body)).not.toContain('Ivo Gusset');
    expect(
      (await call('GET', path.replace(/payments\/[^/]+\/receipt$/, 'payments/00000000-0000-4000-8000-000000000000/receipt'), { cookie: counter })).status,
    ).toBe(404);
  });
});

describe('POST (e-mail) a payment receipt', () => {
  it("sends it with the PDF attached, listed in the shop's sent messages as a receipt", async () => {
    const email = freshEmail('receipt');
    const { number, path } = await paidTicket(email);
    const r = await call('POST', path, { cookie: counter });
    expect([r.status, r.body]).toEqual([200, { to: email }]);
    const mail = await waitForMail(email);
    expect(mail.subject).toBe(`Receipt for ticket PH ${number}: €10.00`);
    expect(mail.attachments).toEqual([expect.objectContaining({ filename: `receipt-${number}.pdf`, contentType: 'application/pdf' })]);
    const sent = await call('GET', '/api/sent-messages', { cookie: lead });
    expect(sent.body.find((m: { to: string }) => m.to === email)).toMatchObject({ kind: 'receipt' });
  });

  it('is refused with a clear message when the customer has no e-mail address, and for another shop', async () => {
    const { path } = await paidTicket(null);
    const r = await call('POST', path, { cookie: counter });
    expect(r.status).toBe(422);
    expect(r.body.error).toMatch(/no e-mail address/);
    expect((await call('POST', path, { cookie: (await newShop('Receipt Mailer Stranger')).cookie })).status).toBe(404);
  });
});
