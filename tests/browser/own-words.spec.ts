// Issue 15, "Our own look and words": the queue and counter read as a tailor's shop (ticket numbers
// from the shop's ticket book, columns in shop words, no coloured edge stripes), the safety notes
// speak for the pressing table, and the payment fake's own wording never reaches the shop's screens
// or mail. Screenshots land in test-results/.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, inject, it } from 'vitest';
import { call, DEMO, signIn } from '../http/client';
import { ready, sharedBrowser, TABLET, tabletPage } from './browser';
import { signedInPage } from './sign-in';

const browser = sharedBrowser();
// The demo shop is Pinmark & Hem: its ticket book is numbered "PH 1001", "PH 1002", ...
const TICKET_NO = /^PH \d{4,}$/;
// The payment fake's words (scripts/payments-fake.mjs), kept to its own page.
const FAKE_WORDS = [/no real money/i, /local test payment/i, /test payment service/i];

async function someOpenGarment(): Promise<{ id: string; ticketId: string }> {
  const rows = (await call('GET', '/api/garments', { cookie: await signIn(DEMO.lead) })).body as { id: string; ticketId: string; status: string }[];
  const open = rows.find((r) => r.status !== 'collected');
  if (!open) throw new Error('the demo shop has no open garment');
  return open;
}

describe('the queue in the shop’s own words', () => {
  it('heads its columns Tailor, Wanted by, Ticket no. and Stage, numbers tickets as PH 1001, and has no coloured edge stripes', async () => {
    const page = await signedInPage(browser(), 'lead', '/queue', { ...TABLET, viewport: { width: 1280, height: 900 } });
    await page.getByTestId('queue-row').first().waitFor();
    const headers = (await page.getByRole('columnheader').allInnerTexts()).map((t) => t.replace(/[▲▼]/g, '').trim());
    expect(headers).toEqual(expect.arrayContaining(['Tailor', 'Wanted by', 'Ticket no.', 'Stage']));
    for (const old of ['Whose', 'Due', 'Step']) expect(headers).not.toContain(old);
    const numbers = await page.getByTestId('queue-row').locator('td:nth-child(3)').allInnerTexts();
    expect(numbers.length).toBeGreaterThan(0);
    for (const n of numbers) expect(n.trim()).toMatch(TICKET_NO);
    expect(await page.locator('main').innerText()).not.toMatch(/\bT-\d/);
    // The calm marker: a row of stage tacks beside the stage's name; no row has a coloured left edge.
    expect(await page.getByTestId('stage-marks').first().innerText()).toMatch(/^[●○]{7}$/);
    const edges = await page.getByTestId('queue-row').evaluateAll((rows) => rows.map((r) => parseFloat(getComputedStyle(r).borderLeftWidth)));
    expect(Math.max(...edges)).toBeLessThan(1);
    await page.screenshot({ path: 'test-results/own-words-queue.png', fullPage: true });
    await page.context().close();
  });

  it('the counter shows the same ticket number, from the shop’s ticket book', async () => {
    const { ticketId } = await someOpenGarment();
    const page = await signedInPage(browser(), 'counter', `/counter/${ticketId}`, TABLET);
    const shown = (await page.getByTestId('ticket-number').innerText()).trim();
    expect(shown).toMatch(TICKET_NO);
    expect(await page.locator('main').innerText()).not.toMatch(/\bT-\d/);
    await page.screenshot({ path: 'test-results/own-words-counter.png', fullPage: true });
    await page.context().close();
  });
});

describe('the safety notes and the payment fake’s words', () => {
  it('the garment and home pages say "Mind your hands" in the shop’s voice, with the same cautions', async () => {
    const { id } = await someOpenGarment();
    const page = await signedInPage(browser(), 'tailor', `/garments/${id}`, TABLET);
    for (const path of [`/garments/${id}`, '/']) {
      await page.goto(path);
      await ready(page);
      const care = page.locator('section[aria-labelledby="care-heading"]');
      expect(await care.getByRole('heading').innerText()).toBe('Mind your hands');
      const text = await care.innerText();
      for (const caution of [
        'Iron and steam',
        'pull the plug before you fill or empty it',
        'seam rippers',
        'sharps jar',
        'Needles and pins',
        'local rules come first',
      ])
        expect(text).toContain(caution);
      expect(await page.locator('body').innerText()).not.toContain('Take care');
    }
    await page.context().close();
  });

  it('no screen of the shop, for any role, carries the payment fake’s wording; nor does any mail sent', async () => {
    const { id, ticketId } = await someOpenGarment();
    const screens = [
      '/',
      '/queue',
      `/tickets/${ticketId}`,
      `/garments/${id}`,
      `/counter/${ticketId}`,
      '/prices',
      '/presets',
      '/bench-settings',
      '/staff',
      '/sent-messages',
      '/tickets/new',
    ];
    const seen: string[] = [];
    for (const role of ['lead', 'counter'] as const) {
      const page = await signedInPage(browser(), role, '/', TABLET);
      for (const path of screens) {
        const r = await page.goto(path);
        if (!r || r.status() >= 400) continue;
        // Some screens are plain pages with no island to wait for.
        if ((await page.locator('astro-island').count()) > 0) await ready(page);
        const text = await page.locator('body').innerText();
        for (const words of FAKE_WORDS) expect(text, `${role} on ${path}`).not.toMatch(words);
        seen.push(`${role} ${path}`);
      }
      await page.context().close();
    }
    // Public pages the customer sees after paying online.
    const page = await tabletPage(browser());
    for (const path of ['/paid', '/paid?cancelled', '/sign-in']) {
      await page.goto(path);
      for (const words of FAKE_WORDS) expect(await page.locator('body').innerText(), path).not.toMatch(words);
    }
    await page.context().close();
    expect(seen.length).toBeGreaterThan(10);
    // Every message the capture holds (ready notices, invitations...) when this file runs after others.
    const dir = inject('mailDir');
    let names: string[] = [];
    try {
      names = readdirSync(dir).filter((n) => n.endsWith('.json'));
    } catch {
      /* no mail sent yet */
    }
    for (const name of names) {
      const mail = JSON.parse(readFileSync(join(dir, name), 'utf8')) as { subject: string; text: string };
      for (const words of FAKE_WORDS) expect(`${mail.subject}\n${mail.text}`, name).not.toMatch(words);
    }
  });
});
