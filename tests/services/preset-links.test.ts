// Issue 15: presets edited with their history kept, fittings pointing at the preset they used by
// id (a rename shows on them), the house default, and never another shop's preset read or used.
import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { and, eq, sql } from 'drizzle-orm';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { measurements, presets } = await import('@/db/schema');
const svc = await import('@/services/presets');
const { fittingOf, legsOf } = await import('@/services/measurements');
const { makeShop } = await import('./fixtures');
const { fittingRequest, openTicket, saveFitting } = await import('./garment-fixtures');

let a: Shop;
let b: Shop;

beforeAll(async () => {
  a = await makeShop('Link Shop A');
  b = await makeShop('Link Shop B');
});
afterAll(() => handle.close());

// House standards: cuff 1¼ in trim, 1½ in classic, 1¾ in wide (common practice, no source; TRADE.md).
const classic = { finish: 'cuff', unit: 'in', cuffDepth: '1 1/2', turnUnder: '1/2' } as const;

async function garmentOf(shop: Shop) {
  return (await openTicket(shop, { garments: [{ description: 'Link trousers' }] })).garment;
}

/** A fitting that used the preset on both legs, as the garment page sends it. */
function withPreset(presetId: string, cuffDepth = '1 1/2') {
  return fittingRequest({ backPin: '31', cuffDepth, presetId });
}

describe('editing a preset keeps its history', () => {
  it('records who changed which field, when, old → new; the creation last', async () => {
    const p = await svc.createPreset(a.lead, { name: 'Classic A', scope: 'house', settings: classic });
    await svc.updatePreset(a.lead, p.id, { name: 'Classic 1½', settings: { ...classic, cuffDepth: '1 5/8' } });
    const history = await svc.presetHistory(a.tailor, p.id);
    const fields = history.map((h) => [h.field, h.old, h.new]);
    expect(fields).toEqual(
      expect.arrayContaining([
        ['name', 'Classic A', 'Classic 1½'],
        ['cuffDepth', '1 1/2', '1 5/8'],
      ]),
    );
    expect(fields).toHaveLength(3);
    expect(history.at(-1)).toMatchObject({ field: 'created', new: 'Classic A' });
    for (const h of history) expect(h.actorName).toBe('lead of Link Shop A');
    expect(Date.parse(history[0]!.at)).toBeGreaterThan(Date.now() - 60_000);
  });

  it('records nothing for an edit that changes nothing', async () => {
    const p = await svc.createPreset(a.lead, { name: 'Still', scope: 'house', settings: classic });
    await svc.updatePreset(a.lead, p.id, { name: 'Still', settings: classic });
    expect((await svc.presetHistory(a.lead, p.id)).map((h) => h.field)).toEqual(['created']);
  });

  it('keeps the move of the house default on both presets', async () => {
    const first = await svc.createPreset(a.lead, { name: 'Default first', scope: 'house', isDefault: true, settings: classic });
    const second = await svc.createPreset(a.lead, { name: 'Default second', scope: 'house', settings: { ...classic, cuffDepth: '1 3/4' } });
    await svc.updatePreset(a.lead, second.id, { isDefault: true });
    expect((await svc.presetHistory(a.lead, second.id))[0]).toMatchObject({ field: 'isDefault', old: false, new: true });
    expect((await svc.presetHistory(a.lead, first.id))[0]).toMatchObject({ field: 'isDefault', old: true, new: false });
    const defaults = (await svc.listPresets(a.tailor)).filter((p) => p.isDefault);
    expect(defaults.map((p) => p.id)).toEqual([second.id]);
    // Listed first, so a new fitting starts from it.
    expect((await svc.listPresets(a.tailor))[0]!.id).toBe(second.id);
  });
});

