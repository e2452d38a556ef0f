// route(): the one order of checks every endpoint gets (permission → query → body → handler) and
// the one error shape, with real Requests and no server.
import type { APIContext } from 'astro';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { demand, route } from '@/lib/server/route';
import { ServiceError } from '@/lib/server/service-error';

const member = (role: string) => ({ user: { id: 'u', name: 'Pat', email: 'p@example.com' }, member: { id: 'm', role, shopId: 's', shopName: 'S' } });
const signedOut = { user: null, member: null };

function ctx(locals: unknown, body?: string, query = ''): APIContext {
  const request = new Request(`http://localhost/api/x${query}`, { method: 'POST', headers: { 'content-type': 'application/json' }, body });
  return { request, locals, params: { id: 'abc' }, url: new URL(request.url) } as unknown as APIContext;
}

async function answer(res: Response | Promise<Response>) {
  const r = await res;
  return { status: r.status, body: await r.json() };
}

const saveScale = route(
  {
    summary: 'Saves a scale.',
    permission: ['settings', 'update'],
    body: z.object({ scale: z.enum(['in8', 'mm'], { error: 'Choose a scale.' }) }),
    status: 201,
  },
  ({ actor, body, params }) => ({ by: actor.role, scale: body.scale, id: params.id }),
);

describe('route(): checks in one order, refusals in one shape', () => {
  it('answers the handler’s value as JSON with the declared status', async () => {
    expect(await answer(saveScale(ctx(member('lead'), '{"scale":"mm"}')))).toEqual({ status: 201, body: { by: 'lead', scale: 'mm', id: 'abc' } });
  });

  it('401 signed out and 403 without the permission, before the body is looked at', async () => {
    expect(await answer(saveScale(ctx(signedOut, 'not json')))).toEqual({ status: 401, body: { error: 'Sign in first.' } });
    const refused = await answer(saveScale(ctx(member('tailor'), 'not json')));
    expect(refused.status).toBe(403);
    expect(Object.keys(refused.body)).toEqual(['error']);
  });

  it('400 { error } for a body that is not JSON; 422 { error, issues } for one the schema refuses', async () => {
    const unreadable = await answer(saveScale(ctx(member('lead'), '{"scale":')));
    expect(unreadable).toEqual({ status: 400, body: { error: 'Send a JSON body.' } });
    expect(await answer(saveScale(ctx(member('lead'), '{"scale":"cubits"}')))).toEqual({
      status: 422,
      body: { error: 'Choose a scale.', issues: { scale: 'Choose a scale.' } },
    });
    const notAnObject = await answer(saveScale(ctx(member('lead'), '42')));
    expect(notAnObject.status).toBe(422);
    expect(Object.keys(notAnObject.body.issues)).toEqual(['_']);
  });

  it('422 naming the query field the schema refuses, before the body', async () => {
    const read = route(
      { summary: 'Reads.', permission: 'public', query: z.object({ period: z.enum(['week', '4w']).default('week') }), body: z.object({}) },
      ({ query }) => query,
    );
    expect(await answer(read(ctx(signedOut, '{}')))).toEqual({ status: 200, body: { period: 'week' } });
    const bad = await answer(read(ctx(signedOut, 'not json', '?period=year')));
    expect(bad.status).toBe(422);
    expect(Object.keys(bad.body.issues)).toEqual(['period']);
  });

  it('any one of several permissions lets in; demand() narrows with a 403; a ServiceError keeps its status', async () => {
    const move = route(
      {
        summary: 'Moves.',
        permission: [
          ['tickets', 'advance'],
          ['tickets', 'pickup'],
        ],
        body: z.object({ to: z.string() }),
      },
      ({ actor, body }) => {
        demand(actor, ['tickets', body.to === 'collected' ? 'pickup' : 'advance']);
        if (body.to === 'nowhere') throw new ServiceError(409, 'It moved meanwhile.');
        return { moved: body.to };
      },
    );
    expect((await answer(move(ctx(member('counter'), '{"to":"collected"}')))).status).toBe(200);
    expect((await answer(move(ctx(member('counter'), '{"to":"cut"}')))).status).toBe(403);
    expect(await answer(move(ctx(member('lead'), '{"to":"nowhere"}')))).toEqual({ status: 409, body: { error: 'It moved meanwhile.' } });
    expect((await answer(move(ctx(member('apprentice'), '{"to":"cut"}')))).status).toBe(200);
    // Neither permission (the tailor has neither settings one): refused at the door, body unread.
    const settings = route(
      {
        summary: 'Settles.',
        permission: [
          ['settings', 'update'],
          ['staff', 'invite'],
        ],
        body: z.object({}),
      },
      () => ({}),
    );
    expect((await answer(settings(ctx(member('tailor'), 'not json')))).status).toBe(403);
  });

  it('a public route gets the member or null; an unavailable route is 404 for everyone', async () => {
    const who = route({ summary: 'Who.', permission: 'public' }, ({ actor }) => ({ role: actor?.role ?? null }));
    expect((await answer(who(ctx(signedOut)))).body).toEqual({ role: null });
    expect((await answer(who(ctx(member('counter'))))).body).toEqual({ role: 'counter' });
    const gone = route({ summary: 'Gone.', permission: ['tickets', 'read'], available: () => false }, () => ({}));
    expect((await answer(gone(ctx(signedOut)))).status).toBe(404);
  });

  it('keeps its declaration for the API document', () => {
    expect(saveScale.spec).toMatchObject({ summary: 'Saves a scale.', permission: ['settings', 'update'], status: 201 });
  });
});
