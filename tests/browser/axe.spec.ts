// Accessibility (issue 15): axe-core on every screen, for every role and signed out, on a phone
// (390 × 844) and an upright tablet (768 × 1024), must find nothing. The screens include their
// states worth checking: the calculator's warnings, its taper check and its dimmed last good plan,
// the garment page with the presets open, the counter with a payment and its receipt, /paid with a
// real session, the outbox with a receipt in it, and every refusal (403) a role meets. The table of
// screens must name every page file in src/pages, so a new page cannot be left out unnoticed.
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { QueueRow } from '@/lib/bench-types';
import { can, ROLES, type Role } from '@/lib/roles';
import { call, DEMO, signIn } from '../http/client';
import { pageFiles, pageIds } from '../http/pages';
import { axeProblems, type AxeResults } from './axe-report';
import { sharedBrowser } from './browser';
import { settled } from './layout-checks';
import { colourOnlyLinks } from './link-checks';
import { signInAs } from './sign-in';

const AXE_SOURCE = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');
const VIEWPORTS = [
  { width: 390, height: 844 },
  { width: 768, height: 1024 },
];

/** What the screens need from the demo shop: a ticket and garment the role's queue shows, and the payment fixture. */
interface Fixture {
  ticketId: string;
  garmentId: string;
  invitationId: string;
  /** a ticket with a cash deposit (receipt e-mailed) and an open pay link */
  paidTicketId: string;
  sessionId: string;
}

type Who = Role | 'signed out';

/** One screen: an address, checked as it opens and again after each further step (in order, on the same page). */
interface Visit {
  label: string;
  path: string;
  steps?: { label: string; run: (page: Page) => Promise<void>; when?: (who: Who) => boolean }[];
}

const field = (page: Page, label: string) => page.getByLabel(label, { exact: true });
const cutText = (page: Page) =>
  page
    .getByTestId('cut-line')
    .textContent({ timeout: 5_000 })
    .catch(() => null);

/** A cuff outside the usual depths: the plan carries a "Take care" warning. */
async function unusualCuff(page: Page): Promise<void> {
  await field(page, 'Cuff depth').fill('3');
  await field(page, 'Cloth below the mark').fill('10');
  await expect.poll(() => cutText(page), { timeout: 10_000 }).toBe('9 in');
  await page.getByText('Take care:').first().waitFor();
}

/** Then the taper check opened and filled: its result table and the leg drawn flat. */
async function taperedLeg(page: Page): Promise<void> {
  await page.getByText('Tapered leg: check the width').click();
  await field(page, 'Width at the finished edge').fill('8');
  await field(page, 'Width higher up').fill('10');
  await field(page, '…measured this high above the edge').fill('12');
  await field(page, 'Seam allowance (optional)').fill('1/2');
  await expect.poll(() => page.getByRole('heading', { name: 'Tapered leg' }).isVisible(), { timeout: 10_000 }).toBe(true);
}

/** Then a mistyped depth: the last good plan stays on screen, dimmed, under the message. */
async function staleCuff(page: Page): Promise<void> {
  await field(page, 'Cuff depth').fill('abc');
  await page.getByText('do not cut by them', { exact: false }).waitFor({ timeout: 10_000 });
}

/** Opens the leg's presets on the garment page (there for those who may change the fitting). */
async function presetsOpen(page: Page): Promise<void> {
  const opener = page
    .locator('summary, button')
    .filter({ hasText: /^Presets\b/ })
    .first();
  await opener.click();
  await page.getByRole('heading', { name: 'House presets' }).waitFor();
}

const fitter = (who: Who) => who !== 'signed out' && can(who, ['measurements', 'update']);

