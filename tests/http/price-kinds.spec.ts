// Issue 14 over HTTP: who may keep the price list's kinds of work (the lead) and who may price at
// intake (the counter and the lead), the JSON refusals (400/422/409), and a stranger's shop trying
// another shop's kind ids every way they can be sent: answered exactly as ids that name nothing.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { call, DEMO, newShop, signIn } from './client';

const NOWHERE = '00000000-0000-4000-8000-000000000000';
const cookies = { lead: '', counter: '', tailor: '', apprentice: '', other: '' };
const made: string[] = [];
let kindId = '';
let kindName = '';

async function kind(body: Record<string, unknown>, cookie = cookies.lead) {
  const r = await call('POST', '/api/prices/kinds', { cookie, body });
  if (r.status === 201 && cookie === cookies.lead) made.push(r.body.id);
  return r;
}

beforeAll(async () => {
  for (const role of ['lead', 'counter', 'tailor', 'apprentice'] as const) cookies[role] = await signIn(DEMO[role]);
  cookies.other = (await newShop('Stranger Seams')).cookie;
  kindName = `Replace zip ${Date.now().toString(36)}`;
  const r = await kind({ name: kindName, amountMinor: 1450, rushApplies: true });
  expect(r.status).toBe(201);
  kindId = r.body.id;
});

afterAll(async () => {
  // The demo list is shared with the stories: what this file added is retired (never deleted).
  for (const id of made) await call('PATCH', `/api/prices/kinds/${id}`, { cookie: cookies.lead, body: { retired: true } });
});

describe('keeping the kinds of work', () => {
  it('is the lead’s: the counter, a tailor and an apprentice are refused, signed out is 401', async () => {
    const body = { name: 'Counter’s own kind', amountMinor: 100, rushApplies: true };
    for (const who of ['counter', 'tailor', 'apprentice'] as const) {
      expect((await call('POST', '/api/prices/kinds', { cookie: cookies[who], body })).status).toBe(403);
      expect((await call('PATCH', `/api/prices/kinds/${kindId}`, { cookie: cookies[who], body: { amountMinor: 1 } })).status).toBe(403);
      expect((await call('GET', '/api/prices/history', { cookie: cookies[who] })).status).toBe(403);
    }
    expect((await call('POST', '/api/prices/kinds', { body })).status).toBe(401);
    // The counter reads the list, kinds included, to price with it.
    const list = await call('GET', '/api/prices', { cookie: cookies.counter });
    expect(list.body.kinds.find((k: { id: string }) => k.id === kindId)).toMatchObject({ name: kindName, amountMinor: 1450, rushApplies: true });
  });

  it('answers bad input with JSON 400/422 naming the field, and a taken name with 409', async () => {
    const base = inject('baseURL');
    const bad = await fetch(`${base}/api/prices/kinds`, {
      method: 'POST',
      headers: { cookie: cookies.lead, 'content-type': 'application/json', origin: base },
      body: '{"name": ',
    });
    expect([bad.status, bad.headers.get('content-type')]).toEqual([400, expect.stringContaining('application/json')]);
    const negative = await kind({ name: 'Hem by hand', amountMinor: -5, rushApplies: true });
    expect(negative.status).toBe(422);
    expect(JSON.stringify(negative.body)).toContain('amountMinor');
    expect((await kind({ name: '', amountMinor: 100, rushApplies: true })).status).toBe(422);
    expect((await kind({ name: 'Half cents', amountMinor: 10.5, rushApplies: true })).status).toBe(422);
    expect((await call('PATCH', `/api/prices/kinds/${kindId}`, { cookie: cookies.lead, body: {} })).status).toBe(422);
    const taken = await kind({ name: kindName.toUpperCase(), amountMinor: 100, rushApplies: true });
    expect(taken.status).toBe(409);
  });

  it('keeps every change in the history with who and old → new', async () => {
    expect((await call('PATCH', `/api/prices/kinds/${kindId}`, { cookie: cookies.lead, body: { amountMinor: 1500 } })).status).toBe(200);
    const history = await call('GET', '/api/prices/history', { cookie: cookies.lead });
    expect(history.status).toBe(200);
    expect(history.body[0]).toMatchObject({ line: kindName, actorName: expect.any(String), changes: [{ field: 'amountMinor', from: 1450, to: 1500 }] });
  });
});

