// A pending waist change recorded at the fitting is saved, read back, and printed on the garment's
// cut sheet as the pin mark's move and the moved mark, figures that add up as printed (rule
// 'girth-slope', derived: rise = change × D/(S − W), docs/KINDS.md), in English and in French.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { handle } = await import('@/db');
const { fittingOf } = await import('@/services/measurements');
const { makeShop } = await import('./fixtures');
const { fittingRequest, openTicket, saveFitting } = await import('./garment-fixtures');
const { garmentSheet } = await import('@/services/cut-sheets');
const { flatText, pdfFile } = await import('../lib/cut-sheet/poppler');

let a: Shop;
// The PDF's text wraps lines and drops the typographic apostrophe: compare without either.
const squash = (s: string) => s.replace(/[\s’']+/g, '');
// Invented wearer: taken in 1 in, waist 34 in, seat 40 in, 9 in apart (common practice, no source).
const leg = { backPin: '31 1/2', hemAllowance: '1 1/2', waistChange: '-1', waistGirth: '34', seatGirth: '40', waistToSeat: '9' };

beforeAll(async () => {
  a = await makeShop('Waistband Shop');
});
afterAll(() => handle.close());

describe('a pending waist change on the sheet', () => {
  it('is saved, read back, and prints the mark moved 1 1/2 in down, from 31 1/2 in to 33 in', async () => {
    const { garment } = await openTicket(a, { garments: [{ description: 'Grey trousers, waist to take in' }] });
    await saveFitting(a.tailor, garment.id, fittingRequest(leg, leg, 'in', 'plain'));
    const fitting = await fittingOf(a.lead, garment.id);
    expect(fitting.legs.find((l) => l.leg === 'left')!.values.waistChange?.text).toBe('-1');
    // The garment page's note: the same figures as the sheet, in the shop's scale (eighths by default).
    expect(fitting.waist?.left).toMatchObject({ code: 'moves', direction: 'down', by: '1 1/2 in', pin: '31 1/2 in', mark: '33 in' });
    const text = flatText(pdfFile((await garmentSheet(a.tailor, garment.id, {}, 'https://bench.cuffwright.test')).bytes));
    // By hand: 1 × 9/(40 − 34) = 1 1/2 in; 31 1/2 + 1 1/2 = 33 in.
    expect(squash(text)).toContain(squash('the pin mark moves down 1 1/2 in, from 31 1/2 in to 33 in'));
    expect(squash(text)).toContain(squash('(rule: girth-slope; source: derived'));
  });

  it('prints the same figures in French', async () => {
    const { saveBenchSettings, benchSettings } = await import('@/services/shop-settings');
    const now = await benchSettings(a.shopId);
    await saveBenchSettings(a.lead, { ...now, language: 'fr' } as never);
    const { garment } = await openTicket(a, { garments: [{ description: 'Pantalon gris' }] });
    await saveFitting(a.tailor, garment.id, fittingRequest(leg, leg, 'in', 'plain'));
    const text = flatText(pdfFile((await garmentSheet(a.tailor, garment.id, {}, 'https://bench.cuffwright.test')).bytes));
    expect(squash(text)).toContain(squash('le repère d’épingle descend de 1 1/2 in, de 31 1/2 in à 33 in (règle : girth-slope'));
  });
});
