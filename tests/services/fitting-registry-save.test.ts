// Every field of the fitting registry is saved and read back (measurements.values is jsonb: one
// key per field, so a new field needs no column), for each finish that asks for it.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';
import { FITTING_VALUES } from '../components/bench/fitting-values';

vi.mock('@/db', () => import('../db/db-mock'));

const { handle } = await import('@/db');
const { fittingOf } = await import('@/services/measurements');
const { makeShop } = await import('./fixtures');
const { fittingRequest, openTicket, saveFitting } = await import('./garment-fixtures');
const { fieldsOf, FINISH_IDS } = await import('@/lib/fitting/kinds');

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
    }
  });
});
