// Presets: house presets and personal ones, one house default at a time, lengths read by the
// engine, each shop and each person seeing only what is theirs, an audit event per change.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';
import { and, eq } from 'drizzle-orm';

vi.mock('@/db', () => import('../db/db-mock'));

const { db, handle } = await import('@/db');
const { auditEvents, presets } = await import('@/db/schema');
const svc = await import('@/services/presets');
const { makeShop } = await import('./fixtures');

let a: Shop;
let b: Shop;

beforeAll(async () => {
  a = await makeShop('Preset Shop A');
  b = await makeShop('Preset Shop B');
});
afterAll(() => handle.close());

const classic = { finish: 'cuff', unit: 'in', cuffDepth: '1 1/2', turnUnder: '1/2' } as const;

async function auditActions(shopId: string, subject: string) {
  const rows = await db
    .select()
    .from(auditEvents)
    .where(and(eq(auditEvents.shopId, shopId), eq(auditEvents.subject, subject)));
  return rows.map((r) => r.action);
}

describe('presets', () => {
  it('list house presets first, the default at the top, then only the caller’s own', async () => {
    await svc.createPreset(a.lead, { name: 'Wide', scope: 'house', settings: { ...classic, cuffDepth: '1 3/4' } });
    const def = await svc.createPreset(a.lead, { name: 'Classic', scope: 'house', isDefault: true, settings: classic });
    const mine = await svc.createPreset(a.tailor, { name: 'Teo narrow', scope: 'personal', settings: { ...classic, cuffDepth: '1 1/8' } });
    const leads = await svc.createPreset(a.lead, { name: 'Lead own', scope: 'personal', settings: classic });
    const seen = await svc.listPresets(a.tailor);
    expect(seen[0]).toMatchObject({ id: def.id, house: true, isDefault: true });
    expect(seen.map((p) => p.name)).toEqual(['Classic', 'Wide', 'Teo narrow']);
    expect(seen.map((p) => p.id)).toContain(mine.id);
    expect(seen.map((p) => p.id)).not.toContain(leads.id);
    expect(await svc.listPresets(b.lead)).toEqual([]);
  });

  it('keep one house default at a time', async () => {
    const one = await svc.createPreset(a.lead, { name: 'Default one', scope: 'house', isDefault: true, settings: classic });
    const two = await svc.createPreset(a.lead, { name: 'Default two', scope: 'house', isDefault: true, settings: classic });
    let defaults = (await svc.listPresets(a.lead)).filter((p) => p.isDefault);
    expect(defaults.map((p) => p.id)).toEqual([two.id]);
    await svc.updatePreset(a.lead, one.id, { isDefault: true });
    defaults = (await svc.listPresets(a.lead)).filter((p) => p.isDefault);
    expect(defaults.map((p) => p.id)).toEqual([one.id]);
    // Created as the default, moved away by `two`, taken back: each move kept on the preset.
    expect(await auditActions(a.shopId, one.id)).toEqual(['preset.created', 'preset.changed', 'preset.changed']);
  });

  it('refuse a personal preset as the default', async () => {
    await expect(svc.createPreset(a.tailor, { name: 'Mine default', scope: 'personal', isDefault: true, settings: classic })).rejects.toMatchObject({
      status: 422,
    });
    const own = await svc.createPreset(a.tailor, { name: 'Own', scope: 'personal', settings: classic });
    await expect(svc.updatePreset(a.tailor, own.id, { isDefault: true })).rejects.toMatchObject({ status: 422 });
  });

  it('read lengths with the engine: fractions and metric kept as typed, nonsense refused per field', () => {
    expect(svc.settingsIssues({ finish: 'cuff', unit: 'in', cuffDepth: '1½', turnUnder: '1/2' })).toEqual({});
    expect(svc.settingsIssues({ finish: 'cuff', unit: 'mm', cuffDepth: '35' })).toEqual({});
    expect(Object.keys(svc.settingsIssues({ finish: 'cuff', unit: 'in', cuffDepth: 'wide' }))).toEqual(['settings.cuffDepth']);
    expect(Object.keys(svc.settingsIssues({ finish: 'cuff', unit: 'in', cuffDepth: '0' }))).toEqual(['settings.cuffDepth']);
    expect(Object.keys(svc.settingsIssues({ finish: 'cuff', unit: 'in' }))).toEqual(['settings.cuffDepth']);
    expect(Object.keys(svc.settingsIssues({ finish: 'hem', unit: 'in', hemAllowance: '1 1/2 +' }))).toEqual(['settings.hemAllowance']);
  });

  it('keep only the lengths the finish uses (a cuff is hemmed level: no slope)', async () => {
    // "cuffs are hemmed level, not sloped": The Encyclopedia of Men's Clothes (TRADE.md).
    const p = await svc.createPreset(a.tailor, { name: 'Cuff no slope', scope: 'personal', settings: { ...classic, slope: '1/2', hemAllowance: '2' } });
    expect(p.settings).toEqual(classic);
    const hem = await svc.createPreset(a.tailor, {
      name: 'Plain sloped',
      scope: 'personal',
      settings: { finish: 'hem', unit: 'in', hemAllowance: '1 1/2', turnUnder: '1/4', slope: '1/2', cuffDepth: '2' },
    });
    expect(hem.settings).toEqual({ finish: 'hem', unit: 'in', hemAllowance: '1 1/2', turnUnder: '1/4', slope: '1/2' });
  });

  it('refuse a second preset of the same name in the same place, case aside', async () => {
    await svc.createPreset(a.lead, { name: 'Turn-up 40', scope: 'house', settings: { finish: 'cuff', unit: 'mm', cuffDepth: '40' } });
    await expect(svc.createPreset(a.lead, { name: 'turn-up 40', scope: 'house', settings: classic })).rejects.toMatchObject({ status: 409 });
    // Another shop, or a personal one, may use the name.
    await expect(svc.createPreset(b.lead, { name: 'Turn-up 40', scope: 'house', settings: classic })).resolves.toMatchObject({ house: true });
    await expect(svc.createPreset(a.tailor, { name: 'Turn-up 40', scope: 'personal', settings: classic })).resolves.toMatchObject({ house: false });
  });

  it("answer 404 for another shop's preset and for another person's own", async () => {
    const theirs = await svc.createPreset(b.lead, { name: 'B house', scope: 'house', settings: classic });
    const tailors = await svc.createPreset(a.tailor, { name: 'Tailor only', scope: 'personal', settings: classic });
    expect(await svc.presetScope(a.lead, theirs.id)).toBeNull();
    expect(await svc.presetScope(a.lead, tailors.id)).toBeNull();
    expect(await svc.presetScope(a.tailor, tailors.id)).toBe('own');
    expect(await svc.presetScope(a.lead, 'not-a-uuid')).toBeNull();
    await expect(svc.updatePreset(a.lead, theirs.id, { name: 'Taken over' })).rejects.toMatchObject({ status: 404 });
    await expect(svc.deletePreset(a.apprentice, tailors.id)).rejects.toMatchObject({ status: 404 });
    const [still] = await db.select().from(presets).where(eq(presets.id, theirs.id));
    expect(still!.name).toBe('B house');
  });

  it('rename, change settings and delete, each audited', async () => {
    const p = await svc.createPreset(a.tailor, { name: 'Draft', scope: 'personal', settings: classic });
    const renamed = await svc.updatePreset(a.tailor, p.id, { name: 'Final', settings: { ...classic, cuffDepth: '1 5/8' } });
    expect(renamed).toMatchObject({ name: 'Final', settings: { cuffDepth: '1 5/8' } });
    await expect(svc.updatePreset(a.tailor, p.id, { settings: { ...classic, cuffDepth: 'deep' } })).rejects.toMatchObject({ status: 422 });
    expect(await svc.deletePreset(a.tailor, p.id)).toEqual({ id: p.id, deleted: true });
    expect(await svc.presetScope(a.tailor, p.id)).toBeNull();
    // One event per changed value (name, cuff depth).
    expect(await auditActions(a.shopId, p.id)).toEqual(['preset.created', 'preset.changed', 'preset.changed', 'preset.deleted']);
  });

  it('seed the starter house presets with the classic cuff as the default', async () => {
    const fresh = await makeShop('Preset Seed Shop', ['lead']);
    await svc.seedHousePresets(fresh.shopId);
    const list = await svc.listPresets(fresh.lead);
    // Cuff depths: 1¼ trim, 1½ classic, 1¾ wide (TRADE.md, common practice, no source); 35 and 40 mm
    // metric cuffs (common practice, no source).
    expect(list.map((p) => [p.name, p.settings.cuffDepth, p.settings.unit, p.isDefault])).toEqual([
      ['Classic cuff', '1 1/2', 'in', true],
      ['Metric cuff 35', '35', 'mm', false],
      ['Metric cuff 40', '40', 'mm', false],
      ['Trim cuff', '1 1/4', 'in', false],
      ['Wide cuff', '1 3/4', 'in', false],
    ]);
    for (const p of list) expect(svc.settingsIssues(p.settings)).toEqual({});
  });
});
