// Response bodies in the API document (issue 17): every JSON route declares what it answers with
// `responses` (zod), or stands on UNDECLARED below, a list that may only shrink; and the check the
// HTTP test runs on every example's answer (tests/http/response-check.ts) refuses a body that drifted
// from its schema: a field added, a field missing, a wrong type, an undeclared status or media type.
import { rmSync } from 'node:fs';
import { afterAll, describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { openApiDocument } from '@/lib/server/openapi';
import { route } from '@/lib/server/route';
import { asJson } from '@/lib/shared/as-json';
import { answerProblems, declaresAnswer, type DocumentedResponses } from '../http/response-check';

// The route modules open the app's database when loaded: a throwaway folder, not the worktree's data/.
const dir = vi.hoisted(() => require('node:fs').mkdtempSync(require('node:path').join(require('node:os').tmpdir(), 'cw-openapi-')) as string);
vi.mock('astro:env/server', async (importOriginal) => ({ ...(await importOriginal<object>()), DATA_DIR: dir }));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

// JSON routes whose answer is not declared yet. Declare one (`responses` in its route()) and take it
// off this list: the test fails while a listed route declares one, and for an unlisted one that does not.
const UNDECLARED = ['GET /api/auth/{all}', 'POST /api/auth/{all}'];

describe('declared responses', () => {
  it('every JSON route declares its answer, except those on UNDECLARED (a list that only shrinks)', async () => {
    const { apiDocument } = await import('@/pages/_api-catalog');
    const doc = apiDocument();
    const undeclared: string[] = [];
    for (const [path, methods] of Object.entries(doc.paths))
      for (const [method, op] of Object.entries(methods)) {
        const success = Object.entries(op.responses).filter(([s]) => s.startsWith('2'));
        const json = success.some(([, r]) => Boolean((r as { content?: Record<string, unknown> }).content?.['application/json']));
        if (json && !declaresAnswer(op.responses as DocumentedResponses)) undeclared.push(`${method.toUpperCase()} ${path}`);
      }
    expect(undeclared.sort(), 'UNDECLARED must name exactly the JSON routes without `responses` (take a route off once it declares one)').toEqual(
      [...UNDECLARED].sort(),
    );
  }, 60_000);
});

describe('the answer check (tests/http/response-check.ts)', () => {
  const row = z.object({ id: z.uuid(), name: z.string(), createdAt: z.date(), notes: z.string().nullable() });
  const doc = openApiDocument(
    [
      {
        file: 'things/index.ts',
        method: 'POST',
        spec: { summary: 'Adds a thing.', permission: ['tickets', 'create'], status: 201, responses: { 201: asJson(row) } },
      },
    ],
    '0.0.0',
  );
  const responses = doc.paths['/api/things']!.post!.responses as DocumentedResponses;
  const good = { id: '0b3c5f0e-8f7a-4a55-9c1d-2f1e8a6b7c90', name: 'Example', createdAt: '2026-12-04T02:00:00.000Z', notes: null };

  it('puts the JSON Schema of the value as sent in the document: dates as ISO strings, no other fields', () => {
    const schema = (responses['201'] as { content: Record<string, { schema: Record<string, unknown> }> }).content['application/json']!.schema;
    expect(schema).toMatchObject({ type: 'object', required: ['id', 'name', 'createdAt', 'notes'], additionalProperties: false });
    expect(schema.properties).toMatchObject({ createdAt: { type: 'string', format: 'date-time' }, notes: { type: ['string', 'null'] } });
    expect(Object.keys(responses).sort()).toEqual(['201', '401', '403']);
  });

  it('accepts an answer as declared', () => {
    expect(answerProblems(responses, 201, 'application/json; charset=utf-8', good)).toEqual([]);
  });

  it('refuses a field added, a field missing, a wrong type, a date not sent as one', () => {
    expect(answerProblems(responses, 201, 'application/json', { ...good, extra: 1 })).not.toEqual([]);
    const { name: _, ...noName } = good;
    expect(answerProblems(responses, 201, 'application/json', noName).join()).toContain('name');
    expect(answerProblems(responses, 201, 'application/json', { ...good, notes: 3 }).join()).toContain('notes');
    expect(answerProblems(responses, 201, 'application/json', { ...good, createdAt: 'yesterday' }).join()).toContain('createdAt');
  });

  it('refuses a status or a media type the route does not declare', () => {
    expect(answerProblems(responses, 200, 'application/json', good).join()).toContain('status 200');
    expect(answerProblems(responses, 201, 'text/html', good).join()).toContain('text/html');
  });

  it('holds an undeclared JSON route to its media type only', () => {
    const bare = openApiDocument([{ file: 'things/index.ts', method: 'GET', spec: { summary: 'Lists things.', permission: 'public' } }], '0.0.0');
    const r = bare.paths['/api/things']!.get!.responses as DocumentedResponses;
    expect(declaresAnswer(r)).toBe(false);
    expect(answerProblems(r, 200, 'application/json', { anything: true })).toEqual([]);
    expect(answerProblems(r, 200, 'application/pdf', null)).not.toEqual([]);
  });
});

describe('route() holds the handler to its declared answer (checked by astro check)', () => {
  const thing = z.object({ id: z.string(), at: z.iso.datetime() });
  it('compiles a handler whose value is sent as the schema says (a Date goes as its ISO string), or a Response', () => {
    const ok = route({ summary: 'A thing.', permission: 'public', responses: { 200: thing } }, async () => ({ id: 'a', at: new Date() }));
    const raw = route({ summary: 'A thing.', permission: 'public', responses: { 200: thing } }, () => new Response('{}'));
    // A field missing, or of another type: the route file does not compile.
    // @ts-expect-error `at` is missing
    const missing = route({ summary: 'A thing.', permission: 'public', responses: { 200: thing } }, async () => ({ id: 'a' }));
    const typed = { summary: 'A thing.', permission: ['tickets', 'read'], responses: { 200: thing } } as const;
    // @ts-expect-error `id` is a number
    const mistyped = route(typed, ({ actor }) => ({ id: actor.role.length, at: '' }));
    for (const r of [ok, raw, missing, mistyped]) expect(r.spec.responses?.[200]).toBe(thing);
  });
});
