// The role × route matrix: every API route file × method × (signed out, each role, a member of
// another shop), with the exact status expected and a check that no other shop's data appears.
// A route file or method missing from MATRIX fails the first test; a route that forgets its
// permission check fails its row (a signed-out or unprivileged caller gets through).
import { readdirSync, readFileSync } from 'node:fs';
import { join, relative, sep } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { call, DEMO, freshEmail, newShop, signIn, type Answer } from './client';
import { sampleJpeg, someGarment, upload } from './photo-upload';

const ACTORS = ['signedOut', 'lead', 'tailor', 'apprentice', 'counter', 'other'] as const;
type Actor = (typeof ACTORS)[number];
type Expect = Record<Actor, number>;
type Request = { path: string; body?: unknown };
interface Case {
  /** Builds this actor's request (fresh fixtures where the call changes data). */
  request: (actor: Actor) => Promise<Request> | Request;
  expect: Expect;
  /** Extra checks on a successful answer. */
  check?: (answer: Answer, actor: Actor) => void;
}
type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE' | 'ALL';

const API_DIR = join(process.cwd(), 'src', 'pages', 'api');

/** Route key of a file: its path under src/pages/api without extension or trailing /index. */
function routeKey(file: string): string {
  return relative(API_DIR, file)
    .split(sep)
    .join('/')
    .replace(/\.(ts|js|mjs)$/, '')
    .replace(/(^|\/)index$/, '');
}

function routeFiles(dir = API_DIR): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? routeFiles(join(dir, e.name)) : /\.(ts|js|mjs)$/.test(e.name) ? [join(dir, e.name)] : [],
  );
}

function exportedMethods(file: string): Method[] {
  const src = readFileSync(file, 'utf8');
  const found = [...src.matchAll(/export\s+(?:const|async\s+function|function)\s+(GET|POST|PUT|PATCH|DELETE|ALL)\b/g)];
  return [...new Set(found.map((m) => m[1] as Method))].sort();
}

const all = (status: number): Expect => ({ signedOut: status, lead: status, tailor: status, apprentice: status, counter: status, other: status });
const signedIn = (status: number, overrides: Partial<Expect> = {}): Expect => ({ ...all(status), signedOut: 401, ...overrides });

// Filled in beforeAll.
const cookies = {} as Record<Actor, string | undefined>;
let shopA = '';
let shopB = '';
let aCustomerId = '';
let apprenticeUserId = '';
const markersOfA: string[] = [];
const markersOfB: string[] = [];

async function freshTicket(): Promise<string> {
  const t = await call('POST', '/api/tickets', { cookie: cookies.lead, body: { note: 'matrix fixture', garments: [{ description: 'Matrix trousers' }] } });
  const moved = await call('PATCH', `/api/tickets/${t.body.id}`, { cookie: cookies.lead, body: { status: 'marked' } });
  expect(moved.status).toBe(200);
  return t.body.id;
}

/** A fresh unassigned garment of shop A (the apprentice may see it). */
async function freshGarment(): Promise<string> {
  const ticket = await freshTicket();
  const t = await call('GET', `/api/tickets/${ticket}`, { cookie: cookies.lead });
  return t.body.garments[0].id;
}

/** A fresh unassigned skirt of shop A (fitted once: kind_fittings). */
async function freshSkirt(): Promise<string> {
  const t = await call('POST', '/api/tickets', {
    cookie: cookies.lead,
    body: { note: 'matrix fixture', garments: [{ description: 'Matrix skirt', kind: 'skirt' }] },
  });
  expect(t.status).toBe(201);
  return (await call('GET', `/api/tickets/${t.body.id}`, { cookie: cookies.lead })).body.garments[0].id;
}

// A straight skirt 40 in round, a 2 in hem (invented figures).
const SKIRT_FITTING = { kind: 'skirt', unit: 'in', fields: { hemRound: '40', hemDepth: '2' } };

const FITTING = {
  unit: 'in',
  legs: {
    left: { finish: 'cuff', backPin: '31 1/4', cuffDepth: '1 1/2', available: '5' },
    right: { finish: 'cuff', backPin: '31 1/2', cuffDepth: '1 1/2', available: '4 3/4' },
  },
};

/** A fresh unassigned garment of shop A with the fitting above saved, ready for a cut sheet. */
async function fittedGarment(): Promise<string> {
  const id = await freshGarment();
  const r = await call('PUT', `/api/garments/${id}/measurements`, { cookie: cookies.lead, body: FITTING });
  expect(r.status).toBe(200);
  return id;
}

/** A fresh customer of shop A, added by its lead. */
async function freshCustomer(): Promise<string> {
  const r = await call('POST', '/api/customers', { cookie: cookies.lead, body: { name: 'Matrix Customer' } });
  expect(r.status).toBe(201);
  return r.body.id;
}

async function freshInvitation(): Promise<{ id: string; email: string }> {
  const email = freshEmail('invitee');
  const r = await call('POST', '/api/staff', { cookie: cookies.lead, body: { email, role: 'counter' } });
  expect(r.status).toBe(201);
  return { id: r.body.id, email };
}

async function freshMember(): Promise<string> {
  const { id, email } = await freshInvitation();
  const ok = await call('POST', `/api/invitations/${id}/accept`, { body: { name: 'Fixture Person', password: 'a-long-password' } });
  expect(ok.status).toBe(200);
  const staff = await call('GET', '/api/staff', { cookie: cookies.lead });
  return staff.body.members.find((m: { email: string }) => m.email === email).id;
}

