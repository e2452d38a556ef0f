// The API document (issue 17): /api/openapi.json is valid OpenAPI 3.1, names every route file
// under src/pages/api with every method it exports, and every example in it, sent as it is by a
// member of the demo shop whose role has the route's permission (signed out for a public route),
// is accepted (2xx), and its answer is what the document declares for that status: its media type,
// and a JSON body that zod parses with the declared schema (response-check.ts). Ids in a path come
// from fresh rows of the demo shop (api-fixtures.ts).
import { readdirSync, readFileSync } from 'node:fs';
import { join, relative, sep } from 'node:path';
import { Validator } from '@seriousme/openapi-schema-validator';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { can, type Permission } from '@/lib/shared/roles';
import { fixtures } from './api-fixtures';
import { call, DEMO, signIn } from './client';
import { answerProblems, type DocumentedResponses } from './response-check';

const API_DIR = join(process.cwd(), 'src', 'pages', 'api');
type Role = keyof typeof DEMO;
// Least granted first: an example is sent by the first role allowed to send it.
const ROLES: Role[] = ['apprentice', 'counter', 'tailor', 'lead'];

interface Example {
  summary: string;
  params?: Record<string, string>;
  query?: Record<string, string>;
  body?: unknown;
}
interface Operation {
  summary: string;
  'x-permission': 'public' | string[];
  'x-examples': Example[];
  requestBody?: { content: Record<string, { schema: Record<string, unknown>; examples?: Record<string, { value: unknown }> }> };
  responses: DocumentedResponses;
}
type Doc = { openapi: string; paths: Record<string, Record<string, Operation>> };

// Operations sent without an example of their own would not be accepted as they are: said why.
const NOT_SENT: Record<string, string> = {
  'POST /api/payments/webhook': 'accepts only a body signed with the webhook secret (payments.spec.ts signs one)',
  'POST /api/sms/status': "accepts only a report signed with the SMS service's token (sms.spec.ts signs one)",
  'POST /api/garments/{id}/photos': 'a multipart upload of picture files (photos.spec.ts uploads them)',
  'POST /api/tickets/{id}/notices/{noticeId}/retry': 'retries only a notice whose delivery failed (notices are covered in mail.spec.ts)',
  'POST /api/auth/{all}': "better-auth's endpoints, each with its own body (sign-in is used by every HTTP test)",
};

function routeFiles(dir = API_DIR): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? routeFiles(join(dir, e.name)) : /\.(ts|js|mjs)$/.test(e.name) ? [join(dir, e.name)] : [],
  );
}

/** The address of a route file, written out here rather than taken from the app's own helper. */
function pathOf(file: string): string {
  const key = relative(API_DIR, file)
    .split(sep)
    .join('/')
    .replace(/\.(ts|js|mjs)$/, '')
    .replace(/(^|\/)index$/, '');
  return `/api/${key}`.replace(/\[(?:\.\.\.)?([^\]]+)\]/g, '{$1}');
}

function exportedMethods(file: string): string[] {
  const src = readFileSync(file, 'utf8');
  const found = [...src.matchAll(/export\s+(?:const|async\s+function|function)\s+(GET|POST|PUT|PATCH|DELETE|ALL)\b/g)].map((m) => m[1]!);
  return [...new Set(found.flatMap((m) => (m === 'ALL' ? ['get', 'post'] : [m.toLowerCase()])))].sort();
}

/** The first role granted every permission the operation names (null: public, sent signed out). */
export function roleFor(op: Operation): Role | null {
  const p = op['x-permission'];
  if (p === 'public') return null;
  const perms = p.map((s) => s.split('.') as unknown as Permission);
  const role = ROLES.find((r) => perms.every((perm) => can(r, perm)));
  if (!role) throw new Error(`no demo role has ${p.join(' and ')}`);
  return role;
}

const doc = (await call('GET', '/api/openapi.json')).body as Doc;
const operations = Object.entries(doc.paths).flatMap(([path, methods]) =>
  Object.entries(methods).map(([method, op]) => ({ path, method, op, key: `${method.toUpperCase()} ${path}` })),
);

const cookies = {} as Record<Role, string>;
let make: ReturnType<typeof fixtures>;
let saved: { bench: unknown; timeZone: unknown; prices: Record<string, unknown> } | undefined;

