// Issue 14's counter story, on screen and by keyboard: a wrong line voided with its reason (kept,
// struck through), the balance split over a cash and a card payment, the rest paid online through
// the local payment fake, a reduction afterwards that leaves money owed to the customer, and that
// credit refunded to the card through the fake (pending until its signed webhook says done); then
// the hand-over with nothing due and nothing owed.
import { mkdirSync } from 'node:fs';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { call, DEMO, signIn } from '../http/client';
import { launch, tabletPage } from './browser';
import { signInAs } from './sign-in';

let browser: Browser;
let page: Page;
let ticketId = '';

beforeAll(async () => {
  browser = await launch();
  mkdirSync('test-results', { recursive: true });
  const counter = await signIn(DEMO.counter);
  const c = await call('POST', '/api/customers', { cookie: counter, body: { name: 'Ottilie Varga' } });
  const t = await call('POST', '/api/tickets', { cookie: counter, body: { customerId: c.body.id, garments: [{ description: 'Olive moleskin' }] } });
  expect(t.status).toBe(201);
  ticketId = t.body.id;
  page = await tabletPage(browser);
  await signInAs(page, 'counter', `/counter/${ticketId}`);
});
afterAll(async () => {
  await page?.context().close();
  await browser?.close();
});

const price = () => page.getByRole('region', { name: 'Price' });
const totalText = () => price().getByRole('row', { name: /Total/ }).textContent();

describe('money that adds up at the counter', () => {
  it('voids a wrong line with its reason, by keyboard; it stays on the ticket, struck through', async () => {
    await page.getByLabel('Line from the price list').selectOption('plain-hem');
    await page.getByRole('button', { name: 'Add the line' }).click();
    await page.getByTestId('price-line').first().waitFor();
    await page.getByLabel('Line from the price list').selectOption('cuff-remake');
    await page.getByRole('button', { name: 'Add the line' }).click();
    await page.getByTestId('price-line').nth(1).waitFor();
    const wrong = page.getByRole('button', { name: /^Void Cuff let down/ });
    await wrong.focus();
    await page.keyboard.press('Enter');
    const reason = page.getByLabel(/Why is .* wrong\?/);
    await expect.poll(() => reason.evaluate((el) => el === document.activeElement), { timeout: 15_000 }).toBe(true);
    await page.keyboard.type('No old cuff on these: a plain hem only');
    await page.keyboard.press('Enter');
    const voided = page.getByTestId('voided-line');
    await voided.waitFor();
    await expect(voided.textContent()).resolves.toContain('No old cuff on these: a plain hem only');
    await expect(voided.locator('.line-through').count()).resolves.toBe(1);
    // Demo list: plain hem €16.50; the voided line is not in the total.
    await expect(totalText()).resolves.toContain('€16.50');
  });

  it('splits the balance over cash and card; each payment is listed with who took it', async () => {
    await page.getByLabel('Cash', { exact: true }).check();
    await page.getByLabel('Amount (EUR)', { exact: true }).fill('5.00');
    await page.getByRole('button', { name: 'Record the payment' }).click();
    await page.getByTestId('balance-due').filter({ hasText: '€11.50' }).waitFor();
    await page.getByLabel('Card (at the counter)').check();
    await page.getByLabel('Amount (EUR)', { exact: true }).fill('4.00');
    await page.getByRole('button', { name: 'Record the payment' }).click();
    await page.getByTestId('balance-due').filter({ hasText: '€7.50' }).waitFor();
    const rows = page.getByTestId('payment-row');
    await rows.nth(1).waitFor();
    await expect(rows.allTextContents()).resolves.toEqual([
      expect.stringMatching(/Paid by cash: €5\.00 .*taken by /),
      expect.stringMatching(/Paid by card at the counter: €4\.00 .*taken by /),
    ]);
  });

  it('takes the rest online, then a reduction leaves a credit owed, refunded to the card through the payment service', async () => {
    await page.getByRole('button', { name: 'Make a payment link for the balance' }).click();
    const link = (await page.getByTestId('pay-link').getAttribute('href')) ?? '';
    const customer = await tabletPage(browser);
    await customer.goto(link);
    await customer.getByRole('button', { name: 'Pay €7.50' }).click();
    await customer.waitForURL(/\/paid\?session_id=cs_/);
    await customer.context().close();
    await page.reload();
    await page.getByTestId('balance-due').filter({ hasText: '€0.00' }).waitFor();

    await page.getByLabel('Adjustment').fill('Hem turned shorter than asked');
    await page.getByLabel('Amount (EUR, minus to take off)').fill('-3.00');
    await page.getByLabel('Reason').fill('Customer agreed to a discount');
    await page.getByRole('button', { name: 'Add the adjustment' }).click();
    await page.getByTestId('credit-owed').filter({ hasText: '€3.00' }).waitFor();
    await page.getByText('The customer has paid €3.00 more than the total: settle it below.').waitFor();
    await page.screenshot({ path: 'test-results/counter-money-credit.png', fullPage: true });

    const settle = page.getByRole('form', { name: 'Settle the credit' });
    await settle.getByLabel('Refund the online payment').check();
    await expect(settle.getByLabel('Amount (EUR)').inputValue()).resolves.toBe('3.00');
    await settle.getByRole('button', { name: 'Record how it was settled' }).click();
    await page.getByTestId('credit-owed').filter({ hasText: '€0.00' }).waitFor();
    // Pending until the service's signed webhook confirms it.
    await expect
      .poll(
        async () => {
          await page.reload();
          return page.getByTestId('refund-row').first().textContent();
        },
        { timeout: 30_000, interval: 500 },
      )
      .toMatch(/Online refund: €3\.00 \(done/);
    await page.screenshot({ path: 'test-results/counter-money-refunded.png', fullPage: true });
  });

  it('hands the ticket over with nothing due and nothing owed', async () => {
    const apprentice = await signIn(DEMO.apprentice);
    const garment = (await call('GET', `/api/tickets/${ticketId}`, { cookie: apprentice })).body.garments[0].id;
    for (const to of ['marked', 'cut', 'stitched', 'pressed', 'ready']) {
      expect((await call('POST', `/api/garments/${garment}/step`, { cookie: apprentice, body: { to } })).status).toBe(200);
    }
    await page.reload();
    await page.getByRole('button', { name: 'Hand over and close the ticket' }).click();
    await page.getByText('Collected: the ticket is closed with its payment on record.').waitFor();
    const summary = (await call('GET', `/api/tickets/${ticketId}/payments`, { cookie: await signIn(DEMO.counter) })).body;
    expect([summary.total, summary.paid, summary.refunded, summary.due, summary.credit]).toEqual([1350, 1650, 300, 0, 0]);
  });
});