describe('a fitting points at its preset by id', () => {
  it('shows the preset’s new name after a rename, and its id', async () => {
    const p = await svc.createPreset(a.lead, { name: 'Trim A', scope: 'house', settings: { ...classic, cuffDepth: '1 1/4' } });
    const g = await garmentOf(a);
    const saved = await saveFitting(a.tailor, g.id, withPreset(p.id, '1 1/4'));
    expect(saved.legs.map((l) => [l.preset, l.presetId])).toEqual([
      ['Trim A', p.id],
      ['Trim A', p.id],
    ]);
    await svc.updatePreset(a.lead, p.id, { name: 'Trim 1¼' });
    expect((await legsOf(g.id)).map((l) => [l.preset, l.presetId])).toEqual([
      ['Trim 1¼', p.id],
      ['Trim 1¼', p.id],
    ]);
    // Saving the fitting again as it stands records no change of preset.
    const before = (await fittingOf(a.lead, g.id)).history.length;
    await saveFitting(a.tailor, g.id, withPreset(p.id, '1 1/4'));
    expect((await fittingOf(a.lead, g.id)).history.length).toBe(before);
  });

  it('keeps the last name once the preset is removed', async () => {
    const p = await svc.createPreset(a.lead, { name: 'Gone soon', scope: 'house', settings: classic });
    const g = await garmentOf(a);
    await saveFitting(a.tailor, g.id, withPreset(p.id));
    await svc.updatePreset(a.lead, p.id, { name: 'Gone now' });
    await svc.deletePreset(a.lead, p.id);
    expect((await legsOf(g.id)).map((l) => [l.preset, l.presetId])).toEqual([
      ['Gone now', null],
      ['Gone now', null],
    ]);
    // Saved again untouched, the name stays; "not from a preset" clears it.
    const form = fittingRequest({ backPin: '31', cuffDepth: '1 1/2', preset: 'Gone now' });
    await saveFitting(a.tailor, g.id, form);
    expect((await legsOf(g.id)).map((l) => l.preset)).toEqual(['Gone now', 'Gone now']);
    await saveFitting(a.tailor, g.id, fittingRequest({ backPin: '31', cuffDepth: '1 1/2' }));
    expect((await legsOf(g.id)).map((l) => l.preset)).toEqual([null, null]);
  });

  it('takes the name from the preset, never from what the client sends', async () => {
    const p = await svc.createPreset(a.lead, { name: 'True name', scope: 'house', settings: classic });
    const g = await garmentOf(a);
    await saveFitting(a.tailor, g.id, fittingRequest({ backPin: '31', cuffDepth: '1 1/2', presetId: p.id, preset: 'Made up' }));
    expect((await legsOf(g.id)).map((l) => l.preset)).toEqual(['True name', 'True name']);
    const g2 = await garmentOf(a);
    await saveFitting(a.tailor, g2.id, fittingRequest({ backPin: '31', cuffDepth: '1 1/2', preset: 'Made up' }));
    expect((await legsOf(g2.id)).map((l) => l.preset)).toEqual([null, null]);
  });
});

