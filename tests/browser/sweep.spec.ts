// The whole-site sweep: every screen, for every role and signed out, opened ONCE per role and checked
// on that one visit, in every state worth checking and at every width, for
// - accessibility (issue 15): axe-core finds nothing, and no link in a sentence is told by colour
//   alone (link-checks.ts), on a phone (390 × 844) and an upright tablet (768 × 1024);
// - the Content-Security-Policy: no violation is reported (securitypolicyviolation events or
//   console) from the page's first script on, through every step, and every island hydrates;
// - fitting the screen (layout-checks.ts): nothing scrolls sideways, no control hides behind a
//   frame's edge, every button and field stays finger-sized, on the phone, the upright tablet and
//   one held sideways (1024 × 768). A screen a role may not use answers its refusal page, which
//   must pass all of it too. A screen with a layout problem is photographed into
//   test-results/screens/<who>-<screen>-<width>.png.
// The states: the calculator's warnings, its taper check and its dimmed last good plan, the
// garment page with the presets open (and the demo's skirt and coat sleeves), intake with a second garment (each row's Remove button), the
// counter with a payment and its receipt, /paid with a real session, the outbox with a receipt in
// it, and every refusal (403) a role meets. The table of screens must name every page file in
// src/pages, so a new page cannot be left out unnoticed. Each role signs in once; its screens are
// one `it` each, so a failure names the screen, the role, the width and the rule or check broken.
// Also here: the CSP is shown to be enforced (so a quiet listener means something), sign-in with an
// off-site ?next= stays on this site, and the queue's cards on an upright tablet and a phone.
import { mkdirSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { BrowserContext, ConsoleMessage, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { QueueRow } from '@/lib/shared/bench-types';
import { can, ROLES, type Role } from '@/lib/shared/roles';
import { call, DEMO, signIn } from '../http/client';
import { pageFiles, pageIds } from '../http/pages';
import { axeProblems, type AxeResults } from './axe-report';
import { ready, sharedBrowser } from './browser';
import { layoutProblems, settled, trackRequests } from './layout-checks';
import { colourOnlyLinks } from './link-checks';
import { signedInContext, signInAs, submitSignIn } from './sign-in';

const AXE_SOURCE = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');
const SHOTS = 'test-results/screens';
/** Each width the sweep checks a state at; axe (and the colour-only link check) runs at the first two. */
const VIEWPORTS = [
  { width: 390, height: 844, axe: true },
  { width: 768, height: 1024, axe: true },
  { width: 1024, height: 768, axe: false },
];
const size = ({ width, height }: { width: number; height: number }) => ({ width, height });

/** What the screens need from the demo shop: a ticket and garment the role's queue shows, and the payment fixture. */
interface Fixture {
  ticketId: string;
  garmentId: string;
  /** the demo's teal skirt and camel overcoat (demo-kinds-seed.ts): garments fitted once, not per leg */
  skirtId: string;
  coatId: string;
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

/** Intake with two garments: the second row brings each row's Remove button. */
async function secondGarment(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Another garment' }).click();
  await page.getByLabel('Garment 2', { exact: true }).waitFor();
}

const fitter = (who: Who) => who !== 'signed out' && can(who, ['measurements', 'update']);
const intake = (who: Who) => who !== 'signed out' && can(who, ['tickets', 'create']);

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
    'garments/[id]': [
      { label: 'garment', path: `/garments/${f.garmentId}`, steps: [{ label: 'with the presets open', run: presetsOpen, when: fitter }] },
      { label: 'garment, a skirt', path: `/garments/${f.skirtId}` },
      { label: 'garment, coat sleeves', path: `/garments/${f.coatId}` },
    ],
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
    // GET only sends on (a POST ends the session), so the role's session lives on.
    'sign-out': [{ label: 'sign out (GET sends on)', path: '/sign-out' }],
    'sign-up': [{ label: 'sign up', path: '/sign-up' }],
    staff: [{ label: 'staff', path: '/staff' }],
    'tickets/[id]': [{ label: 'ticket', path: `/tickets/${f.ticketId}` }],
    'tickets/new': [{ label: 'new ticket', path: '/tickets/new', steps: [{ label: 'with a second garment', run: secondGarment, when: intake }] }],
  };
}
const ROUTE_KEYS = Object.keys(screens({ ticketId: '', garmentId: '', skirtId: '', coatId: '', invitationId: '', paidTicketId: '', sessionId: '' }));

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
async function accessibility(page: Page): Promise<string[]> {
  if (!(await page.evaluate(() => 'axe' in window))) await page.evaluate(AXE_SOURCE);
  const results = await page.evaluate(
    (options) => (window as unknown as { axe: { run: (c: Document, o: object) => Promise<unknown> } }).axe.run(document, options),
    AXE_OPTIONS,
  );
  return [...axeProblems(results as AxeResults).map((p) => `[axe] ${p}`), ...(await colourOnlyLinks(page)).map((p) => `[link] ${p}`)];
}

/** A page that records CSP violations from the first script on (the init script runs outside the page's CSP). */
async function watchedPage(context: BrowserContext): Promise<{ page: Page; violations: string[] }> {
  const page = await context.newPage();
  trackRequests(page);
  const violations: string[] = [];
  await page.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (e) => {
      console.error(`CSP violation: ${e.violatedDirective} blocked ${e.blockedURI || 'inline'} at ${e.sourceFile}:${e.lineNumber}`);
    });
  });
  page.on('console', (m: ConsoleMessage) => {
    if (/Content Security Policy|CSP violation/i.test(m.text())) violations.push(`${page.url()}: ${m.text()}`);
  });
  return { page, violations };
}

