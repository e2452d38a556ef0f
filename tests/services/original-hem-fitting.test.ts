// Jeans kept on their factory hem, through the services: the fitting saves the finish and its
// lengths, refuses what the engine refuses under the form's own field names, the saved leg goes to
// the engine's order (the join's allowance as the engine's seamAllowance), and the ticket is priced
// at the list's "Jeans, original hem kept". Amounts are this test's own list, not trade figures.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { handle } = await import('@/db');
const { measurementsRequest, blankLeg } = await import('@/lib/shared/measurement-request');
const measurementsSvc = await import('@/services/measurements');
const tickets = await import('@/services/tickets');
const garmentsSvc = await import('@/services/garments');
const prices = await import('@/services/counter/prices');
const { savedLegOrder, canBePlanned } = await import('@/lib/server/fitting/saved-leg');
const { makeShop, TEST_PRICES } = await import('./fixtures');

let a: Shop;

beforeAll(async () => {
  a = await makeShop('Rivet Lane Alterations');
  await prices.savePriceList(a.lead, { currency: 'EUR', hours: '', location: '', autoReadyNotice: false, items: [...TEST_PRICES] });
});
afterAll(() => handle.close());

// 2 in off a 5/8 in factory hem, joined at 3/8 in (common practice (no source); docs/KINDS.md).
const jeansLeg = (over: Record<string, string> = {}) => ({
  ...blankLeg('original'),
  backPin: '30',
  shortenBy: '2',
  factoryHem: '5/8',
  joinSeam: '3/8',
  ...over,
});

describe('a fitting kept on the factory hem', () => {
  it('is saved with its finish and lengths, planned from the saved leg, and priced at its own line', async () => {
    const t = await tickets.createTicket(a.counter, { customer: { name: 'Wren Castellane' }, garments: [{ description: 'Indigo jeans' }] });
    const [g] = await garmentsSvc.garmentsOfTicket(a.shopId, t.id);
    const input = measurementsRequest.parse({ unit: 'in', legs: { left: jeansLeg(), right: jeansLeg() } });
    const read = measurementsSvc.readLengths(input);
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    const saved = await measurementsSvc.saveMeasurements(a.tailor, g!.id, input, read.legs);
    const left = saved.legs.find((l) => l.leg === 'left')!;
    expect(left.finish).toBe('original');
    expect(left.values.shortenBy?.text).toBe('2');
    // 3/8 in = 9.525 mm (1 in = 25.4 mm exactly, NBS 1959).
    expect(left.values.joinSeam?.mm).toBeCloseTo(9.525, 9);
    expect(canBePlanned(left)).toBe(true);
    const order = savedLegOrder(left, 'in', 8)!;
    expect(order.finish).toBe('original');
    expect(order.input).toMatchObject({ unit: 'in', precision: 8, shortenBy: '2', factoryHem: '5/8', seamAllowance: '3/8' });
    expect(order.finished).toBe('30');

    const { lines, unpriced } = await prices.priceFromGarments(a.counter, t.id, { rush: false });
    expect(unpriced).toEqual([]);
    expect(lines.map((l) => [l.key, l.label, l.amountMinor])).toEqual([['original-hem', 'Jeans, original hem kept — Indigo jeans', 2300]]);
  });

  it('refuses what the engine refuses, under the form’s field names (the join allowance as joinSeam)', () => {
    const input = measurementsRequest.parse({ unit: 'in', legs: { left: jeansLeg({ joinSeam: '0' }), right: jeansLeg({ widthAtEdge: '8' }) } });
    const read = measurementsSvc.readLengths(input);
    expect(read.ok).toBe(false);
    if (read.ok) return;
    expect(Object.keys(read.issues).sort()).toEqual(['legs.left.joinSeam', 'legs.right.heightAbove', 'legs.right.widthAbove']);
  });

  it('is not planned until the shortening and the factory hem are given', () => {
    expect(canBePlanned({ unit: 'in', finish: 'original', values: { shortenBy: { text: '2' } } })).toBe(false);
  });
});