function ownShop(actor: Actor): string {
  return actor === 'other' ? shopB : shopA;
}

/** A fresh shop A ticket with one price line from the list (the demo shop's cuff price). */
async function pricedTicket(): Promise<string> {
  const id = await freshTicket();
  const r = await call('POST', `/api/tickets/${id}/price-lines`, { cookie: cookies.lead, body: { source: 'list', key: 'cuff-from-hem' } });
  expect(r.status).toBe(201);
  return id;
}

/** A priced ticket paid in full, then reduced by 1.00: 1.00 is owed back to the customer. */
async function creditTicket(): Promise<string> {
  const id = await pricedTicket();
  expect((await call('POST', `/api/tickets/${id}/payments`, { cookie: cookies.lead, body: { method: 'cash', amountMinor: 2400 } })).status).toBe(201);
  const adjusted = await call('POST', `/api/tickets/${id}/price-lines`, {
    cookie: cookies.lead,
    body: { source: 'adjust', label: 'Matrix', amountMinor: -100, reason: 'matrix credit' },
  });
  expect(adjusted.status).toBe(201);
  return id;
}

/** The receipt path of a cash payment of 10.00 on a fresh priced ticket (no customer, so no e-mail). */
async function receiptPath(): Promise<string> {
  const id = await pricedTicket();
  const paid = await call('POST', `/api/tickets/${id}/payments`, { cookie: cookies.lead, body: { method: 'cash', amountMinor: 1000 } });
  expect(paid.status).toBe(201);
  return `/api/tickets/${id}/payments/${paid.body.payments[0].id}/receipt`;
}

/** The path that voids the only line of a fresh priced ticket. */
async function lineToVoid(): Promise<string> {
  const id = await pricedTicket();
  const lines = await call('GET', `/api/tickets/${id}/price-lines`, { cookie: cookies.lead });
  return `/api/tickets/${id}/price-lines/${lines.body[0].id}/void`;
}

/** A fresh shop A ticket moved to ready, for a customer with an e-mail address. */
async function readyTicket(): Promise<string> {
  const c = await call('POST', '/api/customers', { cookie: cookies.lead, body: { name: 'Matrix Customer', email: freshEmail('ready') } });
  const t = await call('POST', '/api/tickets', {
    cookie: cookies.lead,
    body: { customerId: c.body.id, note: 'matrix ready', garments: [{ description: 'Matrix trousers' }] },
  });
  for (const status of ['marked', 'cut', 'stitched', 'pressed', 'ready']) {
    const moved = await call('PATCH', `/api/tickets/${t.body.id}`, { cookie: cookies.lead, body: { status } });
    expect(moved.status).toBe(200);
  }
  return t.body.id;
}

/** A ready ticket whose ready notice was sent: returns its retry path. */
async function sentNotice(): Promise<string> {
  const id = await readyTicket();
  const n = await call('POST', `/api/tickets/${id}/notices`, { cookie: cookies.lead, body: { kind: 'ready' } });
  expect(n.status).toBe(201);
  return `/api/tickets/${id}/notices/${n.body.id}/retry`;
}

const PRICE_LIST = {
  currency: 'EUR',
  hours: 'Tue–Fri 9:00–18:00, Sat 9:00–13:00',
  location: '7 Bobbin Row, Wickhollow',
  autoReadyNotice: false,
  items: [
    { key: 'plain-hem', label: 'Plain hem', amountMinor: 1650 },
    { key: 'cuff-from-hem', label: 'Cuff from a plain hem', amountMinor: 2400 },
    { key: 'cuff-remake', label: 'Cuff let down and re-made', amountMinor: 2950 },
    { key: 'original-hem', label: 'Jeans, original hem kept', amountMinor: 2200 },
    { key: 'taper-let-out', label: 'Taper let-out at the cuff (per pair)', amountMinor: 1100 },
    { key: 'rush', label: 'Rush surcharge (per ticket)', amountMinor: 900 },
  ],
};

let kindNo = 0;
/** A fresh kind of work on shop A's list, made by its lead and retired at once (the browser stories share the demo list). */
async function freshKind(): Promise<string> {
  kindNo += 1;
  const r = await call('POST', '/api/prices/kinds', {
    cookie: cookies.lead,
    body: { name: `Matrix kind ${Date.now().toString(36)} ${kindNo}`, amountMinor: 1500, rushApplies: true },
  });
  expect(r.status).toBe(201);
  expect((await call('PATCH', `/api/prices/kinds/${r.body.id}`, { cookie: cookies.lead, body: { retired: true } })).status).toBe(200);
  return r.body.id;
}

let photoGarmentOfA = '';
async function garmentOfA(): Promise<string> {
  return (photoGarmentOfA ||= await someGarment(cookies.lead!));
}

/** A fresh house preset of shop A, made by its lead. */
async function freshHousePreset(): Promise<string> {
  const r = await call('POST', '/api/presets', {
    cookie: cookies.lead,
    body: { name: freshEmail('house'), scope: 'house', settings: { finish: 'cuff', unit: 'in', cuffDepth: '1 1/2' } },
  });
  expect(r.status).toBe(201);
  return r.body.id;
}

/** A fresh fitting photo on a garment of shop A, uploaded by its lead. */
async function freshPhoto(): Promise<string> {
  const r = await upload(cookies.lead, await garmentOfA(), [{ name: 'matrix.jpg', bytes: await sampleJpeg(64, 48) }]);
  expect(r.status).toBe(201);
  return r.body[0].id;
}