describe('another shop’s kind of work', () => {
  it('is 404 to change, as an id that names nothing, and the same for an id that is no id', async () => {
    const theirs = await call('PATCH', `/api/prices/kinds/${kindId}`, { cookie: cookies.other, body: { amountMinor: 1, name: 'Taken over' } });
    const nothing = await call('PATCH', `/api/prices/kinds/${NOWHERE}`, { cookie: cookies.other, body: { amountMinor: 1, name: 'Taken over' } });
    expect(theirs.status).toBe(404);
    expect(theirs.body).toEqual(nothing.body);
    expect((await call('PATCH', '/api/prices/kinds/not-a-kind', { cookie: cookies.other, body: { amountMinor: 1 } })).status).toBe(404);
    const still = await call('GET', '/api/prices', { cookie: cookies.lead });
    expect(still.body.kinds.find((k: { id: string }) => k.id === kindId).amountMinor).toBe(1500);
    // Nor is it on their list or in their history.
    expect((await call('GET', '/api/prices', { cookie: cookies.other })).body.kinds).toEqual([]);
    expect(JSON.stringify((await call('GET', '/api/prices/history', { cookie: cookies.other })).body)).not.toContain(kindId);
  });

  it('cannot be put on their ticket, at the counter or at intake; the answer is that of an unknown id', async () => {
    const t = await call('POST', '/api/tickets', { cookie: cookies.other, body: { garments: [{ description: 'Stranger trousers' }] } });
    expect(t.status).toBe(201);
    const theirs = await call('POST', `/api/tickets/${t.body.id}/price-lines`, { cookie: cookies.other, body: { source: 'kind', kindId } });
    const nothing = await call('POST', `/api/tickets/${t.body.id}/price-lines`, { cookie: cookies.other, body: { source: 'kind', kindId: NOWHERE } });
    expect([theirs.status, theirs.body]).toEqual([422, nothing.body]);
    const intake = await call('POST', '/api/tickets', { cookie: cookies.other, body: { garments: [{ description: 'Stranger trousers', work: [kindId] }] } });
    const intakeNothing = await call('POST', '/api/tickets', {
      cookie: cookies.other,
      body: { garments: [{ description: 'Stranger trousers', work: [NOWHERE] }] },
    });
    expect([intake.status, intake.body]).toEqual([422, intakeNothing.body]);
    const before = (await call('GET', '/api/tickets', { cookie: cookies.other })).body.length;
    expect(before).toBe(1);
    // And our own kind on their ticket: the ticket is not ours, 404.
    expect((await call('POST', `/api/tickets/${t.body.id}/price-lines`, { cookie: cookies.lead, body: { source: 'kind', kindId } })).status).toBe(404);
  });
});

describe('pricing at intake', () => {
  it('is the counter’s and the lead’s: a tailor may take work in, but not priced', async () => {
    const priced = { garments: [{ description: 'HTTP navy trousers', finish: 'hem', work: [kindId] }], rush: true };
    const byTailor = await call('POST', '/api/tickets', { cookie: cookies.tailor, body: priced });
    expect(byTailor.status).toBe(403);
    expect((await call('POST', '/api/tickets', { cookie: cookies.tailor, body: { garments: [{ description: 'HTTP navy trousers' }] } })).status).toBe(201);
    expect((await call('POST', '/api/tickets', { cookie: cookies.apprentice, body: priced })).status).toBe(403);

    const t = await call('POST', '/api/tickets', { cookie: cookies.counter, body: priced });
    expect(t.status).toBe(201);
    const money = await call('GET', `/api/tickets/${t.body.id}/payments`, { cookie: cookies.counter });
    const list = (await call('GET', '/api/prices', { cookie: cookies.counter })).body as { items: { key: string; amountMinor: number }[] };
    const at = (key: string) => list.items.find((i) => i.key === key)!.amountMinor;
    expect(money.body.lines.map((l: { label: string }) => l.label)).toEqual([
      expect.stringMatching(/— HTTP navy trousers$/),
      `${kindName} — HTTP navy trousers`,
      expect.any(String),
    ]);
    expect(money.body.lines.at(-1).key).toBe('rush');
    expect(money.body.total).toBe(at('plain-hem') + 1500 + at('rush'));
  });

  it('refuses rush with no work it applies to, and a retired kind, as 422 JSON without opening a ticket', async () => {
    const noRush = await kind({ name: `Press only ${Date.now().toString(36)}`, amountMinor: 400, rushApplies: false });
    const tickets = async () => (await call('GET', '/api/tickets', { cookie: cookies.counter })).body.length;
    const before = await tickets();
    const rushed = await call('POST', '/api/tickets', {
      cookie: cookies.counter,
      body: { rush: true, garments: [{ description: 'HTTP linen', work: [noRush.body.id] }] },
    });
    expect([rushed.status, rushed.body.error]).toEqual([422, expect.stringContaining('Rush')]);
    await call('PATCH', `/api/prices/kinds/${noRush.body.id}`, { cookie: cookies.lead, body: { retired: true } });
    const retired = await call('POST', '/api/tickets', {
      cookie: cookies.counter,
      body: { garments: [{ description: 'HTTP linen', work: [noRush.body.id] }] },
    });
    expect([retired.status, retired.body.error]).toEqual([422, expect.stringContaining('retired')]);
    const twice = await call('POST', '/api/tickets', { cookie: cookies.counter, body: { garments: [{ description: 'HTTP linen', work: [kindId, kindId] }] } });
    expect(twice.status).toBe(422);
    expect(await tickets()).toBe(before);
  });
});