beforeAll(async () => {
  for (const role of ROLES) cookies[role] = await signIn(DEMO[role]);
  make = fixtures(cookies.lead);
  // Some examples change the demo shop's settings: put back afterwards for the other test files.
  const prices = (await call('GET', '/api/prices', { cookie: cookies.lead })).body;
  saved = {
    bench: (await call('GET', '/api/bench-settings', { cookie: cookies.lead })).body,
    timeZone: (await call('GET', '/api/shop-time-zone', { cookie: cookies.lead })).body,
    prices: { currency: prices.currency, hours: prices.hours, location: prices.location, autoReadyNotice: prices.autoReadyNotice, items: prices.items },
  };
});

afterAll(async () => {
  if (!saved) return;
  const cookie = cookies.lead;
  await call('PUT', '/api/prices', { cookie, body: saved.prices });
  await call('PUT', '/api/bench-settings', { cookie, body: saved.bench });
  const zone = saved.timeZone as { timeZone: string; chosen: boolean };
  if (zone.chosen) await call('PUT', '/api/shop-time-zone', { cookie, body: { timeZone: zone.timeZone } });
});

describe('the API document (/api/openapi.json)', () => {
  it('is valid OpenAPI 3.1 (@seriousme/openapi-schema-validator)', async () => {
    expect(doc.openapi).toBe('3.1.0');
    const result = await new Validator().validate(doc as never);
    expect(result.errors ?? [], JSON.stringify(result.errors)).toEqual([]);
    expect(result.valid).toBe(true);
  });

  it('names every route file under src/pages/api with every method it exports', () => {
    const files = routeFiles();
    expect(files.length).toBeGreaterThan(40);
    for (const file of files) {
      const path = pathOf(file);
      expect(doc.paths[path], `${relative(API_DIR, file)} is not in the document (declare it with route())`).toBeDefined();
      expect(Object.keys(doc.paths[path]!).sort(), path).toEqual(exportedMethods(file));
    }
    expect(Object.keys(doc.paths).sort()).toEqual(files.map(pathOf).sort());
  });

  it('gives every operation a summary and its permission, and every JSON body an example', () => {
    for (const { key, op } of operations) {
      expect(op.summary.length, key).toBeGreaterThan(10);
      expect(op['x-permission'], key).toBeDefined();
      const json = op.requestBody?.content['application/json'];
      if (json && Object.keys(json.schema).length && !(key in NOT_SENT)) expect(op['x-examples'].length, `${key} has a body but no example`).toBeGreaterThan(0);
      // The examples in the standard place are the same requests as x-examples.
      for (const e of Object.values(json?.examples ?? {}))
        expect(
          op['x-examples'].map((x) => x.body),
          key,
        ).toContainEqual(e.value);
    }
  });

  it('shows the declared answers on the reference page (/api-reference)', async () => {
    const page = await call('GET', '/api-reference');
    expect(page.status).toBe(200);
    const html = String(page.body);
    // The ticket list declares its items: their fields are on the page, from the same schema.
    expect(html).toContain('Answer 200:');
    expect(html).toContain('garmentCount');
    expect(html).toContain('Answer 201:');
  });

  it('lists for NOT_SENT only operations it has', () => {
    for (const key of Object.keys(NOT_SENT)) expect(operations.map((o) => o.key)).toContain(key);
  });

  for (const { path, key, op } of operations) {
    if (key in NOT_SENT) continue;
    const examples: Example[] = op['x-examples'].length ? op['x-examples'] : [{ summary: 'as it is, without a body' }];
    for (const example of examples) {
      it(`${key}: "${example.summary}" is accepted and answers as declared`, async () => {
        const role = roleFor(op);
        await make.before[key]?.();
        const needs = [...path.matchAll(/\{([^}]+)\}/g)].map((m) => m[1]!).filter((n) => !example.params?.[n]);
        const made = needs.length ? await make.byOperation[key]?.() : {};
        expect(made, `${key} needs ${needs.join(', ')}: add a fixture in api-fixtures.ts`).toBeDefined();
        const params = { ...made, ...example.params };
        const query = example.query ? `?${new URLSearchParams(example.query)}` : '';
        const url = path.replace(/\{([^}]+)\}/g, (_, n: string) => encodeURIComponent(params[n]!)) + query;
        const answer = await call(key.split(' ')[0]!, url, { cookie: role ? cookies[role] : undefined, body: example.body });
        expect(answer.status, `${key} as ${role ?? 'signed out'} → ${JSON.stringify(answer.body)?.slice(0, 300)}`).toBeGreaterThanOrEqual(200);
        expect(answer.status, `${key} as ${role ?? 'signed out'} → ${JSON.stringify(answer.body)?.slice(0, 300)}`).toBeLessThan(300);
        expect(
          answerProblems(op.responses, answer.status, answer.headers.get('content-type'), answer.body),
          `${key}: the answer drifted from its declared response`,
        ).toEqual([]);
      });
    }
  }
});