const browser = sharedBrowser();
let shared: Omit<Fixture, 'ticketId' | 'garmentId' | 'skirtId' | 'coatId'>;

beforeAll(async () => {
  mkdirSync(SHOTS, { recursive: true });
  const { invitationId } = await pageIds();
  shared = { invitationId, ...(await paidFixture()) };
});

describe('the table of screens', () => {
  it('names every page file in src/pages (a new page must be added here)', () => {
    expect([...ROUTE_KEYS].sort()).toEqual(pageFiles().sort());
  });
});

describe('Content-Security-Policy in Chromium', () => {
  it('is enforced: an injected inline script is blocked and reported', async () => {
    const context = await browser().newContext({ baseURL: inject('baseURL') });
    const { page, violations } = await watchedPage(context);
    await page.goto('/');
    await settled(page);
    const ran = await page.evaluate(() => {
      const s = document.createElement('script');
      s.textContent = 'window.__injected = true';
      document.body.append(s);
      return Boolean((window as unknown as { __injected?: boolean }).__injected);
    });
    expect(ran).toBe(false);
    // The report arrives as an event after the script is refused: wait for it, not for a fixed time.
    await expect.poll(() => violations.length).toBeGreaterThan(0);
    await context.close();
  });
});

for (const who of [...ROLES, 'signed out'] as const) {
  const widths = VIEWPORTS.map((v) => `${v.width}×${v.height}`).join(', ');
  describe(`${who}: axe-core, links, CSP and fit at ${widths}`, () => {
    let context: BrowserContext;
    let page: Page;
    let violations: string[];
    let visits: Record<string, Visit[]>;
    let islands = 0;
    // Signed out, most screens send on to the sign-in page: each address landed on is checked once.
    const checked = new Set<string>();

    beforeAll(async () => {
      const options = { baseURL: inject('baseURL'), viewport: size(VIEWPORTS[0]!), hasTouch: true };
      context = await browser().newContext(options);
      ({ page, violations } = await watchedPage(context));
      const nowhere = '00000000-0000-4000-8000-000000000000';
      let ids = { ticketId: shared.paidTicketId, garmentId: nowhere, skirtId: nowhere, coatId: nowhere };
      if (who !== 'signed out') {
        // Once per role, on the watched page: the sign-in itself is under the CSP check too.
        await signInAs(page, who, '/queue');
        expect(violations, 'CSP violations while signing in').toEqual([]);
        // All are in every role's queue: the navy pair is the apprentice's, the chinos, skirt and coat nobody's.
        const rows = (await (await page.request.get('/api/garments')).json()) as QueueRow[];
        const navy = rows.find((r) => r.description === 'Navy suit trousers');
        const chinos = rows.find((r) => r.description === 'Stone chinos');
        const skirt = rows.find((r) => r.description === 'Teal half-circle skirt');
        const coat = rows.find((r) => r.description === 'Camel overcoat');
        expect(navy && chinos && skirt && coat, 'demo garments in the queue').toBeTruthy();
        ids = { ticketId: chinos!.ticketId, garmentId: navy!.id, skirtId: skirt!.id, coatId: coat!.id };
      }
      visits = screens({ ...shared, ...ids });
    });
    afterAll(async () => {
      await context?.close();
    });

    for (const key of ROUTE_KEYS) {
      it(`/${key}: no violations, every island hydrated, everything fits`, async () => {
        const found: string[] = [];
        let checks = 0;
        for (const visit of visits[key]!) {
          await page.setViewportSize(size(VIEWPORTS[0]!));
          const before = violations.length;
          await page.goto(visit.path);
          await settled(page);
          const landed = new URL(page.url());
          const where = `${landed.pathname}${landed.search}`;
          const opened = `${visit.label} (${visit.path} → ${where})`;
          const csp = () => violations.splice(before).map((v) => `${opened}: [csp] ${v}`);
          if (who === 'signed out' && checked.has(where)) {
            found.push(...csp());
            continue;
          }
          checked.add(where);
          islands += await page.locator('astro-island').count();
          const unhydrated = await page.locator('astro-island[ssr]').count();
          if (unhydrated) found.push(`${opened}: [islands] ${unhydrated} island(s) not hydrated`);
          const steps = (visit.steps ?? []).filter((s) => !s.when || s.when(who));
          for (const step of [{ label: '', run: async () => {} }, ...steps]) {
            await step.run(page);
            for (const viewport of VIEWPORTS) {
              await page.setViewportSize(size(viewport));
              await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
              const name = `${visit.label}${step.label ? ` ${step.label}` : ''} (${visit.path} → ${where}) at ${viewport.width} px`;
              if (viewport.axe) for (const problem of await accessibility(page)) found.push(`${name}: ${problem}`);
              const misfits = await layoutProblems(page);
              for (const problem of misfits) found.push(`${name}: [layout] ${problem}`);
              if (misfits.length) {
                const shot = `${who}-${visit.label}${step.label ? `-${step.label}` : ''}-${viewport.width}`.replace(/[^\w-]+/g, '-');
                await page.screenshot({ path: `${SHOTS}/${shot}.png`, fullPage: true });
              }
              checks += 1;
            }
          }
          found.push(...csp());
        }
        // Signed out, an address that sends on to a page already checked has nothing new to show.
        if (who !== 'signed out') expect(checks).toBeGreaterThan(0);
        expect(found, `\n${found.join('\n\n')}\n`).toEqual([]);
      });
    }

    // Runs after the screens above (vitest keeps their order): islands were found, so the
    // hydration checks had something to check.
    it(`found islands to check (${who === 'signed out' ? 'some' : 'more than 5'})`, () => {
      expect(islands).toBeGreaterThan(who === 'signed out' ? 0 : 5);
    });
  });
}

