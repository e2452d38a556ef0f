// The API document from route declarations (src/lib/server/openapi.ts): addresses from file names, the
// body and query as JSON Schema a client sends, and the refusals each route can answer.
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { apiPathOf, openApiDocument } from '@/lib/server/openapi';
import type { RouteSpec } from '@/lib/server/route';

describe('openApiDocument', () => {
  it('turns route files into addresses: index dropped, [id] → {id}, a rest parameter named too', () => {
    expect(apiPathOf('tickets/index.ts')).toBe('/api/tickets');
    expect(apiPathOf('tickets/[id]/payments/[paymentId]/receipt.ts')).toBe('/api/tickets/{id}/payments/{paymentId}/receipt');
    expect(apiPathOf('overview.csv.ts')).toBe('/api/overview.csv');
    expect(apiPathOf('auth/[...all].ts')).toBe('/api/auth/{all}');
  });

  const body = z.object({ name: z.string().min(1), scope: z.enum(['house', 'personal']).default('personal') });
  const spec: RouteSpec = {
    summary: 'Adds a preset.',
    permission: ['presets', 'create-own'],
    body,
    query: z.object({ period: z.enum(['week', '4w']).default('week') }),
    status: 201,
    examples: [{ summary: 'Mine', body: { name: 'Deep cuff' } }],
  };
  const doc = openApiDocument(
    [
      { file: 'presets/index.ts', method: 'POST', spec },
      {
        file: 'auth/[...all].ts',
        method: 'ALL',
        spec: { summary: "better-auth's endpoints.", permission: 'public', examples: [{ summary: 'Session', params: { all: 'get-session' } }] },
      },
    ],
    '9.9.9',
  );

  it('describes the body as the client sends it: a field with a default is not required', () => {
    const op = doc.paths['/api/presets']!.post!;
    const schema = op.requestBody!.content['application/json']!.schema;
    expect(schema).toMatchObject({ type: 'object', required: ['name'], properties: { scope: { enum: ['house', 'personal'], default: 'personal' } } });
    expect(schema.$schema).toBeUndefined();
    expect(op.requestBody!.content['application/json']!.examples).toEqual({ example1: { summary: 'Mine', value: { name: 'Deep cuff' } } });
  });

  it('lists the query fields as parameters and the refusals the route can give', () => {
    const op = doc.paths['/api/presets']!.post!;
    expect(op.parameters).toEqual([{ name: 'period', in: 'query', required: false, schema: { type: 'string', enum: ['week', '4w'], default: 'week' } }]);
    expect(Object.keys(op.responses).sort()).toEqual(['201', '400', '401', '403', '422']);
    expect(op['x-permission']).toEqual(['presets.create-own']);
    expect(op.security).toEqual([{ session: [] }]);
  });

  it('gives a catch-all its GET and POST, the examples on GET only; a public route needs no session', () => {
    const auth = doc.paths['/api/auth/{all}']!;
    expect(Object.keys(auth).sort()).toEqual(['get', 'post']);
    expect(auth.get!['x-examples']).toHaveLength(1);
    expect(auth.post!['x-examples']).toEqual([]);
    expect(auth.get!.security).toEqual([]);
    expect(Object.keys(auth.get!.responses)).not.toContain('401');
  });
});
