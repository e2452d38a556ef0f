// The counter's day with one ticket: the lead turns on automatic ready notices; the counter takes
// the ticket in, prices it from the fitting (a cuff whose taper needs a let-out), takes a deposit,
// prints the claim slip and makes a payment link; the apprentice moves the garment to ready; the
// ready e-mail with the balance, the hours and the link lands in the capture; the customer pays on
// the (local, fake) hosted page; the counter hands over a collected, paid ticket.
// Intake and the apprentice's moves go through the bench API (the intake and queue pages are not
// on main yet); everything at the counter is done on screen.
import { mkdirSync } from 'node:fs';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { call, DEMO, freshEmail, signIn } from '../http/client';
import { firstLink, waitForMail } from '../http/mail';
import { launch, ready, tabletPage } from './browser';
import { signInAs } from './sign-in';

let browser: Browser;
const customerEmail = freshEmail('perrin');
let ticketId = '';
let garmentId = '';
let payLink = '';

beforeAll(async () => {
  browser = await launch();
  mkdirSync('test-results', { recursive: true });
});
afterAll(async () => {
  const lead = await signIn(DEMO.lead);
  const list = await call('GET', '/api/prices', { cookie: lead });
  await call('PUT', '/api/prices', { cookie: lead, body: { ...list.body, autoReadyNotice: false } });
  await browser?.close();
});

