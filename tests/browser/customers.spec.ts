// Customers on screen: a returning customer found by phone at intake, last time's fitting copied
// into the new garment in one tap; the customers screen's search, edit with history, and the
// lead's erasure. Every control is reached by its label, and the search by keyboard.
import { mkdirSync } from 'node:fs';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { call, DEMO, signIn } from '../http/client';
import { launch, ready, tabletPage } from './browser';
import { layoutProblems, settled } from './layout-checks';
import { signInAs } from './sign-in';

let browser: Browser;
let customerId = '';
let lastTicket = 0;
// Invented customer; lengths in the range of common practice (no source).
const NAME = 'Thessaly Brookmere';
const PHONE = '555 013 9902';
// The tailor's own preset, recorded on the fitting by its id (issue 15).
const PRESET = `Deep cuff ${Date.now().toString(36)}`;
const LEG = { finish: 'cuff', presetId: '', backPin: '31 1/8', cuffDepth: '1 5/8', available: '5' };

beforeAll(async () => {
  browser = await launch();
  mkdirSync('test-results', { recursive: true });
  const counter = await signIn(DEMO.counter);
  const tailor = await signIn(DEMO.tailor);
  const c = await call('POST', '/api/customers', { cookie: counter, body: { name: NAME, phone: PHONE, email: '' } });
  expect(c.status).toBe(201);
  customerId = c.body.id;
  const t = await call('POST', '/api/tickets', { cookie: counter, body: { customerId, garments: [{ description: 'Moss green cords' }] } });
  lastTicket = t.body.number;
  const garmentId = (await call('GET', `/api/tickets/${t.body.id}`, { cookie: counter })).body.garments[0].id;
  const preset = await call('POST', '/api/presets', { cookie: tailor, body: { name: PRESET, settings: { finish: 'cuff', unit: 'in', cuffDepth: '1 5/8' } } });
  expect(preset.status).toBe(201);
  LEG.presetId = preset.body.id;
  const fitted = await call('PUT', `/api/garments/${garmentId}/measurements`, { cookie: tailor, body: { unit: 'in', legs: { left: LEG, right: LEG } } });
  expect(fitted.status).toBe(200);
});
afterAll(async () => {
  await browser?.close();
});

describe('customers', () => {
  it('at intake the counter finds a returning customer by phone and copies last time’s fitting', async () => {
    const page = await tabletPage(browser);
    await signInAs(page, 'counter', '/tickets/new');
    const find = page.getByLabel('Find the customer');
    // Typed as the customer says it, with dashes: the phone is matched on its digits.
    await find.fill('013-9902');
    const option = page.getByRole('option', { name: new RegExp(NAME) });
    await option.waitFor();
    await expect(option.textContent()).resolves.toContain(`last PH ${lastTicket}`);
    await find.press('Enter');
    await expect(page.getByTestId('chosen-customer').textContent()).resolves.toContain(NAME);

    const offer = page.getByRole('group', { name: 'Same as last time: garment 1' });
    const copy = offer.getByRole('button', { name: /Moss green cords/ });
    await copy.waitFor();
    await expect(copy.textContent()).resolves.toContain(`finished length 31 1/8 in, cuff 1 5/8 in, preset ${PRESET}`);
    await copy.click();
    await expect(copy.getAttribute('aria-pressed')).resolves.toBe('true');
    await page.getByLabel('Garment 1', { exact: true }).fill('Moss green cords, second pair');
    await settled(page);
    expect(await layoutProblems(page)).toEqual([]);
    await page.screenshot({ path: 'test-results/customers-intake.png', fullPage: true });
    await page.getByRole('button', { name: 'Open ticket' }).click();
    await page.waitForURL(/\/tickets\/[0-9a-f-]{36}$/);

    const ticketId = page.url().split('/').pop()!;
    const tailor = await signIn(DEMO.tailor);
    const ticket = await call('GET', `/api/tickets/${ticketId}`, { cookie: tailor });
    expect(ticket.body.customer.id).toBe(customerId);
    const fitting = await call('GET', `/api/garments/${ticket.body.garments[0].id}/measurements`, { cookie: tailor });
    expect(
      fitting.body.legs.map((l: { leg: string; preset: string; values: Record<string, { text: string }> }) => [
        l.leg,
        l.preset,
        l.values.backPin?.text,
        l.values.cuffDepth?.text,
      ]),
    ).toEqual([
      ['left', PRESET, '31 1/8', '1 5/8'],
      ['right', PRESET, '31 1/8', '1 5/8'],
    ]);
    await page.context().close();
  });

  it('on the customers screen the counter finds the customer as they type and edits the details, with history', async () => {
    const page = await tabletPage(browser);
    await signInAs(page, 'counter', '/customers');
    await page.getByLabel('Name, phone, e-mail or ticket number').fill('brookm');
    const found = page.getByRole('list', { name: 'Customers found' });
    await found.getByRole('button', { name: new RegExp(NAME) }).click();
    await page.getByRole('heading', { name: NAME, level: 2 }).waitFor();
    // Both tickets, the newest first.
    await page.getByRole('link', { name: `PH ${lastTicket}` }).waitFor();
    await page.getByRole('button', { name: 'Edit details' }).click();
    const form = page.getByRole('form', { name: 'Edit the customer' });
    await form.getByLabel('Phone').fill('555 013 4417');
    await form.getByRole('textbox', { name: 'E-mail' }).fill('');
    await form.getByRole('button', { name: 'Save customer' }).click();
    await page.getByText(`phone: ${PHONE} → 555 013 4417`).waitFor();
    await settled(page);
    expect(await layoutProblems(page)).toEqual([]);
    await page.screenshot({ path: 'test-results/customers-screen.png', fullPage: true });
    // The counter may not erase.
    expect(await page.getByRole('button', { name: /Erase personal details/ }).count()).toBe(0);
    // The new number finds them; the old one does not.
    await page.getByLabel('Name, phone, e-mail or ticket number').fill('4417');
    await found.getByRole('button', { name: new RegExp(NAME) }).waitFor();
    await page.context().close();
  });

  it('the lead erases the customer on their request: the name reads "erased", the tickets stay', async () => {
    const page = await tabletPage(browser);
    await signInAs(page, 'lead', '/customers');
    await page.goto(`/customers?c=${customerId}`);
    await ready(page);
    await page.getByRole('heading', { name: NAME, level: 2 }).waitFor();
    await page.getByRole('button', { name: 'Erase personal details…' }).click();
    await page.getByRole('button', { name: `Yes, erase ${NAME}` }).click();
    await page.getByRole('heading', { name: 'erased', level: 2 }).waitFor();
    await page.getByRole('link', { name: `PH ${lastTicket}` }).waitFor();
    expect(await page.getByText(PHONE).count()).toBe(0);
    await page.getByText(/Erased on the customer’s request/).waitFor();
    await page.context().close();
  });
});
