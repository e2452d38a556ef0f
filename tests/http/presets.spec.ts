// The presets API over HTTP: validation answers per field, who may change which preset, one
// house default at a time (role × route statuses are in role-route-matrix.spec.ts).
import { beforeAll, describe, expect, inject, it } from 'vitest';
import { call, DEMO, freshEmail, newShop, signIn } from './client';

const cookies: Record<'lead' | 'tailor' | 'apprentice', string> = { lead: '', tailor: '', apprentice: '' };

beforeAll(async () => {
  for (const role of ['lead', 'tailor', 'apprentice'] as const) cookies[role] = await signIn(DEMO[role]);
});

let stranger: Awaited<ReturnType<typeof newShop>> | undefined;
/** A shop any stranger could sign up, made once for this file. */
async function strangerShop() {
  return (stranger ??= await newShop(`Stranger Alterations ${Date.now().toString(36)}`));
}

const cuff = (cuffDepth: string, unit = 'in') => ({ finish: 'cuff', unit, cuffDepth });

describe('presets API', () => {
  it('starts the demo shop with its house presets, the classic 1 1/2 in cuff the default', async () => {
    const r = await call('GET', '/api/presets', { cookie: cookies.apprentice });
    expect(r.status).toBe(200);
    // Cuff depths 1¼ trim, 1½ classic, 1¾ wide (TRADE.md, common practice, no source); 35 and 40 mm (common practice, no source).
    const house = r.body
      .filter((p: { house: boolean }) => p.house)
      .map((p: { name: string; settings: { cuffDepth: string } }) => [p.name, p.settings.cuffDepth]);
    // Other tests on this server add house presets: the seeded ones are checked among them.
    expect(house[0]).toEqual(['Classic cuff', '1 1/2']);
    expect(house).toEqual(
      expect.arrayContaining([
        ['Trim cuff', '1 1/4'],
        ['Wide cuff', '1 3/4'],
        ['Metric cuff 35', '35'],
        ['Metric cuff 40', '40'],
      ]),
    );
  });

  it('answers 400 for a body that is not JSON and 422 per field for bad shapes', async () => {
    const notJson = await fetch(`${inject('baseURL')}/api/presets`, {
      method: 'POST',
      headers: { cookie: cookies.tailor, 'content-type': 'application/json', origin: inject('baseURL') },
      body: '{not json',
    });
    expect(notJson.status).toBe(400);
    const r = await call('POST', '/api/presets', { cookie: cookies.tailor, body: { name: '', settings: { finish: 'turn-up', unit: 'ft' } } });
    expect(r.status).toBe(422);
    expect(Object.keys(r.body.issues).sort()).toEqual(['name', 'settings.finish', 'settings.unit']);
  });

  it('answers 422 with the field when the engine cannot read or make a length', async () => {
    const unreadable = await call('POST', '/api/presets', { cookie: cookies.tailor, body: { name: 'Odd', settings: cuff('one and a half') } });
    expect(unreadable.status).toBe(422);
    expect(Object.keys(unreadable.body.issues)).toEqual(['settings.cuffDepth']);
    const zero = await call('POST', '/api/presets', { cookie: cookies.tailor, body: { name: 'Zero', settings: cuff('0') } });
    expect(zero.status).toBe(422);
    expect(Object.keys(zero.body.issues)).toEqual(['settings.cuffDepth']);
    const missing = await call('POST', '/api/presets', { cookie: cookies.tailor, body: { name: 'No depth', settings: { finish: 'cuff', unit: 'in' } } });
    expect(missing.status).toBe(422);
    expect(Object.keys(missing.body.issues)).toEqual(['settings.cuffDepth']);
  });

  it("lets a tailor keep, rename and remove their own presets, unseen by others; refuses the lead's house presets to them", async () => {
    const name = freshEmail('teo');
    const own = await call('POST', '/api/presets', { cookie: cookies.tailor, body: { name, settings: cuff('1 3/8') } });
    expect(own.status).toBe(201);
    expect(own.body).toMatchObject({ house: false, isDefault: false, settings: { cuffDepth: '1 3/8' } });
    const leadSees = await call('GET', '/api/presets', { cookie: cookies.lead });
    expect(leadSees.body.map((p: { id: string }) => p.id)).not.toContain(own.body.id);
    expect((await call('PATCH', `/api/presets/${own.body.id}`, { cookie: cookies.lead, body: { name: 'Taken' } })).status).toBe(404);
    const renamed = await call('PATCH', `/api/presets/${own.body.id}`, { cookie: cookies.tailor, body: { name: `${name} b` } });
    expect(renamed.status).toBe(200);
    expect(renamed.body.name).toBe(`${name} b`);
    const asDefault = await call('PATCH', `/api/presets/${own.body.id}`, { cookie: cookies.tailor, body: { isDefault: true } });
    expect(asDefault.status).toBe(422);
    const house = (await call('GET', '/api/presets', { cookie: cookies.tailor })).body.find((p: { house: boolean }) => p.house);
    expect((await call('DELETE', `/api/presets/${house.id}`, { cookie: cookies.tailor })).status).toBe(403);
    expect((await call('POST', '/api/presets', { cookie: cookies.apprentice, body: { name: 'Mine', settings: cuff('1') } })).status).toBe(403);
    expect((await call('DELETE', `/api/presets/${own.body.id}`, { cookie: cookies.tailor })).status).toBe(200);
    expect((await call('DELETE', `/api/presets/${own.body.id}`, { cookie: cookies.tailor })).status).toBe(404);
  });

  it('keeps one house default: a new default replaces the old one, and the old one can take it back', async () => {
    const before = (await call('GET', '/api/presets', { cookie: cookies.lead })).body.find((p: { isDefault: boolean }) => p.isDefault);
    const made = await call('POST', '/api/presets', {
      cookie: cookies.lead,
      body: { name: freshEmail('wide'), scope: 'house', isDefault: true, settings: cuff('45', 'mm') },
    });
    expect(made.status).toBe(201);
    let defaults = (await call('GET', '/api/presets', { cookie: cookies.tailor })).body.filter((p: { isDefault: boolean }) => p.isDefault);
    expect(defaults.map((p: { id: string }) => p.id)).toEqual([made.body.id]);
    expect((await call('PATCH', `/api/presets/${before.id}`, { cookie: cookies.lead, body: { isDefault: true } })).status).toBe(200);
    defaults = (await call('GET', '/api/presets', { cookie: cookies.tailor })).body.filter((p: { isDefault: boolean }) => p.isDefault);
    expect(defaults.map((p: { id: string }) => p.id)).toEqual([before.id]);
    expect((await call('DELETE', `/api/presets/${made.body.id}`, { cookie: cookies.lead })).status).toBe(200);
  });

  it('refuses a second house preset of the same name with 409', async () => {
    const name = freshEmail('dup');
    expect((await call('POST', '/api/presets', { cookie: cookies.lead, body: { name, scope: 'house', settings: cuff('1 1/2') } })).status).toBe(201);
    const again = await call('POST', '/api/presets', { cookie: cookies.lead, body: { name: name.toUpperCase(), scope: 'house', settings: cuff('1 1/2') } });
    expect(again.status).toBe(409);
    expect(again.body.error).toContain('already');
  });

  it('lets only the shop lead edit a house preset; its history names the lead, old → new; another shop gets 404', async () => {
    const made = await call('POST', '/api/presets', { cookie: cookies.lead, body: { name: freshEmail('edit'), scope: 'house', settings: cuff('1 1/2') } });
    expect(made.status).toBe(201);
    const path = `/api/presets/${made.body.id}`;
    const change = { name: `${made.body.name} wide`, settings: cuff('1 3/4') };
    expect((await call('PATCH', path, { cookie: cookies.tailor, body: change })).status).toBe(403);
    expect((await call('PATCH', path, { cookie: cookies.apprentice, body: change })).status).toBe(403);
    const stranger = await strangerShop();
    expect((await call('PATCH', path, { cookie: stranger.cookie, body: change })).status).toBe(404);
    expect((await call('GET', `${path}/history`, { cookie: stranger.cookie })).status).toBe(404);
    const edited = await call('PATCH', path, { cookie: cookies.lead, body: change });
    expect(edited.status).toBe(200);
    expect(edited.body).toMatchObject({ name: change.name, settings: { cuffDepth: '1 3/4' } });
    const history = await call('GET', `${path}/history`, { cookie: cookies.tailor });
    expect(history.status).toBe(200);
    const fields = history.body.map((h: { field: string; old: unknown; new: unknown; actorName: string }) => [h.field, h.old, h.new, h.actorName]);
    expect(fields).toEqual(
      expect.arrayContaining([
        ['name', made.body.name, change.name, expect.any(String)],
        ['cuffDepth', '1 1/2', '1 3/4', expect.any(String)],
      ]),
    );
    // Only the lead's edits: nothing the refused callers sent was kept.
    expect(new Set(history.body.filter((h: { field: string }) => h.field !== 'created').map((h: { actorName: string }) => h.actorName)).size).toBe(1);
    expect((await call('DELETE', path, { cookie: cookies.lead })).status).toBe(200);
  });

  it("refuses another shop's preset id on a fitting with 422, as a made-up one", async () => {
    const demoDefault = (await call('GET', '/api/presets', { cookie: cookies.tailor })).body.find((p: { isDefault: boolean }) => p.isDefault);
    const stranger = await strangerShop();
    const ticket = await call('POST', '/api/tickets', { cookie: stranger.cookie, body: { garments: [{ description: 'Stranger trousers' }] } });
    expect(ticket.status).toBe(201);
    const garment = (await call('GET', `/api/tickets/${ticket.body.id}`, { cookie: stranger.cookie })).body.garments[0].id;
    const fitting = (presetId: string) => ({
      unit: 'in',
      legs: { left: { finish: 'cuff', backPin: '31', cuffDepth: '1 1/2', presetId }, right: { finish: 'cuff', backPin: '31', cuffDepth: '1 1/2' } },
    });
    const theirs = await call('PUT', `/api/garments/${garment}/measurements`, { cookie: stranger.cookie, body: fitting(demoDefault.id) });
    const madeUp = await call('PUT', `/api/garments/${garment}/measurements`, {
      cookie: stranger.cookie,
      body: fitting('00000000-0000-4000-8000-000000000000'),
    });
    expect(theirs.status).toBe(422);
    expect(madeUp.status).toBe(422);
    expect(theirs.body.error).toBe(madeUp.body.error);
    expect((await call('GET', `/api/garments/${garment}/measurements`, { cookie: stranger.cookie })).body.legs).toEqual([]);
  });
});
