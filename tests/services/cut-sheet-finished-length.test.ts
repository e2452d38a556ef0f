// The finished length pinned at the fitting is on the cut sheet, as typed and as it reads: a sum
// typed as "31 3/4 + 1/8" is kept as typed and read as 31 7/8 in; a sheet in mm gives it in mm only.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { handle } = await import('@/db');
const { garmentSheet } = await import('@/services/cut-sheets');
const { makeShop } = await import('./fixtures');
const { fittingRequest, openTicket, saveFitting } = await import('./garment-fixtures');
const { flatText, pdfFile } = await import('../lib/cut-sheet/poppler');

let a: Shop;
let id = '';

beforeAll(async () => {
  a = await makeShop('Finished Length Shop');
  const { garment } = await openTicket(a, { customer: { name: 'Orla Penderby' }, garments: [{ description: 'Grey flannel trousers' }] });
  id = garment.id;
  await saveFitting(a.tailor, id, fittingRequest({ backPin: '31 3/4 + 1/8', cuffDepth: '1 1/2', available: '5' }));
});
afterAll(() => handle.close());

async function text(opts: Parameters<typeof garmentSheet>[2]) {
  const file = await garmentSheet(a.tailor, id, opts, 'https://bench.cuffwright.test');
  return flatText(pdfFile(file.bytes));
}

describe('the finished length on a garment’s cut sheet', () => {
  it('prints the pinned length as typed and what it reads as, in inches', async () => {
    // 31 3/4 + 1/8 = 31 7/8 in (plain arithmetic).
    expect(await text({})).toContain('Finished length (back pin) 31 3/4 + 1/8 in = 31 7/8 in');
  });

  it('prints it in millimetres on a sheet in mm, where every length is in mm', async () => {
    // 31 7/8 in × 25.4 = 809.625 mm (1 in = 25.4 mm, NBS 1959), to the half millimetre 809.5 mm.
    const sheet = await text({ unit: 'mm' });
    expect(sheet).toContain('Finished length (back pin) 809.5 mm');
    expect(sheet).not.toContain('31 3/4');
  });
});
