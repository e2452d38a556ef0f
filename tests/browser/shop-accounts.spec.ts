// A new shop from sign-up to its first tailor: the lead opens the shop, invites a tailor, the
// tailor opens the invitation from the captured mail and joins, then signs in again; an
// apprentice of the demo shop cannot reach the staff page.
import { mkdirSync } from 'node:fs';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO } from '../http/client';
import { launch, ready, tabletPage } from './browser';
import { submitSignIn } from './sign-in';

let browser: Browser;
const stamp = Date.now().toString(36);
const leadEmail = `lead-${stamp}@example.com`;
const tailorEmail = `tailor-${stamp}@example.com`;
let invitationLink = '';

beforeAll(async () => {
  browser = await launch();
  mkdirSync('test-results', { recursive: true });
});
afterAll(async () => {
  await browser?.close();
});

describe('a new shop and its first tailor', () => {
  it('the lead signs up, invites a tailor, and finds the invitation in the shop’s sent messages', async () => {
    const page = await tabletPage(browser);
    await page.goto('/sign-up');
    await ready(page);
    await page.getByLabel('Shop name').fill('Thimble Row Alterations');
    await page.getByLabel('Your name').fill('Wren Halloway');
    await page.getByLabel('E-mail').fill(leadEmail);
    await page.getByLabel('Password').fill('a-long-password');
    await page.getByRole('button', { name: 'Open the shop' }).click();
    await page.waitForURL('**/staff');
    await expect(page.getByRole('heading', { name: 'Staff of Thimble Row Alterations' }).isVisible()).resolves.toBe(true);
    await ready(page);

    await page.getByLabel('Their e-mail').fill(tailorEmail);
    await page.getByLabel('Role', { exact: true }).selectOption('tailor');
    await page.getByRole('button', { name: 'Send the invitation' }).click();
    await page.getByText(`Invitation sent to ${tailorEmail}.`).waitFor();
    await page.getByText(tailorEmail).first().waitFor();
    await page.screenshot({ path: 'test-results/staff.png', fullPage: true });

    await page.getByRole('link', { name: 'Sent messages' }).click();
    await page.waitForURL('**/sent-messages');
    const link = page.getByRole('link', { name: /\/invite\// }).first();
    invitationLink = (await link.getAttribute('href')) ?? '';
    expect(invitationLink).toMatch(/\/invite\/\w+$/);
    await expect(page.getByText(`To ${tailorEmail}`).isVisible()).resolves.toBe(true);
    await page.screenshot({ path: 'test-results/sent-messages.png', fullPage: true });
    await page.context().close();
  });

  it('the tailor opens the invitation, joins, signs out and signs in again', async () => {
    const page = await tabletPage(browser);
    await page.goto(invitationLink);
    await ready(page);
    await expect(page.getByRole('heading', { name: 'Join Thimble Row Alterations' }).isVisible()).resolves.toBe(true);
    await page.getByLabel('Your name').fill('Piet Marlowe');
    await page.getByLabel('Choose a password').fill('tailor-password-1');
    await page.getByRole('button', { name: 'Join the shop' }).click();
    await page.waitForURL('**/queue');
    await page.getByText('Piet Marlowe · Tailor · Thimble Row Alterations').waitFor();

    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL('**/sign-in');
    await ready(page);
    await submitSignIn(page, tailorEmail, 'tailor-password-1');
    await page.waitForURL('**/queue');
    await page.getByText('Piet Marlowe · Tailor · Thimble Row Alterations').waitFor();
    // A tailor has no staff link.
    expect(await page.getByRole('link', { name: 'Staff' }).count()).toBe(0);
    await page.context().close();
  });
});

describe('the staff page', () => {
  it('is out of reach for an apprentice, even by typing its address', async () => {
    const page = await tabletPage(browser);
    await page.goto('/staff');
    await page.waitForURL('**/sign-in?next=%2Fstaff');
    await ready(page);
    await submitSignIn(page, DEMO.apprentice);
    await page.waitForURL('**/staff');
    await expect(page.getByRole('heading', { name: 'Only the lead manages staff' }).isVisible()).resolves.toBe(true);
    expect(await page.getByRole('link', { name: 'Staff' }).count()).toBe(0);
    expect(await page.getByLabel('Their e-mail').count()).toBe(0);
    const response = await page.goto('/staff');
    expect(response?.status()).toBe(403);
    await page.context().close();
  });

  it('tells a wrong password plainly', async () => {
    const page = await tabletPage(browser);
    await page.goto('/sign-in');
    await ready(page);
    await submitSignIn(page, DEMO.counter, 'not-the-password');
    await page.getByText('That e-mail and password do not match.').waitFor();
    await page.screenshot({ path: 'test-results/sign-in.png' });
    expect(page.url()).toMatch(/\/sign-in$/);
    await page.context().close();
  });
});
