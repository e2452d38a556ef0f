// Every field of the fitting registry is saved and read back (measurements.values is jsonb: one
// key per field, so a new field needs no column), for each finish that asks for it; a recorded
// field is on the garment's printed cut sheet.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';
import { FITTING_VALUES } from '../components/bench/fitting-values';

vi.mock('@/db', () => import('../db/db-mock'));

const { handle } = await import('@/db');
const { fittingOf } = await import('@/services/measurements');
const { makeShop } = await import('./fixtures');
const { fittingRequest, openTicket, saveFitting } = await import('./garment-fixtures');
const { fieldsOf, FINISH_IDS } = await import('@/lib/shared/fitting/kinds');
const { garmentSheet } = await import('@/services/cut-sheets');
const { flatText, pdfFile } = await import('../lib/cut-sheet/poppler');

let a: Shop;

beforeAll(async () => {
  a = await makeShop('Registry Shop');
});
afterAll(() => handle.close());

describe('every registry field', () => {
  it('is saved as typed, read back, and kept in the history, for each finish', async () => {
    for (const finish of FINISH_IDS) {
      const { garment } = await openTicket(a, { garments: [{ description: `Registry ${finish}` }] });
      const keys = fieldsOf(finish, true).map((f) => f.key as keyof typeof FITTING_VALUES);
      const typed = Object.fromEntries(keys.map((k) => [k, FITTING_VALUES[k]]));
      await saveFitting(a.tailor, garment.id, fittingRequest(typed, typed, 'in', finish));
      const fitting = await fittingOf(a.lead, garment.id);
      const left = fitting.legs.find((l) => l.leg === 'left')!;
      const changed = new Set(fitting.history.filter((e) => e.action === 'measurement.changed').map((e) => e.detail.field));
      for (const k of keys) {
        expect(left.values[k]?.text, `${k} (${finish})`).toBe(FITTING_VALUES[k]);
        expect(changed.has(k), `${k} in the history (${finish})`).toBe(true);
      }
      // The garment's printed sheet carries each recorded ('listed') field, as typed with its unit.
      const listed = fieldsOf(finish).filter((f) => f.printed === 'listed');
      if (listed.length === 0) continue;
      const sheet = flatText(pdfFile((await garmentSheet(a.tailor, garment.id, {}, 'https://bench.cuffwright.test')).bytes));
      for (const f of listed) expect(sheet, `${f.key} printed (${finish})`).toContain(`${f.label} ${FITTING_VALUES[f.key as keyof typeof FITTING_VALUES]} in`);
    }
  });
});
