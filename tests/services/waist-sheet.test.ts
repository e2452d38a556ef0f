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
const { benchSettings, saveBenchSettings } = await import('@/services/shop-settings');
const { flatText, pdfFile, squash } = await import('../lib/cut-sheet/poppler');

let a: Shop;
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
    const now = await benchSettings(a.shopId);
    await saveBenchSettings(a.lead, { ...now, language: 'fr' } as never);
    const { garment } = await openTicket(a, { garments: [{ description: 'Pantalon gris' }] });
    await saveFitting(a.tailor, garment.id, fittingRequest(leg, leg, 'in', 'plain'));
    const text = flatText(pdfFile((await garmentSheet(a.tailor, garment.id, {}, 'https://bench.cuffwright.test')).bytes));
    // The chalk guide's words may come between two lines of the note as poppler reads them.
    expect(squash(text)).toContain(squash('le repère d’épingle descend de 1 1/2 in, de 31 1/2'));
    expect(squash(text)).toContain(squash('à 33 in (règle : girth-slope'));
  });
});

describe('a shop that alters the waist first (its lead’s choice)', () => {
  let b: Shop;

  beforeAll(async () => {
    b = await makeShop('Waist First Shop');
  });

  it('pins now by default, and keeps the order when other settings are saved without it', async () => {
    expect((await benchSettings(b.shopId)).waistOrder).toBe('record');
    await saveBenchSettings(b.lead, { scale: 'in8', stepLabels: {}, waistOrder: 'waist-first' });
    await saveBenchSettings(b.lead, { scale: 'in8', stepLabels: {} });
    expect((await benchSettings(b.shopId)).waistOrder).toBe('waist-first');
    expect((await benchSettings(a.shopId)).waistOrder).toBe('record');
  });

  it('refuses a pin on a leg with a waist change still to do, on that leg’s pin, and saves nothing', async () => {
    const { garment } = await openTicket(b, { garments: [{ description: 'Navy trousers, waist to let out' }] });
    const onlyRight = fittingRequest({ ...leg, waistChange: '' }, leg, 'in', 'plain');
    await expect(saveFitting(b.tailor, garment.id, onlyRight)).rejects.toMatchObject({
      status: 422,
      issues: { 'legs.right.backPin': expect.stringContaining('waist first') },
    });
    expect((await fittingOf(b.lead, garment.id)).legs).toEqual([]);
  });

  it('saves the waist change with no pin yet, and says to pin once the waist is done, moving no mark', async () => {
    const { garment } = await openTicket(b, { garments: [{ description: 'Charcoal trousers, waist first' }] });
    const waitingOnWaist = { ...leg, backPin: '' };
    await saveFitting(b.tailor, garment.id, fittingRequest(waitingOnWaist, waitingOnWaist, 'in', 'plain'));
    const fitting = await fittingOf(b.lead, garment.id);
    expect(fitting.waist?.left).toMatchObject({ code: 'first', change: '-1 in', by: '', mark: '' });
  });

  it('still prints a sheet saved before the shop chose waist first, with the waist-first note and no moved mark', async () => {
    const c = await makeShop('Changed Its Mind');
    const { garment } = await openTicket(c, { garments: [{ description: 'Grey trousers, pinned before' }] });
    await saveFitting(c.tailor, garment.id, fittingRequest(leg, leg, 'in', 'plain'));
    await saveBenchSettings(c.lead, { scale: 'in8', stepLabels: {}, waistOrder: 'waist-first' });
    const text = flatText(pdfFile((await garmentSheet(c.tailor, garment.id, {}, 'https://bench.cuffwright.test')).bytes));
    expect(squash(text)).toContain(squash('the shop alters the waist first. Pin the length once the waist is done'));
    expect(squash(text)).not.toContain(squash('from 31 1/2 in to 33 in'));
  });
});