/** Every route file (key) and method, with what each caller must get. */
const MATRIX: Record<string, 'public: calculator' | 'auth: better-auth' | Partial<Record<Method, Case>>> = {
  // The public calculator's routes (another team's): no sign-in by design.
  plan: 'public: calculator',
  'plan/sheet': 'public: calculator',
  'auth/[...all]': 'auth: better-auth',
  // For load balancers: open to all, the same answer for everyone, no shop data (markers checked).
  health: {
    GET: {
      request: () => ({ path: '/api/health' }),
      expect: all(200),
      check: (r) => expect(r.body).toMatchObject({ ok: true, database: 'reachable', migrations: 'current' }),
    },
  },
  // The API document: open to all, the same for everyone (it describes routes, holds no shop data).
  'openapi.json': {
    GET: {
      request: () => ({ path: '/api/openapi.json' }),
      expect: all(200),
      check: (r) => expect(r.body.openapi).toBe('3.1.0'),
    },
  },
  me: {
    GET: {
      request: () => ({ path: '/api/me' }),
      expect: signedIn(200),
      check: (a, actor) => expect(a.body.shop.id).toBe(ownShop(actor)),
    },
  },
  shops: {
    POST: {
      // Public by design: sign-up opens a new shop for anyone.
      request: () => ({ path: '/api/shops', body: { shopName: 'Matrix Hems', name: 'New Lead', email: freshEmail('signup'), password: 'a-long-password' } }),
      expect: all(201),
      check: (a) => expect([shopA, shopB]).not.toContain(a.body.shopId),
    },
  },
  staff: {
    GET: {
      request: () => ({ path: '/api/staff' }),
      expect: signedIn(403, { lead: 200, other: 200 }),
      check: (a, actor) => expect(a.body.members.length).toBeGreaterThan(actor === 'other' ? 0 : 3),
    },
    POST: {
      request: () => ({ path: '/api/staff', body: { email: freshEmail('invite'), role: 'tailor' } }),
      expect: signedIn(403, { lead: 201, other: 201 }),
    },
  },
  'staff/[memberId]': {
    PATCH: {
      request: async () => ({ path: `/api/staff/${await freshMember()}`, body: { role: 'tailor' } }),
      expect: signedIn(403, { lead: 200, other: 404 }),
    },
    DELETE: {
      request: async () => ({ path: `/api/staff/${await freshMember()}` }),
      expect: signedIn(403, { lead: 200, other: 404 }),
    },
  },
  'invitations/[id]': {
    GET: {
      // Public by design: the id from the e-mail is the secret.
      request: async () => ({ path: `/api/invitations/${(await freshInvitation()).id}` }),
      expect: all(200),
      check: (a) => expect(a.body.role).toBe('counter'),
    },
  },
  'invitations/[id]/accept': {
    POST: {
      // Signed out, the form creates the invitee's account; signed in as someone else is refused.
      request: async () => ({ path: `/api/invitations/${(await freshInvitation()).id}/accept`, body: { name: 'New Counter', password: 'a-long-password' } }),
      expect: { ...all(409), signedOut: 200 },
    },
  },
  customers: {
    GET: {
      request: () => ({ path: '/api/customers' }),
      expect: signedIn(200, { apprentice: 403 }),
      check: (a, actor) => {
        if (actor !== 'other') expect(a.body.length).toBeGreaterThan(0);
        for (const c of a.body) expect(c.shopId).toBe(ownShop(actor));
      },
    },
    POST: {
      request: () => ({ path: '/api/customers', body: { name: 'Matrix Customer' } }),
      expect: signedIn(201, { apprentice: 403 }),
      check: (a, actor) => expect(a.body.shopId).toBe(ownShop(actor)),
    },
  },
  'customers/[id]': {
    GET: {
      request: async () => ({ path: `/api/customers/${await freshCustomer()}` }),
      expect: signedIn(200, { apprentice: 403, other: 404 }),
      check: (a) => expect(a.body.name).toBe('Matrix Customer'),
    },
    PATCH: {
      request: async () => ({ path: `/api/customers/${await freshCustomer()}`, body: { notes: 'Prefers a deep cuff.' } }),
      expect: signedIn(200, { apprentice: 403, other: 404 }),
      check: (a) => expect(a.body.notes).toBe('Prefers a deep cuff.'),
    },
  },
  'customers/[id]/file': {
    GET: {
      // The customers screen: the lead and the counter.
      request: async () => ({ path: `/api/customers/${await freshCustomer()}/file` }),
      expect: signedIn(403, { lead: 200, counter: 200, other: 404 }),
      check: (a) => expect(a.body.customer.name).toBe('Matrix Customer'),
    },
  },
  'customers/[id]/erase': {
    POST: {
      request: async () => ({ path: `/api/customers/${await freshCustomer()}/erase`, body: {} }),
      expect: signedIn(403, { lead: 200, other: 404 }),
      check: (a) => expect(a.body).toMatchObject({ name: 'erased', phone: null, email: null }),
    },
  },
  'customers/[id]/fittings': {
    GET: {
      // "Same as last time": whoever takes garments in.
      request: async () => ({ path: `/api/customers/${await freshCustomer()}/fittings` }),
      expect: signedIn(200, { apprentice: 403, other: 404 }),
      check: (a) => expect(a.body).toEqual([]),
    },
  },
  tickets: {
    GET: {
      request: () => ({ path: '/api/tickets' }),
      expect: signedIn(200),
      check: (a, actor) => {
        for (const t of a.body) expect(t.shopId).toBe(ownShop(actor));
        if (actor === 'apprentice') for (const t of a.body) expect([null, apprenticeUserId]).toContain(t.assigneeId);
        if (actor === 'lead') expect(a.body.length).toBeGreaterThanOrEqual(6);
      },
    },
    POST: {
      // The customer is shop A's: the other shop's lead may open tickets, but not on it.
      request: () => ({ path: '/api/tickets', body: { customerId: aCustomerId, note: 'matrix intake' } }),
      expect: signedIn(201, { apprentice: 403, other: 422 }),
      check: (a, actor) => expect(a.body.shopId).toBe(ownShop(actor)),
    },
  },
  'tickets/[id]': {
    GET: {
      request: async () => ({ path: `/api/tickets/${await freshTicket()}` }),
      expect: signedIn(200, { other: 404 }),
      check: (a) => {
        expect(a.body.number).toBeGreaterThan(1000);
        expect(a.body.garments[0].status).toBe('marked');
      },
    },
    PATCH: {
      // Moves every garment at the ticket's step; the ticket follows its garments.
      request: async () => ({ path: `/api/tickets/${await freshTicket()}`, body: { status: 'cut' } }),
      expect: signedIn(200, { counter: 403, other: 404 }),
      check: (a) => expect(a.body.status).toBe('cut'),
    },
  },
  'tickets/[id]/garments': {
    POST: {
      request: async () => ({ path: `/api/tickets/${await freshTicket()}/garments`, body: { description: 'Second pair' } }),
      expect: signedIn(201, { apprentice: 403, other: 404 }),
      check: (a, actor) => expect(a.body.shopId).toBe(ownShop(actor)),
    },
  },
  garments: {
    GET: {
      request: () => ({ path: '/api/garments' }),
      expect: signedIn(200),
      check: (a, actor) => {
        if (actor === 'lead') expect(a.body.length).toBeGreaterThanOrEqual(6);
        if (actor === 'other') expect(a.body).toEqual([]);
        if (actor === 'apprentice') for (const g of a.body) expect([null, apprenticeUserId]).toContain(g.assigneeId);
      },
    },
  },
  'garments/[id]': {
    GET: {
      request: async () => ({ path: `/api/garments/${await freshGarment()}` }),
      expect: signedIn(200, { other: 404 }),
      check: (a) => expect(a.body.ticket.number).toBeGreaterThan(1000),
    },
    PATCH: {
      request: async () => ({ path: `/api/garments/${await freshGarment()}`, body: { dueOn: '2026-12-24' } }),
      expect: signedIn(403, { lead: 200, tailor: 200, other: 404 }),
      check: (a) => expect(a.body.dueOn).toBe('2026-12-24'),
    },
  },
  'garments/[id]/step': {
    POST: {
      request: async () => ({ path: `/api/garments/${await freshGarment()}/step`, body: { to: 'cut' } }),
      expect: signedIn(200, { counter: 403, other: 404 }),
      check: (a) => expect(a.body.status).toBe('cut'),
    },
  },
  'garments/[id]/step-back': {
    POST: {
      // A fresh garment at "marked" goes back to "received"; the counter moves no bench steps.
      request: async () => ({ path: `/api/garments/${await freshGarment()}/step-back`, body: { from: 'marked' } }),
      expect: signedIn(200, { counter: 403, other: 404 }),
      check: (a) => expect(a.body.status).toBe('received'),
    },
  },
  'garments/[id]/measurements': {
    GET: {
      request: async () => ({ path: `/api/garments/${await freshGarment()}/measurements` }),
      expect: signedIn(200, { counter: 403, other: 404 }),
      check: (a) => expect(a.body.legs).toEqual([]),
    },
    PUT: {
      request: async () => ({ path: `/api/garments/${await freshGarment()}/measurements`, body: FITTING }),
      expect: signedIn(403, { lead: 200, tailor: 200, other: 404 }),
      check: (a) => {
        expect(a.body.legs.map((l: { values: { backPin: { mm: number } } }) => l.values.backPin.mm)).toEqual([793.75, 800.1]);
        expect(a.body.history.filter((e: { action: string }) => e.action === 'measurement.changed').length).toBe(8);
      },
    },
  },
  'garments/[id]/kind-fitting': {
    GET: {
      request: async () => ({ path: `/api/garments/${await freshSkirt()}/kind-fitting` }),
      expect: signedIn(200, { counter: 403, other: 404 }),
      check: (a) => expect(a.body).toMatchObject({ kind: 'skirt', values: {}, unit: null }),
    },
    PUT: {
      request: async () => ({ path: `/api/garments/${await freshSkirt()}/kind-fitting`, body: SKIRT_FITTING }),
      expect: signedIn(403, { lead: 200, tailor: 200, other: 404 }),
      check: (a) => expect(a.body.values.hemRound).toEqual({ text: '40', mm: 1016 }),
    },
  },
  'garments/[id]/sheet': {
    GET: {
      request: async () => ({ path: `/api/garments/${await fittedGarment()}/sheet?unit=mm` }),
      expect: signedIn(200, { counter: 403, other: 404 }),
      check: (a) => {
        expect(a.headers.get('content-type')).toBe('application/pdf');
        expect(String(a.body).startsWith('%PDF-')).toBe(true);
      },
    },
  },
  'queue/sheets': {
    GET: {
      request: () => ({ path: '/api/queue/sheets?step=open&who=all&due=all' }),
      // The other shop's queue is empty: nothing to print (422), never shop A's garments.
      expect: signedIn(200, { counter: 403, other: 422 }),
      check: (a) => {
        expect(a.headers.get('content-type')).toBe('application/pdf');
        expect(Number(a.headers.get('x-sheets'))).toBeGreaterThan(0);
      },
    },
  },
  'bench-settings': {
    GET: {
      request: () => ({ path: '/api/bench-settings' }),
      expect: signedIn(200),
      check: (a) => expect(['in8', 'in16', 'cm', 'mm']).toContain(a.body.scale),
    },
    PUT: {
      // The demo shop keeps its defaults: the browser stories run on the same server.
      request: () => ({ path: '/api/bench-settings', body: { scale: 'in8', stepLabels: {} } }),
      expect: signedIn(403, { lead: 200, other: 200 }),
      check: (a) => expect(a.body.scale).toBe('in8'),
    },
  },
  assignees: {
    GET: {
      request: () => ({ path: '/api/assignees' }),
      expect: signedIn(200),
      check: (a, actor) => expect(a.body.length).toBeGreaterThanOrEqual(actor === 'other' ? 1 : 4),
    },
  },
  // The counter: prices, price lines, payments, notices, claim slip, pickup (money work needs pickup).
  prices: {
    GET: {
      request: () => ({ path: '/api/prices' }),
      expect: signedIn(200, { apprentice: 403 }),
      check: (a, actor) => {
        // Six trouser lines, the skirt's hem and the sleeves.
        expect(a.body.items.map((i: { key: string }) => i.key)).toEqual([
          'plain-hem',
          'cuff-from-hem',
          'cuff-remake',
          'original-hem',
          'skirt-hem',
          'sleeves-shorten',
          'taper-let-out',
          'rush',
        ]);
        if (actor === 'other') expect(a.body.items.every((i: { amountMinor: number }) => i.amountMinor === 0)).toBe(true);
        else expect(a.body.items.find((i: { key: string }) => i.key === 'cuff-from-hem').amountMinor).toBe(2400);
      },
    },
    PUT: {
      request: () => ({ path: '/api/prices', body: PRICE_LIST }),
      expect: signedIn(403, { lead: 200, other: 200 }),
      check: (a) => expect(a.body.hours).toBe(PRICE_LIST.hours),
    },
  },
  'prices/kinds': {
    POST: {
      // Retired by the cleanup after the matrix: the demo list stays as the stories expect it.
      request: () => ({ path: '/api/prices/kinds', body: { name: `Matrix new kind ${freshEmail('k')}`, amountMinor: 1250, rushApplies: false } }),
      expect: signedIn(403, { lead: 201, other: 201 }),
      check: (a) => expect([a.body.amountMinor, a.body.rushApplies, a.body.retiredAt]).toEqual([1250, false, null]),
    },
  },
  'prices/kinds/[id]': {
    PATCH: {
      request: async () => ({ path: `/api/prices/kinds/${await freshKind()}`, body: { amountMinor: 1700 } }),
      expect: signedIn(403, { lead: 200, other: 404 }),
      check: (a) => expect([a.body.amountMinor, typeof a.body.retiredAt]).toEqual([1700, 'string']),
    },
  },
  'prices/history': {
    GET: {
      request: () => ({ path: '/api/prices/history' }),
      expect: signedIn(403, { lead: 200, other: 200 }),
      check: (a, actor) => {
        expect(Array.isArray(a.body)).toBe(true);
        // The other shop's lead changed nothing on shop A's list: none of its kinds in their history.
        if (actor === 'other') expect(a.body.every((h: { line: string }) => !h.line.startsWith('Matrix kind'))).toBe(true);
      },
    },
  },
  'tickets/[id]/price-lines': {
    GET: {
      request: async () => ({ path: `/api/tickets/${await pricedTicket()}/price-lines` }),
      expect: signedIn(200, { apprentice: 403, other: 404 }),
      check: (a) => expect(a.body.map((l: { amountMinor: number }) => l.amountMinor)).toEqual([2400]),
    },
    POST: {
      request: async () => ({
        path: `/api/tickets/${await pricedTicket()}/price-lines`,
        body: { source: 'adjust', label: 'Matrix', amountMinor: -100, reason: 'matrix check' },
      }),
      expect: signedIn(403, { lead: 201, counter: 201, other: 404 }),
      check: (a) => expect([a.body.amountMinor, a.body.reason]).toEqual([-100, 'matrix check']),
    },
  },
  'tickets/[id]/price-lines/[lineId]/void': {
    POST: {
      request: async () => ({ path: await lineToVoid(), body: { reason: 'matrix: wrong line' } }),
      expect: signedIn(403, { lead: 200, counter: 200, other: 404 }),
      check: (a) => expect([a.body.voidReason, typeof a.body.voidedAt]).toEqual(['matrix: wrong line', 'string']),
    },
  },
  'tickets/[id]/refunds': {
    POST: {
      request: async () => ({ path: `/api/tickets/${await creditTicket()}/refunds`, body: { method: 'cash', amountMinor: 100 } }),
      expect: signedIn(403, { lead: 201, counter: 201, other: 404 }),
      check: (a) => expect([a.body.credit, a.body.refunded, a.body.refunds[0].method]).toEqual([0, 100, 'cash']),
    },
  },
  'tickets/[id]/price-lines/auto': {
    POST: {
      request: async () => ({ path: `/api/tickets/${await freshTicket()}/price-lines/auto`, body: { rush: false } }),
      expect: signedIn(403, { lead: 200, counter: 200, other: 404 }),
      // The fixture's garment has no fitting yet: nothing to price, and it says which.
      check: (a) => expect([a.body.lines, a.body.unpriced.length]).toEqual([[], 1]),
    },
  },
  'tickets/[id]/payments': {
    GET: {
      request: async () => ({ path: `/api/tickets/${await pricedTicket()}/payments` }),
      expect: signedIn(200, { apprentice: 403, other: 404 }),
      check: (a) => expect([a.body.total, a.body.paid, a.body.due, a.body.currency]).toEqual([2400, 0, 2400, 'EUR']),
    },
    POST: {
      request: async () => ({ path: `/api/tickets/${await pricedTicket()}/payments`, body: { method: 'cash', amountMinor: 1000 } }),
      expect: signedIn(403, { lead: 201, counter: 201, other: 404 }),
      check: (a) => expect([a.body.paid, a.body.due]).toEqual([1000, 1400]),
    },
  },
  'tickets/[id]/payments/link': {
    POST: {
      request: async () => ({ path: `/api/tickets/${await pricedTicket()}/payments/link` }),
      expect: signedIn(403, { lead: 201, counter: 201, other: 404 }),
      check: (a) =>
        expect(a.body.link).toMatchObject({ amountMinor: 2400, status: 'open', url: expect.stringMatching(/^http:\/\/127\.0\.0\.1:\d+\/pay\/cs_test_/) }),
    },
  },
  'tickets/[id]/payments/[paymentId]/receipt': {
    GET: {
      request: async () => ({ path: await receiptPath() }),
      expect: signedIn(200, { apprentice: 403, other: 404 }),
      check: (a) => expect(String(a.body).startsWith('%PDF-')).toBe(true),
    },
    POST: {
      // The fixture's ticket has no customer, so no address to e-mail: those allowed get 422.
      request: async () => ({ path: await receiptPath() }),
      expect: signedIn(403, { lead: 422, counter: 422, other: 404 }),
    },
  },
  'tickets/[id]/notices': {
    GET: {
      request: async () => ({ path: `/api/tickets/${await pricedTicket()}/notices` }),
      expect: signedIn(200, { apprentice: 403, other: 404 }),
      check: (a) => expect(a.body).toEqual([]),
    },
    POST: {
      request: async () => ({ path: `/api/tickets/${await readyTicket()}/notices`, body: { kind: 'ready' } }),
      expect: signedIn(403, { lead: 201, counter: 201, other: 404 }),
      check: (a) => expect([a.body.kind, a.body.status]).toEqual(['ready', 'sent']),
    },
  },
  'tickets/[id]/notices/[noticeId]/retry': {
    POST: {
      // A sent notice is not sent twice: those allowed to retry get 409.
      request: async () => ({ path: await sentNotice() }),
      expect: signedIn(403, { lead: 409, counter: 409, other: 404 }),
    },
  },
  'tickets/[id]/claim-slip': {
    GET: {
      request: async () => ({ path: `/api/tickets/${await pricedTicket()}/claim-slip` }),
      expect: signedIn(200, { apprentice: 403, other: 404 }),
      check: (a) => expect(String(a.body).startsWith('%PDF-')).toBe(true),
    },
  },
  'tickets/[id]/pickup': {
    POST: {
      // Ready, marked "no charge" with a reason: nothing due, so those allowed hand it over.
      request: async () => {
        const id = await readyTicket();
        const free = await call('POST', `/api/tickets/${id}/price-lines`, {
          cookie: cookies.lead,
          body: { source: 'no-charge', reason: 'matrix: nothing to charge' },
        });
        expect(free.status).toBe(201);
        return { path: `/api/tickets/${id}/pickup` };
      },
      expect: signedIn(403, { lead: 200, counter: 200, other: 404 }),
      check: (a) => expect(a.body.ticket.status).toBe('collected'),
    },
  },
  'payments/webhook': {
    POST: {
      // Public by design (the payment service calls it): without a valid signature, refused for all.
      request: () => ({ path: '/api/payments/webhook', body: { id: 'evt_forged', type: 'checkout.session.completed' } }),
      expect: all(400),
    },
  },
  'sms/status': {
    POST: {
      // Public by design (the SMS service calls it): without the service's signature, refused for all.
      request: () => ({ path: '/api/sms/status?notice=00000000-0000-4000-8000-000000000000', body: { MessageSid: 'SM_forged', MessageStatus: 'delivered' } }),
      expect: all(403),
    },
  },
  overview: {
    GET: {
      request: () => ({ path: '/api/overview?period=4w' }),
      expect: signedIn(403, { lead: 200, other: 200 }),
      check: (a, actor) => {
        expect(a.body.days).toHaveLength(28);
        const takenIn = a.body.days.reduce((s: number, d: { takenIn: number }) => s + d.takenIn, 0);
        // The demo shop's seeded weeks; the other shop's figures are its own (a new shop's, empty).
        if (actor === 'lead') expect(a.body.takings.length).toBeGreaterThan(0);
        if (actor === 'other') expect([takenIn, a.body.takings]).toEqual([0, []]);
      },
    },
  },
  'overview.csv': {
    GET: {
      request: () => ({ path: '/api/overview.csv?period=week' }),
      expect: signedIn(403, { lead: 200, other: 200 }),
      check: (a) => {
        expect(a.headers.get('content-type')).toBe('text/csv; charset=utf-8');
        expect(String(a.body).split('\r\n')[0]).toMatch(/^date,taken_in,handed_over,/);
      },
    },
  },
  'shop-time-zone': {
    GET: {
      request: () => ({ path: '/api/shop-time-zone' }),
      expect: signedIn(200),
      check: (a) => expect(typeof a.body.timeZone).toBe('string'),
    },
    PUT: {
      // The demo shop keeps the default zone: the browser stories run on the same server.
      request: () => ({ path: '/api/shop-time-zone', body: { timeZone: 'Europe/London' } }),
      expect: signedIn(403, { lead: 200, other: 200 }),
      check: (a) => expect(a.body).toEqual({ timeZone: 'Europe/London', chosen: true }),
    },
  },
  'sent-messages': {
    GET: {
      request: () => ({ path: '/api/sent-messages' }),
      expect: signedIn(403, { lead: 200, other: 200 }),
      check: (a, actor) => {
        if (actor === 'lead') expect(a.body.length).toBeGreaterThan(0);
        // The other shop lists only what it sent itself (its own invitations in other rows).
        if (actor === 'other') for (const m of a.body) expect(m.subject).toContain('Other Shop Alterations');
      },
    },
  },
  presets: {
    GET: {
      request: () => ({ path: '/api/presets' }),
      expect: signedIn(200, { counter: 403 }),
      check: (a, actor) => {
        // The demo shop's house default (demo seed); the other shop starts with none.
        if (actor === 'other') expect(a.body.filter((p: { house: boolean }) => p.house)).toEqual([]);
        else expect(a.body[0]).toMatchObject({ name: 'Classic cuff', house: true, isDefault: true });
      },
    },
    POST: {
      // A house preset: the lead's alone (a tailor's own presets are in presets.spec.ts).
      request: () => ({
        path: '/api/presets',
        body: { name: freshEmail('matrix'), scope: 'house', settings: { finish: 'cuff', unit: 'mm', cuffDepth: '40' } },
      }),
      expect: signedIn(403, { lead: 201, other: 201 }),
      check: (a) => expect(a.body).toMatchObject({ house: true, settings: { cuffDepth: '40', unit: 'mm' } }),
    },
  },
  'presets/[id]': {
    PATCH: {
      request: async () => ({ path: `/api/presets/${await freshHousePreset()}`, body: { name: freshEmail('renamed') } }),
      expect: signedIn(403, { lead: 200, other: 404 }),
      check: (a) => expect(a.body.name).toMatch(/^renamed-/),
    },
    DELETE: {
      request: async () => ({ path: `/api/presets/${await freshHousePreset()}` }),
      expect: signedIn(403, { lead: 200, other: 404 }),
      check: (a) => expect(a.body.deleted).toBe(true),
    },
  },
  'presets/[id]/history': {
    GET: {
      // Everyone who reads presets reads a house preset's history; another shop's is 404.
      request: async () => ({ path: `/api/presets/${await freshHousePreset()}/history` }),
      expect: signedIn(200, { counter: 403, other: 404 }),
      check: (a) => expect(a.body.map((h: { field: string }) => h.field)).toEqual(['created']),
    },
  },
  'garments/[id]/photos': {
    GET: {
      request: async () => ({ path: `/api/garments/${await garmentOfA()}/photos` }),
      expect: signedIn(200, { other: 404 }),
      check: (a) => expect(a.body.maxBytes).toBe(10 * 1024 * 1024),
    },
    POST: {
      // Multipart only: a JSON body is refused with 400 once the caller may upload to this garment
      // (real uploads are in photos.spec.ts).
      request: async () => ({ path: `/api/garments/${await garmentOfA()}/photos`, body: { photos: [] } }),
      expect: signedIn(400, { apprentice: 403, counter: 403, other: 404 }),
    },
  },
  'photos/[id]': {
    GET: {
      request: async () => ({ path: `/api/photos/${await freshPhoto()}` }),
      expect: signedIn(200, { other: 404 }),
    },
    DELETE: {
      request: async () => ({ path: `/api/photos/${await freshPhoto()}` }),
      expect: signedIn(200, { apprentice: 403, counter: 403, other: 404 }),
      check: (a) => expect(a.body.deleted).toBe(true),
    },
  },
  'photos/[id]/thumb': {
    GET: {
      request: async () => ({ path: `/api/photos/${await freshPhoto()}/thumb` }),
      expect: signedIn(200, { other: 404 }),
    },
  },
};

