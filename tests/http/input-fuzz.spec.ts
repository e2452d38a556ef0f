// No input breaks a route: a bounded property (fast-check, fixed seed) over every route file under
// src/pages/api, found on disk like role-route-matrix.spec.ts does, so a new route is fuzzed too.
// Each request mixes valid shapes with NUL, lone surrogates, huge strings, wrong types and odd
// encodings, in the body, the path's ids and the query, signed out and as the demo shop's lead.
// Every answer must be 2xx/3xx, or 4xx with a JSON body: never a 5xx.
import { readdirSync, readFileSync } from 'node:fs';
import { join, relative, sep } from 'node:path';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it, inject } from 'vitest';
import { call, DEMO, freshEmail, signIn } from './client';
import { sampleJpeg, upload } from './photo-upload';

const SEED = 20261203;
// Inputs per route file (split over its methods and the two callers); PDF routes render, so fewer.
const RUNS = 80;
const PDF_RUNS = 15;
const PDF_ROUTES = new Set(['garments/[id]/sheet', 'queue/sheets', 'plan/sheet', 'tickets/[id]/claim-slip', 'tickets/[id]/payments/[paymentId]/receipt']);
// better-auth's catch-all holds a dozen endpoints: more inputs.
const AUTH_RUNS = 150;

const API_DIR = join(process.cwd(), 'src', 'pages', 'api');
type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

function routeFiles(dir = API_DIR): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? routeFiles(join(dir, e.name)) : /\.(ts|js|mjs)$/.test(e.name) ? [join(dir, e.name)] : [],
  );
}

/** Route key of a file: its path under src/pages/api without extension or trailing /index. */
function routeKey(file: string): string {
  return relative(API_DIR, file)
    .split(sep)
    .join('/')
    .replace(/\.(ts|js|mjs)$/, '')
    .replace(/(^|\/)index$/, '');
}

function methodsOf(file: string): Method[] {
  const src = readFileSync(file, 'utf8');
  const found = [...src.matchAll(/export\s+(?:const|async\s+function|function)\s+(GET|POST|PUT|PATCH|DELETE|ALL)\b/g)].map((m) => m[1]!);
  // better-auth's catch-all takes whatever comes: its own endpoints are GET and POST.
  return [...new Set(found.flatMap((m) => (m === 'ALL' ? ['GET', 'POST'] : [m])))].sort() as Method[];
}

const ROUTES = routeFiles()
  .map((f) => ({ key: routeKey(f), methods: methodsOf(f) }))
  .filter((r) => r.methods.length > 0)
  .sort((a, b) => a.key.localeCompare(b.key));

// Fixtures made in beforeAll: real ids of the demo shop, so valid shapes reach the services.
const ids: Record<string, string> = {};
let lead = '';

