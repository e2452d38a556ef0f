// The one status policy (issue 13), table-driven over every operation of /api/openapi.json (which
// open-api.spec.ts proves names every route file): a body that is not JSON → 400 { error }, a
// body or query the schema refuses → 422 { error, issues }, no session → 401, a role without the
// permission → 403; never a 500, and every refusal in the one shape.
import { describe, expect, it, inject } from 'vitest';
import { can, type Permission } from '@/lib/shared/roles';
import { call, DEMO, signIn } from './client';

type Role = keyof typeof DEMO;
const ROLES: Role[] = ['apprentice', 'counter', 'tailor', 'lead'];

interface Operation {
  'x-permission': 'public' | string[];
  parameters: { name: string; in: 'path' | 'query'; schema: { enum?: unknown[] } }[];
  requestBody?: { content: Record<string, { schema: Record<string, unknown> }> };
}
type Doc = { paths: Record<string, Record<string, Operation>> };

const doc = (await call('GET', '/api/openapi.json')).body as Doc;
const operations = Object.entries(doc.paths).flatMap(([path, methods]) =>
  Object.entries(methods).map(([method, op]) => ({ path, method: method.toUpperCase(), op })),
);

const permissionsOf = (op: Operation) => (op['x-permission'] === 'public' ? [] : op['x-permission'].map((s) => s.split('.') as unknown as Permission));
/** A role let in (granted one of the permissions: the route narrows later), or null signed out. */
const admitted = (op: Operation): Role | null => (op['x-permission'] === 'public' ? null : ROLES.find((r) => permissionsOf(op).some((p) => can(r, p)))!);
/** A demo role granted none of the permissions, when there is one. */
const refused = (op: Operation): Role | undefined =>
  op['x-permission'] === 'public' ? undefined : ROLES.find((r) => permissionsOf(op).every((p) => !can(r, p)));

// Ids that name nothing: the checks above all come before any row is looked up.
const NOBODY = '00000000-0000-4000-8000-000000000000';
const address = (path: string, query = '') => path.replace(/\{all\}/, 'get-session').replace(/\{[^}]+\}/g, NOBODY) + query;

const cookies = new Map<Role, string>();
async function cookieOf(role: Role | null): Promise<string | undefined> {
  if (!role) return undefined;
  if (!cookies.has(role)) cookies.set(role, await signIn(DEMO[role]));
  return cookies.get(role);
}

/** Sends raw text as a JSON body (the client helper would encode it). */
async function sendRaw(method: string, path: string, text: string, cookie?: string): Promise<{ status: number; body: any }> {
  const base = inject('baseURL');
  const headers: Record<string, string> = { origin: base, 'content-type': 'application/json' };
  if (cookie) headers.cookie = cookie;
  const res = await fetch(base + path, { method, headers, body: text });
  const body = await res.text();
  return { status: res.status, body: body ? JSON.parse(body) : null };
}

function oneShape(body: any, withIssues: boolean, what: string) {
  expect(typeof body?.error, what).toBe('string');
  expect(body.error.length, what).toBeGreaterThan(5);
  if (withIssues) {
    expect(typeof body.issues, what).toBe('object');
    for (const m of Object.values(body.issues)) expect(typeof m, what).toBe('string');
  }
}

describe('one status policy, one error shape', () => {
  it('reads a document with the routes in it', () => expect(operations.length).toBeGreaterThan(60));

  for (const { path, method, op } of operations) {
    const label = `${method} ${path}`;
    const isPublic = op['x-permission'] === 'public';
    const json = op.requestBody?.content['application/json'];
    const hasSchema = Boolean(json && Object.keys(json.schema).length);
    const enums = op.parameters.filter((p) => p.in === 'query' && p.schema.enum);

    if (!isPublic) {
      it(`${label}: no session → 401 { error }`, async () => {
        const r = await call(method, address(path), { body: hasSchema ? {} : undefined });
        expect(r.status, label).toBe(401);
        oneShape(r.body, false, label);
      });
    }
    const outsider = refused(op);
    if (outsider) {
      it(`${label}: ${outsider} (without ${(op['x-permission'] as string[]).join(' or ')}) → 403 { error }`, async () => {
        const r = await call(method, address(path), { cookie: await cookieOf(outsider), body: hasSchema ? {} : undefined });
        expect(r.status, label).toBe(403);
        oneShape(r.body, false, label);
      });
    }
    if (hasSchema) {
      it(`${label}: a body that is not JSON → 400 { error }`, async () => {
        const r = await sendRaw(method, address(path), '{"not json', await cookieOf(admitted(op)));
        expect(r.status, label).toBe(400);
        oneShape(r.body, false, label);
        expect(r.body.issues, label).toBeUndefined();
      });
      it(`${label}: a body the schema refuses → 422 { error, issues }`, async () => {
        const r = await sendRaw(method, address(path), '42', await cookieOf(admitted(op)));
        expect(r.status, label).toBe(422);
        oneShape(r.body, true, label);
      });
    }
    for (const p of enums) {
      it(`${label}: ?${p.name}= a value it does not know → 422 naming ${p.name}`, async () => {
        const r = await call(method, address(path, `?${p.name}=not-one-of-them`), { cookie: await cookieOf(admitted(op)) });
        expect(r.status, label).toBe(422);
        oneShape(r.body, true, label);
        expect(Object.keys(r.body.issues), label).toContain(p.name);
      });
    }
  }
});
