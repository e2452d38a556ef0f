// Issue 14, a ready notice by text: the counter changes the customer's details to "Text message"
// on the ticket, sends the ready notice from the counter screen, and the text is read back from
// the local SMS fake (scripts/sms-fake.mjs); the fake's signed delivery report shows on the notice.
// Then the pay link: shown as Copy link / Send buttons (never the service's raw address), and sent
// by text, read back from the fake with the link in it.
import { mkdirSync } from 'node:fs';
import { randomInt } from 'node:crypto';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { call, DEMO, freshEmail, signIn } from '../http/client';
import { launch, tabletPage } from './browser';
import { signInAs } from './sign-in';

let browser: Browser;

beforeAll(async () => {
  browser = await launch();
  mkdirSync('test-results', { recursive: true });
});
afterAll(async () => {
  await browser?.close();
});

async function textsTo(phoneDigits: string): Promise<{ to: string; body: string }[]> {
  const all = (await (await fetch(`${inject('smsBase')}/messages`)).json()) as { to: string; body: string }[];
  return all.filter((m) => m.to.replace(/\D/g, '') === phoneDigits);
}

async function waitForTexts(phoneDigits: string, count: number) {
  for (let i = 0; i < 50; i += 1) {
    const texts = await textsTo(phoneDigits);
    if (texts.length >= count) return texts;
    await new Promise((r) => setTimeout(r, 200));
  }
  return textsTo(phoneDigits);
}

describe('a ready notice by text message', () => {
  it('goes by text once the customer prefers texts, and is read back from the SMS fake with its delivery report', async () => {
    const phone = `+44 7700 ${randomInt(100000, 999998)}`;
    const phoneDigits = phone.replace(/\D/g, '');
    const counter = await signIn(DEMO.counter);
    const c = await call('POST', '/api/customers', { cookie: counter, body: { name: 'Tamsin Orrell', phone, email: freshEmail('tamsin') } });
    expect(c.status).toBe(201);
    const t = await call('POST', '/api/tickets', { cookie: counter, body: { customerId: c.body.id, garments: [{ description: 'Olive cord trousers' }] } });
    const ticketId = t.body.id as string;
    const line = await call('POST', `/api/tickets/${ticketId}/price-lines`, { cookie: counter, body: { source: 'list', key: 'plain-hem' } });
    expect(line.status).toBe(201);
    const lead = await signIn(DEMO.lead);
    for (const status of ['marked', 'cut', 'stitched', 'pressed', 'ready'])
      expect((await call('PATCH', `/api/tickets/${ticketId}`, { cookie: lead, body: { status } })).status).toBe(200);

    const page = await tabletPage(browser);
    await signInAs(page, 'counter', `/tickets/${ticketId}`);
    await page.getByRole('button', { name: 'Change the customer’s details' }).click();
    await page.getByLabel('Text message', { exact: true }).check();
    await page.getByRole('button', { name: 'Save customer' }).click();
    await page.getByText('· notices by text message').waitFor();

    await page.goto(`/counter/${ticketId}`);
    await page.getByTestId('contact-preference').getByText('The customer wants notices by text message.').waitFor();
    await page.getByRole('button', { name: 'Send the ready notice' }).click();
    const row = page.getByTestId('notice-row');
    await row.getByText(`Ready notice by text to ${phone}: Sent`).waitFor();
    const [text] = await waitForTexts(phoneDigits, 1);
    expect(text!.body).toMatch(/^Pinmark[^:]*: your trousers on ticket PH \d+ are ready to collect\.\nDue at pickup: €16\.50\./);
    // The delivery report arrives by the signed callback; the list refreshes on the next look.
    for (let i = 0; i < 20 && !(await row.getByTestId('notice-delivery').count()); i += 1) {
      await new Promise((r) => setTimeout(r, 300));
      await page.reload();
    }
    await expect(row.getByTestId('notice-delivery').textContent()).resolves.toMatch(/^The SMS service reports: delivered to the phone, /);

    // The pay link: buttons, not the raw address with the service's session id.
    await page.getByRole('button', { name: 'Make a payment link for the balance' }).click();
    await page.getByRole('button', { name: 'Copy link' }).waitFor();
    const payUrl = (await page.getByTestId('pay-link').getAttribute('href')) ?? '';
    expect(payUrl).toMatch(/\/pay\/cs_test_/);
    const sessionId = payUrl.split('/').pop()!;
    await expect(page.getByRole('region', { name: 'Payments' }).textContent()).resolves.not.toContain(sessionId);
    await page.getByRole('button', { name: 'Send by text' }).click();
    await page.getByText(`Pay link sent by text to ${phone}.`).waitFor();
    await page.getByTestId('notice-row').getByText(`Pay link by text to ${phone}: Sent`).waitFor();
    const texts = await waitForTexts(phoneDigits, 2);
    expect(texts[1]!.body).toMatch(new RegExp(`: pay €16\\.50 for ticket PH \\d+ online: ${payUrl.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}$`));
    await page.screenshot({ path: 'test-results/sms-notice.png', fullPage: true });
    await page.context().close();
  });
});