beforeAll(async () => {
  for (const role of ['lead', 'tailor', 'apprentice', 'counter'] as const) cookies[role] = await signIn(DEMO[role]);
  cookies.signedOut = undefined;
  const b = await newShop('Other Shop Alterations');
  cookies.other = b.cookie;
  shopB = b.shopId;
  shopA = (await call('GET', '/api/me', { cookie: cookies.lead })).body.shop.id;
  const customers = (await call('GET', '/api/customers', { cookie: cookies.lead })).body as { id: string }[];
  const tickets = (await call('GET', '/api/tickets', { cookie: cookies.lead })).body as { id: string }[];
  const garments = (await call('GET', '/api/garments', { cookie: cookies.lead })).body as { id: string }[];
  const staff = (await call('GET', '/api/staff', { cookie: cookies.lead })).body as { members: { id: string; userId: string; email: string; role: string }[] };
  aCustomerId = customers[0]!.id;
  apprenticeUserId = staff.members.find((m) => m.role === 'apprentice')!.userId;
  markersOfA.push(
    shopA,
    ...customers.map((c) => c.id),
    ...tickets.map((t) => t.id),
    ...garments.map((g) => g.id),
    ...staff.members.flatMap((m) => [m.id, m.userId, m.email]),
  );
  markersOfB.push(shopB, b.email);
  // Something in the lead's sent messages: an invitation mail from shop A.
  await freshInvitation();
});