describe('another shop’s preset is never readable or usable', () => {
  it('refuses another shop’s preset id on a fitting as it refuses a made-up one, and writes nothing', async () => {
    const theirs = await svc.createPreset(a.lead, { name: 'A only', scope: 'house', settings: classic });
    const g = await garmentOf(b);
    const refused = await saveFitting(b.tailor, g.id, withPreset(theirs.id)).catch((e: unknown) => e);
    const madeUp = await saveFitting(b.tailor, g.id, withPreset('00000000-0000-4000-8000-000000000000')).catch((e: unknown) => e);
    expect(refused).toMatchObject({ status: 422 });
    expect(madeUp).toMatchObject({ status: 422 });
    expect((refused as Error).message).toBe((madeUp as Error).message);
    expect(await legsOf(g.id)).toEqual([]);
  });

  it('answers 404 for its history and its edits, and leaves it as it was', async () => {
    const theirs = await svc.createPreset(a.lead, { name: 'A guarded', scope: 'house', settings: classic });
    await expect(svc.presetHistory(b.lead, theirs.id)).rejects.toMatchObject({ status: 404 });
    await expect(svc.updatePreset(b.lead, theirs.id, { name: 'Taken', settings: { ...classic, cuffDepth: '3' } })).rejects.toMatchObject({ status: 404 });
    await expect(svc.updatePreset(b.lead, theirs.id, { isDefault: true })).rejects.toMatchObject({ status: 404 });
    const [row] = await db.select().from(presets).where(eq(presets.id, theirs.id));
    expect(row).toMatchObject({ name: 'A guarded', settings: classic, isDefault: false });
    expect((await svc.presetHistory(a.lead, theirs.id)).map((h) => h.field)).toEqual(['created']);
  });

  it('never shows another shop’s preset name, even on a row pointing at it', async () => {
    const theirs = await svc.createPreset(a.lead, { name: 'Secret of A', scope: 'house', settings: classic });
    const g = await garmentOf(b);
    await saveFitting(b.tailor, g.id, fittingRequest({ backPin: '31', cuffDepth: '1 1/2' }));
    // A row that somehow points across shops (the service never writes one).
    await db.update(measurements).set({ presetId: theirs.id }).where(eq(measurements.garmentId, g.id));
    expect((await legsOf(g.id)).map((l) => [l.preset, l.presetId])).toEqual([
      [null, null],
      [null, null],
    ]);
  });

  it('refuses a colleague’s own preset, but keeps one a colleague put on the fitting', async () => {
    const mine = await svc.createPreset(a.tailor, { name: 'Tailor own', scope: 'personal', settings: classic });
    const g = await garmentOf(a);
    await expect(saveFitting(a.lead, g.id, withPreset(mine.id))).rejects.toMatchObject({ status: 422 });
    await saveFitting(a.tailor, g.id, withPreset(mine.id));
    await saveFitting(a.lead, g.id, withPreset(mine.id, '1 5/8'));
    expect((await legsOf(g.id)).map((l) => [l.preset, l.presetId, l.values.cuffDepth?.text])).toEqual([
      ['Tailor own', mine.id, '1 5/8'],
      ['Tailor own', mine.id, '1 5/8'],
    ]);
  });
});

describe('migration 0014: fittings linked from the name they recorded', () => {
  it('links the same shop’s preset of that name (house first, else the taker’s own), nothing across shops', async () => {
    const house = await svc.createPreset(a.lead, { name: 'Backfill cuff', scope: 'house', settings: classic });
    const own = await svc.createPreset(a.tailor, { name: 'Backfill own', scope: 'personal', settings: classic });
    await svc.createPreset(b.lead, { name: 'Backfill B', scope: 'house', settings: classic });
    const gHouse = await garmentOf(a);
    const gOwn = await garmentOf(a);
    const gCross = await garmentOf(a);
    const gGone = await garmentOf(a);
    for (const g of [gHouse, gOwn, gCross, gGone]) await saveFitting(a.tailor, g.id, fittingRequest({ backPin: '31', cuffDepth: '1 1/2' }));
    // As the rows stood before the migration: a name, no id.
    const named = async (garmentId: string, name: string) =>
      db.update(measurements).set({ preset: name, presetId: null }).where(eq(measurements.garmentId, garmentId));
    await named(gHouse.id, 'Backfill cuff');
    await named(gOwn.id, 'Backfill own');
    await named(gCross.id, 'Backfill B');
    await named(gGone.id, 'Long gone');
    const sqlText = readFileSync('drizzle/0014_preset-ids.sql', 'utf8');
    const updates = sqlText
      .split('--> statement-breakpoint')
      .map((s) => s.trim())
      .filter((s) => /^(--.*\n)*UPDATE/.test(s));
    expect(updates).toHaveLength(2);
    for (const u of updates) await db.execute(sql.raw(u));
    const idsOf = async (garmentId: string) =>
      (
        await db
          .select({ id: measurements.presetId })
          .from(measurements)
          .where(and(eq(measurements.garmentId, garmentId)))
      ).map((r) => r.id);
    expect(await idsOf(gHouse.id)).toEqual([house.id, house.id]);
    expect(await idsOf(gOwn.id)).toEqual([own.id, own.id]);
    expect(await idsOf(gCross.id)).toEqual([null, null]);
    expect(await idsOf(gGone.id)).toEqual([null, null]);
    expect((await legsOf(gGone.id)).map((l) => l.preset)).toEqual(['Long gone', 'Long gone']);
  });
});