// What makes a request valid-looking for each route, so mutations land past the shape checks.
const SEEDS: Record<string, unknown> = {
  'POST customers': { name: 'Fuzz Customer', phone: '555 0100', email: 'fuzz@example.com', notes: 'n' },
  'PATCH customers/[id]': { name: 'Fuzz Customer', phone: '555 0101', notes: 'x' },
  'PATCH garments/[id]': { description: 'Fuzz trousers', dueOn: '2027-01-02', assigneeId: null },
  'PUT garments/[id]/measurements': {
    unit: 'in',
    legs: {
      left: { finish: 'cuff', backPin: '31', cuffDepth: '1 1/2', available: '5' },
      right: { finish: 'cuff', backPin: '31', cuffDepth: '1 1/2', available: '5' },
    },
  },
  'PUT garments/[id]/kind-fitting': { kind: 'skirt', unit: 'in', fields: { hemRound: '40', flare: 'circle', circleFraction: '1/4', hemDepth: '1' } },
  'POST garments/[id]/step': { to: 'marked' },
  'POST garments/[id]/step-back': { from: 'marked' },
  'POST invitations/[id]/accept': { name: 'Fuzz Invitee', password: 'a-long-password' },
  'POST plan': { kind: 'cuff', unit: 'in', cuffDepth: '1 1/2', hemSection: '1 1/2', turnUnder: '3/8' },
  'POST plan/sheet': { kind: 'hem', unit: 'cm', hemAllowance: '4', turnUnder: '1', pageSize: 'A4' },
  'POST presets': { name: 'Fuzz preset', scope: 'personal', settings: { finish: 'cuff', unit: 'in', cuffDepth: '1 1/2' } },
  'PATCH presets/[id]': { name: 'Fuzz preset 2', settings: { finish: 'hem', unit: 'cm', hemAllowance: '4' } },
  'POST prices/kinds': { name: 'Fuzz kind', amountMinor: 1200, rushApplies: true },
  'PATCH prices/kinds/[id]': { name: 'Fuzz kind renamed', amountMinor: 1300, rushApplies: false, retired: true },
  'PUT prices': { currency: 'USD', hours: 'Mon-Fri', location: '1 Invented Row', autoReadyNotice: false, items: [] },
  'POST shops': { shopName: 'Fuzz Alterations', name: 'Fuzz Lead', email: 'fuzz-lead@example.com', password: 'a-long-password' },
  'PATCH staff/[memberId]': { role: 'counter' },
  'POST staff': { email: 'fuzz-invite@example.com', role: 'counter' },
  'PATCH tickets/[id]': { status: 'marked' },
  'POST tickets/[id]/garments': { description: 'Fuzz second pair', existingFinish: 'cuff' },
  'POST tickets/[id]/notices': { kind: 'ready' },
  'POST sms/status': { MessageSid: 'SM0', MessageStatus: 'delivered' },
  'POST tickets/[id]/payments': { method: 'cash', amountMinor: 100 },
  'POST tickets/[id]/price-lines': { source: 'adjust', label: 'Fuzz', amountMinor: 100, reason: 'fuzzing' },
  'POST tickets/[id]/price-lines/auto': { rush: false },
  'POST tickets/[id]/price-lines/[lineId]/void': { reason: 'fuzzing a void' },
  'POST tickets/[id]/refunds': { method: 'cash', amountMinor: 100, reason: 'fuzzing a refund' },
  'POST tickets': { customer: { name: 'Fuzz Walk-in', phone: '555' }, note: 'fuzz', dueOn: '2027-01-02', garments: [{ description: 'Fuzz trousers' }] },
  'PUT bench-settings': { scale: 'in16', stepLabels: { marked: 'Chalked' } },
  'PUT shop-time-zone': { timeZone: 'Europe/Berlin' },
  'POST auth/[...all]': { email: 'nobody-fuzz@example.com', password: 'not-the-password', name: 'Fuzz', token: 'x', newPassword: 'another-long-one' },
};

// better-auth endpoints to aim at (sign-out and the like end the lead's session: left out).
const AUTH_PATHS = [
  'sign-in/email',
  'get-session',
  'request-password-reset',
  'reset-password',
  'update-user',
  'change-password',
  'organization/set-active',
  'organization/get-full-organization',
  'list-sessions',
  'verify-email',
  'sign-in/social',
  'no/such/endpoint',
];

// Text no route may choke on.
const NASTY_TEXT = [
  '\u0000',
  'pair \u0000 one',
  'pair \ud800',
  '\udc00',
  'x\ud83d',
  '😀',
  '\u202e\u200b',
  '<script>alert(1)</script>',
  "' or 1=1 --",
  '../../etc/passwd',
  '%00',
  '',
  ' ',
  '1 1/2\u0000',
];
const nastyText = fc.oneof(
  fc.constantFrom(...NASTY_TEXT),
  fc.string({ unit: 'binary', maxLength: 40 }),
  fc.constantFrom('x'.repeat(5_000), 'y'.repeat(70_000)),
);
const nastyValue: fc.Arbitrary<unknown> = fc.oneof(
  nastyText,
  fc.constantFrom<unknown>(null, true, false, 0, -1, 1e308, -1e-308, 2 ** 53, [], {}, [null], { '': '' }, JSON.parse('{"__proto__":{"polluted":true}}')),
  fc.integer(),
  fc.double(),
  fc.constant(JSON.parse('['.repeat(500) + ']'.repeat(500)) as unknown),
  fc.jsonValue({ maxDepth: 3 }),
);