/** Route key (as pageFiles() names the page file) → the visits that cover it. */
function screens(f: Fixture): Record<string, Visit[]> {
  return {
    '': [
      {
        label: 'calculator',
        path: '/',
        steps: [
          { label: 'with a warning', run: unusualCuff },
          { label: 'with a tapered leg', run: taperedLeg },
          { label: 'with its last good plan dimmed', run: staleCuff },
        ],
      },
    ],
    '404': [{ label: 'not found', path: '/no-such-page' }],
    'api-reference': [{ label: 'API reference', path: '/api-reference' }],
    bench: [{ label: 'bench', path: '/bench' }],
    'bench-settings': [{ label: 'bench settings', path: '/bench-settings' }],
    'counter/[ticketId]': [
      { label: 'counter', path: `/counter/${f.ticketId}` },
      { label: 'counter with a payment, its receipt and a pay link', path: `/counter/${f.paidTicketId}` },
    ],
    customers: [{ label: 'customers', path: '/customers' }],
    forgot: [{ label: 'forgotten password', path: '/forgot' }],
    'garments/[id]': [{ label: 'garment', path: `/garments/${f.garmentId}`, steps: [{ label: 'with the presets open', run: presetsOpen, when: fitter }] }],
    'invite/[id]': [{ label: 'invitation', path: `/invite/${f.invitationId}` }],
    'sent-messages': [{ label: 'sent messages (outbox)', path: '/sent-messages' }],
    overview: [{ label: 'overview', path: '/overview?period=4w' }],
    paid: [
      { label: 'paid, no session', path: '/paid' },
      { label: 'paid, cancelled', path: '/paid?cancelled' },
      { label: 'paid, with its session', path: `/paid?session_id=${f.sessionId}` },
    ],
    presets: [{ label: 'presets', path: '/presets' }],
    prices: [{ label: 'prices', path: '/prices' }],
    queue: [{ label: 'queue', path: '/queue' }],
    reset: [{ label: 'reset password', path: '/reset?token=not-a-real-token' }],
    'sign-in': [{ label: 'sign in', path: '/sign-in' }],
    'sign-out': [{ label: 'sign out (GET sends on)', path: '/sign-out' }],
    'sign-up': [{ label: 'sign up', path: '/sign-up' }],
    staff: [{ label: 'staff', path: '/staff' }],
    'tickets/[id]': [{ label: 'ticket', path: `/tickets/${f.ticketId}` }],
    'tickets/new': [{ label: 'new ticket', path: '/tickets/new' }],
  };
}
const ROUTE_KEYS = Object.keys(screens({ ticketId: '', garmentId: '', invitationId: '', paidTicketId: '', sessionId: '' }));

/** A ticket with a cash deposit whose receipt went by e-mail, and an open pay link for the rest. */
async function paidFixture(): Promise<{ paidTicketId: string; sessionId: string }> {
  const counter = await signIn(DEMO.counter);
  const c = await call('POST', '/api/customers', { cookie: counter, body: { name: 'Ilsa Quorndon', email: `axe-${Date.now().toString(36)}@example.com` } });
  const t = await call('POST', '/api/tickets', { cookie: counter, body: { customerId: c.body.id, garments: [{ description: 'Charcoal twill trousers' }] } });
  expect(t.status).toBe(201);
  expect((await call('POST', `/api/tickets/${t.body.id}/price-lines`, { cookie: counter, body: { source: 'list', key: 'cuff-from-hem' } })).status).toBe(201);
  const paid = await call('POST', `/api/tickets/${t.body.id}/payments`, { cookie: counter, body: { method: 'cash', amountMinor: 400 } });
  expect(paid.status).toBe(201);
  const paymentId = (paid.body.payments as { id: string }[])[0]!.id;
  expect((await call('POST', `/api/tickets/${t.body.id}/payments/${paymentId}/receipt`, { cookie: counter })).status).toBe(200);
  const link = await call('POST', `/api/tickets/${t.body.id}/payments/link`, { cookie: counter });
  expect(link.status).toBe(201);
  return { paidTicketId: t.body.id, sessionId: String(link.body.link.url).split('/pay/')[1]! };
}

