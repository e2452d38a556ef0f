// Unwashed cloth recorded at the fitting (issue 17): saved as its text, refused on save when the
// engine would refuse it (the field named), and printed on the garment's cut sheet as the shrink
// lines whose sums add up as printed (rule derived: edge L·p/(1 − p), hem H/(1 − p), docs/KINDS.md;
// raw denim 10 %, SHRINKAGE_PERCENT, from memory), in English and in French.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { handle } = await import('@/db');
const { fittingOf, readLengths } = await import('@/services/measurements');
const { makeShop } = await import('./fixtures');
const { fittingRequest, openTicket, saveFitting } = await import('./garment-fixtures');
const { garmentSheet } = await import('@/services/cut-sheets');
const { benchSettings, saveBenchSettings } = await import('@/services/shop-settings');
const { measurementsRequest, blankLeg } = await import('@/lib/shared/measurement-request');
const { flatText, pdfFile, squash } = await import('../lib/cut-sheet/poppler');

let a: Shop;
// Invented pair of raw jeans: a 30 in inseam pinned at 31 1/2 in, 1 1/2 in hem.
const leg = { backPin: '31 1/2', hemAllowance: '1 1/2', shrinkCloth: 'raw-denim', lengthToMark: '30' };

beforeAll(async () => {
  a = await makeShop('Indigo Shop');
});
afterAll(() => handle.close());

describe('unwashed cloth on a plain hem', () => {
  it('is saved as its text (a choice has no mm), read back, and printed with sums that add up as printed', async () => {
    const { garment } = await openTicket(a, { garments: [{ description: 'Raw indigo jeans' }] });
    await saveFitting(a.tailor, garment.id, fittingRequest(leg, leg, 'in', 'plain'));
    const left = (await fittingOf(a.lead, garment.id)).legs.find((l) => l.leg === 'left')!;
    expect(left.values.shrinkCloth).toEqual({ text: 'raw-denim' });
    expect(left.values.lengthToMark).toEqual({ text: '30', mm: 762 });
    const text = squash(flatText(pdfFile((await garmentSheet(a.tailor, garment.id, {}, 'https://bench.cuffwright.test')).bytes)));
    // By hand (eighths, the shop's default): 30 × 0.1/0.9 = 3.33 → 3 3/8 up; 31 1/2 + 3 3/8 = 34 7/8;
    // 1 1/2/0.9 = 1.67 → 1 3/4 up; 34 7/8 + 1 3/4 = 36 5/8.
    expect(text).toContain(squash('Pin mark 31 1/2 in + shrink allowance 3 3/8 in = finished edge (line 1) chalked at 34 7/8 in.'));
    expect(text).toContain(squash('Finished edge 34 7/8 in + unwashed hem allowance 1 3/4 in = cut (line 2) at 36 5/8 in, 5 1/8 in below the pin mark.'));
    expect(text).toContain(squash('Raw denim, 10% shrinkage in length expected at the first wash (source: from memory'));
    expect(text).toContain(squash('Caution: a hot wash or the dryer shrinks more than this'));
  });

  it('prints the same figures in French', async () => {
    const b = await makeShop('Atelier Indigo');
    const now = await benchSettings(b.shopId);
    await saveBenchSettings(b.lead, { ...now, language: 'fr' } as never);
    const { garment } = await openTicket(b, { garments: [{ description: 'Jean brut' }] });
    await saveFitting(b.tailor, garment.id, fittingRequest(leg, leg, 'in', 'plain'));
    const text = squash(flatText(pdfFile((await garmentSheet(b.tailor, garment.id, {}, 'https://bench.cuffwright.test')).bytes)));
    expect(text).toContain(squash('Repère d’épingle 31 1/2 in + réserve de retrait 3 3/8 in = bord fini (ligne 1) tracé à 34 7/8 in.'));
    expect(text).toContain(squash('Bord fini 34 7/8 in + réserve d’ourlet avant lavage 1 3/4 in = coupe (ligne 2) à 36 5/8 in, 5 1/8 in sous le repère.'));
    expect(text).toContain(squash('Attention : un lavage chaud ou le sèche-linge'));
  });
});

describe('the save refuses what cannot be planned (PUT …/measurements answers 422 with these issues)', () => {
  const request = (left: Record<string, string>) =>
    measurementsRequest.parse({ unit: 'in', legs: { left: { ...blankLeg('plain'), ...left }, right: blankLeg('plain') } });

  it('a shrinkage of 50 % or more (the engine keeps it below 50), on the percent', () => {
    const read = readLengths(request({ ...leg, shrinkCloth: 'other', shrinkPercent: '60' }));
    expect(read.ok).toBe(false);
    expect(!read.ok && read.issues['legs.left.shrinkPercent']).toMatch(/^Shop’s own shrinkage: /);
  });

  it('“other” with no percent, on the percent; a percent beside a preset cloth, on the percent', () => {
    const none = readLengths(request({ ...leg, shrinkCloth: 'other' }));
    expect(!none.ok && none.issues['legs.left.shrinkPercent']).toMatch(/needed/);
    const beside = readLengths(request({ ...leg, shrinkPercent: '6' }));
    expect(!beside.ok && beside.issues['legs.left.shrinkPercent']).toMatch(/only with “Other”/);
  });

  it('no length to shrink (no back pin, no length to the mark), on the length', () => {
    const read = readLengths(request({ shrinkCloth: 'raw-denim' }));
    expect(!read.ok && read.issues['legs.left.lengthToMark']).toMatch(/^Length that shrinks to the mark: /);
  });

  it('a cloth not in the list, by the request’s shape (422 from the route, the field named)', () => {
    const parsed = measurementsRequest.safeParse({ unit: 'in', legs: { left: { ...blankLeg('plain'), shrinkCloth: 'wool' }, right: blankLeg('plain') } });
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues[0]?.path.join('.')).toBe('legs.left.shrinkCloth');
  });
});