/** A body: the route's seed with a field set to something nasty, random JSON, or bytes that are not JSON. */
type Body =
  | { kind: 'none' }
  | { kind: 'json'; value: unknown }
  | { kind: 'raw'; text: string; type: string }
  | { kind: 'form'; name: string; bytes: Uint8Array };

function bodyFor(seedKey: string): fc.Arbitrary<Body> {
  const seed = (SEEDS[seedKey] ?? {}) as Record<string, unknown>;
  const keys = Object.keys(seed);
  const mutated = fc
    .tuple(fc.constantFrom(...(keys.length ? keys : ['x']), 'extra', '__proto__', 'legs'), nastyValue, fc.boolean())
    .map(([k, v, nested]): Body => {
      const copy = structuredClone(seed) as Record<string, unknown>;
      // Nested: the nasty value goes one level down (a leg, a garment, the customer).
      const inner = copy[k];
      if (nested && inner && typeof inner === 'object') {
        const obj = (Array.isArray(inner) ? inner[0] : inner) as Record<string, unknown> | undefined;
        const sub = obj ? Object.keys(obj)[0] : undefined;
        if (obj && sub) obj[sub] = v;
      } else copy[k] = v;
      return { kind: 'json', value: copy };
    });
  return fc.oneof(
    { weight: 5, arbitrary: mutated },
    { weight: 1, arbitrary: fc.constant<Body>({ kind: 'json', value: seed }) },
    { weight: 1, arbitrary: nastyValue.map((value): Body => ({ kind: 'json', value })) },
    {
      weight: 1,
      arbitrary: fc
        .tuple(
          fc.constantFrom('{', '{"a":', '\ufeff{}', 'null', '"\u0000"', '{"name":"a\\u0000b"}', '{"name":"\\ud800"}', 'name=a%00b&email=x', '\u0000', ''),
          fc.constantFrom(
            'application/json',
            'text/plain',
            'application/x-www-form-urlencoded',
            'multipart/form-data; boundary=zz',
            'application/json; charset=latin1',
          ),
        )
        .map(([text, type]): Body => ({ kind: 'raw', text, type })),
    },
    {
      weight: 1,
      arbitrary: fc.tuple(nastyText, fc.uint8Array({ maxLength: 64 })).map(([name, bytes]): Body => ({ kind: 'form', name: name.slice(0, 200), bytes })),
    },
    { weight: 1, arbitrary: fc.constant<Body>({ kind: 'none' }) },
  );
}

/** A path parameter: the real fixture id, or something that cannot be one. */
function paramFor(valid: string | undefined): fc.Arbitrary<string> {
  const bad = fc.oneof(
    fc.constantFrom('a%00b', '%00', 'x'.repeat(3000), '..%2F..%2Fetc', '%F0%9F%98%80', '00000000-0000-0000-0000-000000000000', 'null', '-1', '%20', 'a%0Ab'),
    fc.uuid(),
    fc.string({ minLength: 1, maxLength: 30 }).map(encodeURIComponent),
  );
  return valid ? fc.oneof({ weight: 2, arbitrary: fc.constant(valid) }, { weight: 3, arbitrary: bad }) : bad;
}

const QUERY_KEYS = ['unit', 'precision', 'page', 'step', 'who', 'due', 'search', 'q', 'today', 'token', 'callbackURL', 'x'];
const QUERY_VALUES = [
  'in',
  'cm',
  '8',
  '16',
  'A4',
  'LETTER',
  'open',
  'all',
  'mine',
  'nobody',
  'today',
  '2027-01-02',
  '%00',
  'a%00b',
  '%F0%9F%98%80',
  'x'.repeat(3000),
  '',
  '%25',
  '1e308',
];
const query = fc
  .array(fc.tuple(fc.constantFrom(...QUERY_KEYS), fc.oneof(fc.constantFrom(...QUERY_VALUES), fc.string({ maxLength: 20 }).map(encodeURIComponent))), {
    maxLength: 4,
  })
  .map((pairs) => (pairs.length ? `?${pairs.map(([k, v]) => `${k}=${v}`).join('&')}` : ''));