// axe-core's default rules (WCAG A and AA, best practices), plus one it retired in 4.x that issue 15
// was reported with: a complementary landmark (aside) nested in another landmark.
const AXE_OPTIONS = { resultTypes: ['violations'], rules: { 'landmark-complementary-is-top-level': { enabled: true } } };

/** Loads axe-core into the open page (once per document) and runs it; its violations, readable, and any link told by colour alone. */
async function check(page: Page): Promise<string[]> {
  if (!(await page.evaluate(() => 'axe' in window))) await page.evaluate(AXE_SOURCE);
  const results = await page.evaluate(
    (options) => (window as unknown as { axe: { run: (c: Document, o: object) => Promise<unknown> } }).axe.run(document, options),
    AXE_OPTIONS,
  );
  return [...axeProblems(results as AxeResults), ...(await colourOnlyLinks(page))];
}

const browser = sharedBrowser();
let shared: Omit<Fixture, 'ticketId' | 'garmentId'>;

beforeAll(async () => {
  const { invitationId } = await pageIds();
  shared = { invitationId, ...(await paidFixture()) };
});

describe('the table of screens', () => {
  it('names every page file in src/pages (a new page must be added here)', () => {
    expect([...ROUTE_KEYS].sort()).toEqual(pageFiles().sort());
  });
});

for (const who of [...ROLES, 'signed out'] as const) {
  describe(`axe-core, ${who}, at ${VIEWPORTS.map((v) => `${v.width}×${v.height}`).join(' and ')}`, () => {
    let context: BrowserContext;
    let page: Page;
    let visits: Record<string, Visit[]>;
    // Signed out, most screens send on to the sign-in page: each address landed on is checked once.
    const checked = new Set<string>();

    beforeAll(async () => {
      context = await browser().newContext({ baseURL: inject('baseURL'), viewport: VIEWPORTS[0], hasTouch: true });
      page = await context.newPage();
      let ids = { ticketId: shared.paidTicketId, garmentId: '00000000-0000-4000-8000-000000000000' };
      if (who !== 'signed out') {
        await signInAs(page, who, '/queue');
        // Both are in every role's queue: the navy pair is the apprentice's, the chinos nobody's.
        const rows = (await (await page.request.get('/api/garments')).json()) as QueueRow[];
        const navy = rows.find((r) => r.description === 'Navy suit trousers');
        const chinos = rows.find((r) => r.description === 'Stone chinos');
        expect(navy && chinos, 'demo garments in the queue').toBeTruthy();
        ids = { ticketId: chinos!.ticketId, garmentId: navy!.id };
      }
      visits = screens({ ...shared, ...ids });
    });
    afterAll(async () => {
      await context?.close();
    });

    for (const key of ROUTE_KEYS) {
      it(`/${key}: no violations`, async () => {
        const found: string[] = [];
        let checks = 0;
        for (const visit of visits[key]!) {
          await page.setViewportSize(VIEWPORTS[0]!);
          await page.goto(visit.path);
          await settled(page);
          const landed = new URL(page.url());
          const where = `${landed.pathname}${landed.search}`;
          if (who === 'signed out' && checked.has(where)) continue;
          checked.add(where);
          const steps = (visit.steps ?? []).filter((s) => !s.when || s.when(who));
          for (const step of [{ label: '', run: async () => {} }, ...steps]) {
            await step.run(page);
            for (const viewport of VIEWPORTS) {
              await page.setViewportSize(viewport);
              await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
              const name = `${visit.label}${step.label ? ` ${step.label}` : ''} (${visit.path} → ${where}) at ${viewport.width} px`;
              for (const problem of await check(page)) found.push(`${name}: ${problem}`);
              checks += 1;
            }
          }
        }
        // Signed out, an address that sends on to a page already checked has nothing new to show.
        if (who !== 'signed out') expect(checks).toBeGreaterThan(0);
        expect(found, `\n${found.join('\n\n')}\n`).toEqual([]);
      });
    }
  });
}