describe('a ticket across the counter, from deposit to a paid pickup', () => {
  it('the lead has the ready notice sent by itself', async () => {
    const page = await tabletPage(browser);
    await signInAs(page, 'lead', '/prices');
    // Prices are typed and shown as money, held as cents (demo list: plain hem €16.50).
    await expect(page.getByLabel('Line 1: price (EUR)').inputValue()).resolves.toBe('16.50');
    await page.getByLabel('Send the ready notice by itself when every garment of a ticket is ready').check();
    await page.getByRole('button', { name: 'Save the price list' }).click();
    await page.getByText('Price list saved.').waitFor();
    await page.screenshot({ path: 'test-results/counter-prices.png', fullPage: true });
    await page.context().close();
  });

  it('the counter takes the ticket in with a deposit, prints the claim slip and makes a payment link', async () => {
    // Intake and the fitting through the API: a cuffed pair whose leg narrows 1 in over 10 in.
    const counter = await signIn(DEMO.counter);
    const tailor = await signIn(DEMO.tailor);
    const c = await call('POST', '/api/customers', { cookie: counter, body: { name: 'Perrin Loame', email: customerEmail } });
    const t = await call('POST', '/api/tickets', { cookie: counter, body: { customerId: c.body.id, garments: [{ description: 'Charcoal flannel' }] } });
    expect(t.status).toBe(201);
    ticketId = t.body.id;
    garmentId = (await call('GET', `/api/tickets/${ticketId}`, { cookie: counter })).body.garments[0].id;
    const leg = {
      finish: 'cuff',
      backPin: '31 1/4',
      cuffDepth: '1 1/2',
      available: '5',
      widthAtEdge: '8',
      widthAbove: '9',
      heightAbove: '10',
      seamAllowance: '1',
    };
    const fitted = await call('PUT', `/api/garments/${garmentId}/measurements`, { cookie: tailor, body: { unit: 'in', legs: { left: leg, right: leg } } });
    expect(fitted.status).toBe(200);

    const page = await tabletPage(browser);
    await signInAs(page, 'counter', `/counter/${ticketId}`);
    await page.getByRole('button', { name: 'Price from the garments' }).click();
    await page.getByText('Cuff from a plain hem — Charcoal flannel').waitFor();
    // The plan needs a let-out, so its line came by itself (demo list: €24.00 + €11.00).
    await page.getByText('Taper let-out at the cuff (per pair) — Charcoal flannel').waitFor();
    const price = page.getByRole('region', { name: 'Price' });
    await expect(price.getByRole('row', { name: /Total/ }).textContent()).resolves.toContain('€35.00');

    await page.getByLabel('Cash', { exact: true }).check();
    await page.getByLabel('Amount (EUR)', { exact: true }).fill('10.00');
    await page.getByRole('button', { name: 'Record the payment' }).click();
    await page.getByText(/Paid by cash:/).waitFor();
    await expect(page.getByTestId('balance-due').textContent()).resolves.toBe('€25.00');

    const slip = await page.request.get(`/api/tickets/${ticketId}/claim-slip`);
    expect(slip.status()).toBe(200);
    expect(slip.headers()['content-type']).toBe('application/pdf');
    expect((await slip.body()).subarray(0, 5).toString()).toBe('%PDF-');

    await page.getByRole('button', { name: 'Make a payment link for the balance' }).click();
    payLink = (await page.getByTestId('pay-link').getAttribute('href')) ?? '';
    expect(payLink).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/pay\/cs_test_/);
    await page.screenshot({ path: 'test-results/counter-intake.png', fullPage: true });
    await page.context().close();
  });

  it('the apprentice marks the garment ready and the ready e-mail goes out by itself', async () => {
    const apprentice = await signIn(DEMO.apprentice);
    for (const to of ['marked', 'cut', 'stitched', 'pressed', 'ready']) {
      const moved = await call('POST', `/api/garments/${garmentId}/step`, { cookie: apprentice, body: { to } });
      expect(moved.status, JSON.stringify(moved.body)).toBe(200);
    }
    const mail = await waitForMail(customerEmail, 15_000);
    expect(mail.subject).toMatch(/^Ready to collect: ticket PH \d+$/);
    expect(mail.text).toContain('Balance due at pickup: €25.00.');
    expect(mail.text).toContain('Opening hours: Tue–Fri 9:00–18:00, Sat 9:00–13:00');
    expect(firstLink(mail)).toBe(payLink);
  });

  it('the customer pays through the link in the e-mail', async () => {
    const page = await tabletPage(browser);
    await page.goto(payLink);
    await page.getByText('€25.00').first().waitFor();
    await page.screenshot({ path: 'test-results/counter-pay-page.png', fullPage: true });
    await page.getByRole('button', { name: 'Pay €25.00' }).click();
    await page.waitForURL(/\/paid\?session_id=cs_/);
    await page.getByRole('heading', { name: /Thank you/ }).waitFor();
    // Only what the payment session proves: the ticket number and the amount.
    await expect(page.getByTestId('paid-session').textContent()).resolves.toMatch(/^\s*Ticket\s+PH \d+\s+Paid\s+€25\.00\s*$/);
    await page.context().close();
  });

  it('the counter hands over a collected, paid ticket', async () => {
    const page = await tabletPage(browser);
    await signInAs(page, 'counter', `/counter/${ticketId}`);
    await expect(page.getByTestId('balance-due').textContent()).resolves.toBe('€0.00');
    await page.getByText('Paid in full.').waitFor();
    await page.getByText(/Paid by online:/).waitFor();
    await page.getByText(/Ready notice by e-mail to .*: Sent/).waitFor();
    await page.getByText('sent by the shop setting', { exact: false }).waitFor();
    await page.getByRole('button', { name: 'Hand over and close the ticket' }).click();
    await page.getByText('Collected: the ticket is closed with its payment on record.').waitFor();
    await expect(page.getByTestId('ticket-status').textContent()).resolves.toBe('Collected');
    await page.screenshot({ path: 'test-results/counter-collected.png', fullPage: true });
    // The same panel sits under the ticket on the ticket page.
    await page.goto(`/tickets/${ticketId}`);
    await ready(page);
    await page.getByRole('region', { name: 'Counter' }).getByText('Collected: the ticket is closed with its payment on record.').waitFor();
    await page.screenshot({ path: 'test-results/counter-ticket-page.png', fullPage: true });
    const summary = await call('GET', `/api/tickets/${ticketId}/payments`, { cookie: await signIn(DEMO.counter) });
    expect(summary.body.payments.map((p: { purpose: string; method: string; amountMinor: number }) => [p.purpose, p.method, p.amountMinor])).toEqual([
      ['deposit', 'cash', 1000],
      ['balance', 'online', 2500],
    ]);
    await page.context().close();
  });
});