interface Attempt {
  method: Method;
  path: string;
  body: Body;
  signedIn: boolean;
}

function attempts(key: string, methods: Method[]): fc.Arbitrary<Attempt> {
  const params = [...key.matchAll(/\[(\.\.\.)?([^\]]+)\]/g)];
  const parts = params.map((m) => (m[1] ? fc.constantFrom(...AUTH_PATHS) : paramFor(ids[m[2] === 'id' ? key.split('/')[0]! : m[2]!])));
  return fc.tuple(fc.constantFrom(...methods), fc.tuple(...parts), query, fc.boolean()).chain(([method, values, q, signedIn]) => {
    let i = 0;
    const path = `/api/${key.replace(/\[[^\]]+\]/g, () => values[i++]!)}${method === 'GET' || key.startsWith('auth/') ? q : ''}`;
    const seedKey = `${method} ${key}`;
    const body = method === 'GET' || method === 'DELETE' ? fc.constant<Body>({ kind: 'none' }) : bodyFor(seedKey);
    return body.map((b): Attempt => ({ method, path, body: b, signedIn }));
  });
}

async function send(a: Attempt): Promise<{ status: number; type: string; text: string }> {
  const base = inject('baseURL');
  // Its own client address (the test server trusts one proxy hop): the per-address limits it runs
  // into fall on it alone, not on the test files after it.
  const headers: Record<string, string> = { origin: base, 'x-forwarded-for': '203.0.113.250' };
  if (a.signedIn) headers.cookie = lead;
  let body: BodyInit | undefined;
  if (a.body.kind === 'json') {
    headers['content-type'] = 'application/json';
    body = JSON.stringify(a.body.value) ?? 'null';
  } else if (a.body.kind === 'raw') {
    headers['content-type'] = a.body.type;
    body = a.body.text;
  } else if (a.body.kind === 'form') {
    const form = new FormData();
    form.append('photos', new Blob([a.body.bytes as BlobPart], { type: 'image/jpeg' }), a.body.name || 'x');
    body = form;
  }
  const res = await fetch(base + a.path, { method: a.method, headers, body, redirect: 'manual' });
  return { status: res.status, type: res.headers.get('content-type') ?? '', text: await res.text() };
}

function describeAttempt(a: Attempt): string {
  const b = a.body.kind === 'json' ? JSON.stringify(a.body.value) : a.body.kind === 'raw' ? a.body.text : a.body.kind;
  return `${a.method} ${a.path.slice(0, 200)} ${a.signedIn ? '(lead)' : '(signed out)'} ${String(b).slice(0, 300)}`;
}

// Shop-wide settings a valid fuzzed write may change, put back afterwards for the other test files.
let kindsBefore = new Set<string>();
let saved: { bench: unknown; timeZone: string; prices: Record<string, unknown>; name: string; defaultPreset?: string } | undefined;