afterAll(async () => {
  // The kinds the matrix added to the demo shop leave its list (retired, as the lead would).
  const list = await call('GET', '/api/prices', { cookie: cookies.lead });
  for (const k of list.body.kinds as { id: string; name: string; retiredAt: string | null }[]) {
    if (k.name.startsWith('Matrix') && !k.retiredAt) await call('PATCH', `/api/prices/kinds/${k.id}`, { cookie: cookies.lead, body: { retired: true } });
  }
});

describe('role × route matrix', () => {
  it('lists every route file under src/pages/api, with every method it exports', () => {
    const files = routeFiles();
    const keys = files.map(routeKey).sort();
    expect(keys).toEqual(Object.keys(MATRIX).sort());
    for (const file of files) {
      const entry = MATRIX[routeKey(file)]!;
      if (typeof entry === 'string') continue;
      expect(exportedMethods(file), routeKey(file)).toEqual(Object.keys(entry).sort());
    }
  });

  for (const [route, entry] of Object.entries(MATRIX)) {
    if (typeof entry === 'string') continue;
    for (const [method, c] of Object.entries(entry) as [Method, Case][]) {
      for (const actor of ACTORS) {
        it(`${method} /api/${route} as ${actor} → ${c.expect[actor]}`, async () => {
          const req = await c.request(actor);
          const answer = await call(method, req.path, { cookie: cookies[actor], body: req.body });
          expect(answer.status, JSON.stringify(answer.body)).toBe(c.expect[actor]);
          const text = JSON.stringify(answer.body);
          const foreign = actor === 'signedOut' ? [...markersOfA, ...markersOfB] : actor === 'other' ? markersOfA : markersOfB;
          for (const marker of foreign) expect(text.includes(marker), `${marker} leaked`).toBe(false);
          if (answer.status < 300) c.check?.(answer, actor);
          else expect(typeof answer.body.error).toBe('string');
        });
      }
    }
  }

  const publicRoutes = Object.entries(MATRIX).filter(([, e]) => typeof e === 'string' && e.startsWith('public:'));
  for (const [route] of publicRoutes) {
    it(`POST /api/${route} stays public: a signed-out caller is not turned away`, async () => {
      const answer = await call('POST', `/api/${route}`, { body: {} });
      expect([401, 403, 302]).not.toContain(answer.status);
      expect(answer.status).toBeLessThan(500);
    });
  }

  // better-auth's organization plugin answers under /api/auth/organization/*. The app manages
  // staff through its own routes (lead-only /api/staff); better-auth's would give any member the
  // staff list with e-mails, or let them act on the shop. Closed to every caller over HTTP.
  const ORG_ENDPOINTS: [Method, string, unknown?][] = [
    ['GET', 'get-full-organization'],
    ['GET', 'list-members'],
    ['GET', 'list-invitations'],
    ['GET', 'list'],
    ['GET', 'get-active-member'],
    ['GET', 'get-active-member-role'],
    ['GET', 'list-user-invitations'],
    ['GET', 'get-invitation?id=x'],
    ['POST', 'set-active', { organizationId: null }],
    ['POST', 'has-permission', { permissions: { staff: ['read'] } }],
    ['POST', 'check-slug', { slug: 'pinmark-hem' }],
    ['POST', 'invite-member', { email: 'matrix-org@example.com', role: 'lead' }],
    ['POST', 'update-member-role', { memberId: 'x', role: 'lead' }],
    ['POST', 'remove-member', { memberIdOrEmail: DEMO.counter }],
    ['POST', 'cancel-invitation', { invitationId: 'x' }],
    ['POST', 'accept-invitation', { invitationId: 'x' }],
    ['POST', 'reject-invitation', { invitationId: 'x' }],
    ['POST', 'leave', { organizationId: 'x' }],
    ['POST', 'update', { data: { name: 'Renamed by matrix' } }],
    ['POST', 'delete', { organizationId: 'x' }],
    ['POST', 'create', { name: 'Matrix Org', slug: 'matrix-org' }],
  ];
  for (const [method, endpoint, body] of ORG_ENDPOINTS) {
    for (const actor of ACTORS) {
      it(`${method} /api/auth/organization/${endpoint} as ${actor} → 404`, async () => {
        const answer = await call(method, `/api/auth/organization/${endpoint}`, { cookie: cookies[actor], body });
        expect(answer.status, JSON.stringify(answer.body)).toBe(404);
        const text = JSON.stringify(answer.body);
        for (const marker of [...markersOfA, ...markersOfB]) expect(text.includes(marker), `${marker} leaked`).toBe(false);
        expect(typeof answer.body.error).toBe('string');
      });
    }
  }

  it("better-auth's organization endpoints change nothing: shop A keeps its name, members and roles", async () => {
    const me = await call('GET', '/api/me', { cookie: cookies.lead });
    expect(me.body.shop.id).toBe(shopA);
    expect(me.body.shop.name).not.toBe('Renamed by matrix');
    const staff = await call('GET', '/api/staff', { cookie: cookies.lead });
    expect(staff.body.members.find((m: { email: string }) => m.email === DEMO.counter)?.role).toBe('counter');
  });

  it('better-auth /api/auth/* knows each caller: no session signed out, the right person signed in', async () => {
    expect((await call('GET', '/api/auth/get-session')).body).toBeNull();
    for (const role of ['lead', 'tailor', 'apprentice', 'counter'] as const) {
      const answer = await call('GET', '/api/auth/get-session', { cookie: cookies[role] });
      expect(answer.body.user.email).toBe(DEMO[role]);
    }
  });
});