describe('sign-in with an off-site ?next=', () => {
  for (const next of ['/%5Cevil.example', '/%09/evil.example']) {
    it(`next=${next} lands on this site`, async () => {
      const context = await browser().newContext({ baseURL: inject('baseURL') });
      const page = await context.newPage();
      await page.goto(`/sign-in?next=${next}`);
      await ready(page);
      await submitSignIn(page, 'tailor@pinmark.test');
      await page.waitForURL((u) => u.pathname === '/queue');
      expect(new URL(page.url()).origin).toBe(inject('baseURL'));
      await context.close();
    });
  }
});

describe('the queue on an upright tablet and a phone', () => {
  it('shows each card whole, its Mark button beside the garment (768 px) or under it (390 px), and Undo after a tap', async () => {
    const context = await signedInContext(browser(), 'tailor', { baseURL: inject('baseURL'), viewport: { width: 768, height: 900 }, hasTouch: true });
    const page = await context.newPage();
    await page.goto('/queue');
    await ready(page);
    // A ticket of its own, so the tap moves no demo garment another story reads.
    const number = await page.evaluate(async () => {
      const post = await fetch('/api/tickets', {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ customer: { name: 'Oriel Thackwray' }, garments: [{ description: 'Dove grey flannel trousers' }] }),
      });
      return ((await post.json()) as { number: number }).number;
    });
    await page.reload();
    await ready(page);
    await page.getByLabel('Customer or ticket').fill(`PH ${number}`);
    await expect.poll(() => page.getByTestId('queue-row').count()).toBe(1);
    const row = page.getByTestId('queue-row');
    const garment = row.getByRole('link', { name: 'Dove grey flannel trousers' });
    const mark = row.getByRole('button', { name: `Mark Chalk-marked: PH ${number} Dove grey flannel trousers` });

    const [g768, m768, r768] = await Promise.all([garment.boundingBox(), mark.boundingBox(), row.boundingBox()]);
    // Beside: the button starts right of the garment's name, inside the card, at the same height.
    expect(m768!.x).toBeGreaterThan(g768!.x + g768!.width);
    expect(m768!.x + m768!.width).toBeLessThanOrEqual(r768!.x + r768!.width);
    expect(m768!.y).toBeLessThan(g768!.y + g768!.height);
    expect(m768!.height).toBeGreaterThanOrEqual(44);

    await mark.click();
    const undo = row.getByRole('button', { name: `Undo: step PH ${number} Dove grey flannel trousers back to Received` });
    await undo.waitFor();
    for (const width of [768, 390]) {
      await page.setViewportSize({ width, height: 900 });
      await page.evaluate(() => new Promise(requestAnimationFrame));
      expect(await layoutProblems(page)).toEqual([]);
      const box = (await undo.boundingBox())!;
      expect(box.x).toBeGreaterThanOrEqual(0);
      expect(box.x + box.width).toBeLessThanOrEqual(width);
      expect(box.height).toBeGreaterThanOrEqual(44);
      await row.screenshot({ path: `${SHOTS}/queue-card-undo-${width}.png` });
    }
    // On the phone the action runs the card's width under the garment's name.
    const [g390, u390, r390] = await Promise.all([garment.boundingBox(), undo.boundingBox(), row.boundingBox()]);
    expect(u390!.y).toBeGreaterThan(g390!.y + g390!.height);
    expect(u390!.width).toBeGreaterThan(r390!.width * 0.75);
    await undo.click();
    await row.getByRole('status').getByText('Stepped back to Received.').waitFor();
    await context.close();
  });
});