beforeAll(async () => {
  lead = await signIn(DEMO.lead);
  const t = await call('POST', '/api/tickets', {
    cookie: lead,
    body: { customer: { name: 'Fuzz Fixture', email: freshEmail('fuzz') }, garments: [{ description: 'Fuzz fixture trousers' }] },
  });
  expect(t.status).toBe(201);
  ids.tickets = t.body.id;
  const ticket = await call('GET', `/api/tickets/${t.body.id}`, { cookie: lead });
  ids.garments = ticket.body.garments[0].id;
  ids.customers = ticket.body.customer.id;
  const preset = await call('POST', '/api/presets', { cookie: lead, body: SEEDS['POST presets'] });
  ids.presets = preset.body.id;
  const invitation = await call('POST', '/api/staff', { cookie: lead, body: { email: freshEmail('fuzz-invitee'), role: 'counter' } });
  ids.invitations = invitation.body.id;
  const photo = await upload(lead, ids.garments!, [{ name: 'fuzz.jpg', bytes: await sampleJpeg(64, 48) }]);
  ids.photos = photo.body[0].id;
  const presets = await call('GET', '/api/presets', { cookie: lead });
  // A kind of work to aim PATCH prices/kinds/[id] at, retired so the stories' intake never offers it.
  const kind = await call('POST', '/api/prices/kinds', { cookie: lead, body: { name: freshEmail('fuzz-kind'), amountMinor: 100, rushApplies: true } });
  ids.prices = kind.body.id;
  await call('PATCH', `/api/prices/kinds/${kind.body.id}`, { cookie: lead, body: { retired: true } });
  const prices = await call('GET', '/api/prices', { cookie: lead });
  kindsBefore = new Set((prices.body.kinds as { id: string }[]).map((k) => k.id));
  saved = {
    bench: (await call('GET', '/api/bench-settings', { cookie: lead })).body,
    timeZone: (await call('GET', '/api/shop-time-zone', { cookie: lead })).body.timeZone,
    prices: prices.body,
    name: (await call('GET', '/api/me', { cookie: lead })).body.name,
    defaultPreset: presets.body.find((p: { house: boolean; isDefault: boolean }) => p.house && p.isDefault)?.id,
  };
  // Valid price lists need every line: the seed is the shop's own list.
  SEEDS['PUT prices'] = {
    currency: prices.body.currency,
    hours: prices.body.hours,
    location: prices.body.location,
    autoReadyNotice: prices.body.autoReadyNotice,
    items: prices.body.items,
  };
});

afterAll(async () => {
  if (!saved) return;
  const cookie = await signIn(DEMO.lead);
  const { currency, hours, location, autoReadyNotice, items } = saved.prices as Record<string, unknown>;
  await call('PUT', '/api/prices', { cookie, body: { currency, hours, location, autoReadyNotice, items } });
  // Kinds of work the fuzzing added leave the list (retired: kinds are never deleted).
  for (const k of (await call('GET', '/api/prices', { cookie })).body.kinds as { id: string; retiredAt: string | null }[]) {
    if ((!kindsBefore.has(k.id) || k.id === ids.prices) && !k.retiredAt) await call('PATCH', `/api/prices/kinds/${k.id}`, { cookie, body: { retired: true } });
  }
  await call('PUT', '/api/bench-settings', { cookie, body: saved.bench });
  await call('PUT', '/api/shop-time-zone', { cookie, body: { timeZone: saved.timeZone } });
  await call('POST', '/api/auth/update-user', { cookie, body: { name: saved.name } });
  if (saved.defaultPreset) await call('PATCH', `/api/presets/${saved.defaultPreset}`, { cookie, body: { isDefault: true } });
});

// Route files run side by side (the server is one process; this keeps its queue full).
describe.concurrent('no input breaks a route (2xx/3xx, or 4xx JSON; never 5xx)', () => {
  it('knows every route file (found on disk)', () => {
    expect(ROUTES.length).toBeGreaterThan(30);
    expect(ROUTES.map((r) => r.key)).toContain('plan');
  });

  for (const { key, methods } of ROUTES) {
    it(`/api/${key} (${methods.join(', ')})`, async () => {
      await fc.assert(
        fc.asyncProperty(attempts(key, methods), async (a) => {
          const r = await send(a);
          const what = `${describeAttempt(a)} → ${r.status} ${r.type} ${r.text.slice(0, 200)}`;
          expect(r.status, what).toBeLessThan(500);
          if (r.status >= 400) {
            expect(r.type, what).toContain('application/json');
            expect(() => JSON.parse(r.text), what).not.toThrow();
          }
        }),
        { seed: SEED, numRuns: key.startsWith('auth/') ? AUTH_RUNS : PDF_ROUTES.has(key) ? PDF_RUNS : RUNS, endOnFailure: true },
      );
      // Room for a loaded machine: a slow answer is not what this property is about.
    }, 240_000);
  }
});
