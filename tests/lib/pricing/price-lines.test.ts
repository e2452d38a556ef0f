// Price computation from garments' finishes and plans: which lines a ticket gets, and its balance.
// Amounts are an invented shop's list; the taper cases go through the real engine (checkTaper).
import { describe, expect, it } from 'vitest';
import { checkTaper } from '@/lib/allowance';
import { balanceOf, finishKey, isRushableWork, priceTicket, reductionNeedsLead, type GarmentFacts, type PriceList } from '@/lib/pricing/price-lines';
import { needsLetOut } from '@/lib/pricing/taper-let-out';
import { workKeyOf } from '@/lib/shared/fitting/garment-kinds';

// An invented list (minor units): not anyone's real prices.
const LIST: PriceList = {
  'plain-hem': { label: 'Plain hem', amountMinor: 1800 },
  'cuff-from-hem': { label: 'Cuff from a plain hem', amountMinor: 2600 },
  'cuff-remake': { label: 'Cuff let down and re-made', amountMinor: 3200 },
  'original-hem': { label: 'Jeans, original hem kept', amountMinor: 2300 },
  'skirt-hem': { label: 'Skirt or dress hem', amountMinor: 2700 },
  'sleeves-shorten': { label: 'Jacket sleeves shortened', amountMinor: 3300 },
  'taper-let-out': { label: 'Taper let-out', amountMinor: 1200 },
  rush: { label: 'Rush', amountMinor: 1000 },
};

const garment = (over: Partial<GarmentFacts>): GarmentFacts => ({
  garmentId: 'g1',
  label: 'Grey flannel',
  finish: 'hem',
  taperLetOut: false,
  oldCuff: false,
  ...over,
});

describe('priceTicket', () => {
  it('gives a plain hem its one line at the list price', () => {
    const { lines, unpriced } = priceTicket([garment({ finish: 'hem' })], LIST, { rush: false });
    expect(lines).toEqual([{ garmentId: 'g1', key: 'plain-hem', label: 'Plain hem — Grey flannel', amountMinor: 1800 }]);
    expect(unpriced).toEqual([]);
  });

  it('tells a cuff made from a plain hem from an old cuff let down and re-made', () => {
    expect(finishKey(garment({ finish: 'cuff' }))).toBe('cuff-from-hem');
    expect(finishKey(garment({ finish: 'cuff', oldCuff: true }))).toBe('cuff-remake');
    expect(finishKey(garment({ finish: null }))).toBeNull();
  });

  it('prices jeans kept on their factory hem at their own line, with no cuff let-out beside it', () => {
    const { lines } = priceTicket([garment({ label: 'Indigo jeans', finish: 'original', taperLetOut: true })], LIST, { rush: false });
    expect(lines).toEqual([{ garmentId: 'g1', key: 'original-hem', label: 'Jeans, original hem kept — Indigo jeans', amountMinor: 2300 }]);
  });

  it("prices a skirt by its kind's own line whatever finish is noted, and adds no cuff let-out to it", () => {
    const { lines } = priceTicket([garment({ label: 'Green circle skirt', finish: 'cuff', taperLetOut: true, workKey: 'skirt-hem' })], LIST, { rush: true });
    expect(lines).toEqual([
      { garmentId: 'g1', key: 'skirt-hem', label: 'Skirt or dress hem — Green circle skirt', amountMinor: 2700 },
      { garmentId: null, key: 'rush', label: 'Rush', amountMinor: 1000 },
    ]);
    expect(finishKey(garment({ finish: null, workKey: 'skirt-hem' }))).toBe('skirt-hem');
  });

  it('prices jacket sleeves once for the pair at their own line, from the kind (KIND_PRICE_KEYS)', () => {
    const workKey = workKeyOf('sleeves');
    expect(workKey).toBe('sleeves-shorten');
    const { lines } = priceTicket([garment({ label: 'Navy blazer', finish: null, workKey })], LIST, { rush: false });
    expect(lines).toEqual([{ garmentId: 'g1', key: 'sleeves-shorten', label: 'Jacket sleeves shortened — Navy blazer', amountMinor: 3300 }]);
  });

  it('adds the taper let-out line to a cuff whose plan needs one, and never to a plain hem', () => {
    const cuff = priceTicket([garment({ finish: 'cuff', taperLetOut: true })], LIST, { rush: false });
    expect(cuff.lines.map((l) => l.key)).toEqual(['cuff-from-hem', 'taper-let-out']);
    // A plain hem has no cuff top whose width must be carried down (TRADE.md, "The cuff, as a fold plan").
    const hem = priceTicket([garment({ finish: 'hem', taperLetOut: true })], LIST, { rush: false });
    expect(hem.lines.map((l) => l.key)).toEqual(['plain-hem']);
  });

  it('adds one rush line per ticket, not per garment', () => {
    const two = [garment({ garmentId: 'a', finish: 'hem' }), garment({ garmentId: 'b', finish: 'cuff' })];
    const { lines } = priceTicket(two, LIST, { rush: true });
    expect(lines.filter((l) => l.key === 'rush')).toEqual([{ garmentId: null, key: 'rush', label: 'Rush', amountMinor: 1000 }]);
    expect(balanceOf(lines, []).total).toBe(1800 + 2600 + 1000);
  });

  it('leaves garments without a finish unpriced, and adds no rush to an empty ticket', () => {
    const { lines, unpriced } = priceTicket([garment({ garmentId: 'x', finish: null })], LIST, { rush: true });
    expect(lines).toEqual([]);
    expect(unpriced).toEqual(['x']);
  });
});

describe('isRushableWork (RUSH_RULE) with the lead’s kinds of work', () => {
  it('counts a kind’s line only when rush applied to the kind, and never a voided or adjusted line', () => {
    const kindLine = { key: null, kindId: 'k1', source: 'list' };
    expect(isRushableWork({ ...kindLine, rushApplies: true })).toBe(true);
    expect(isRushableWork({ ...kindLine, rushApplies: false })).toBe(false);
    expect(isRushableWork({ ...kindLine, rushApplies: true, voidedAt: '2026-12-03T10:00:00Z' })).toBe(false);
    expect(isRushableWork({ key: 'plain-hem', source: 'list' })).toBe(true);
    expect(isRushableWork({ key: 'rush', source: 'auto' })).toBe(false);
    expect(isRushableWork({ key: null, source: 'adjust' })).toBe(false);
  });

  it('makes a ticket of kinds alone a rush ticket through priceTicket’s otherWork, once', () => {
    const { lines } = priceTicket([], LIST, { rush: true, otherWork: isRushableWork({ key: null, kindId: 'k1', rushApplies: true, source: 'list' }) });
    expect(lines).toEqual([{ garmentId: null, key: 'rush', label: 'Rush', amountMinor: 1000 }]);
    expect(priceTicket([], LIST, { rush: true, otherWork: false }).lines).toEqual([]);
  });
});

describe('balanceOf', () => {
  it('takes payments off the total and never shows a negative balance', () => {
    expect(balanceOf([{ amountMinor: 2600 }, { amountMinor: 1200 }], [{ amountMinor: 1000 }])).toEqual({
      total: 3800,
      paid: 1000,
      refunded: 0,
      due: 2800,
      credit: 0,
    });
    expect(balanceOf([{ amountMinor: 2600 }, { amountMinor: -600 }], [{ amountMinor: 2000 }])).toEqual({
      total: 2000,
      paid: 2000,
      refunded: 0,
      due: 0,
      credit: 0,
    });
  });

  it('shows money paid beyond the total as a credit owed, less what was given back (issue 14)', () => {
    // Line 20.00, deposit 20.00, adjustment -15.00: 15.00 is owed back, not lost.
    expect(balanceOf([{ amountMinor: 2000 }, { amountMinor: -1500 }], [{ amountMinor: 2000 }])).toMatchObject({ total: 500, due: 0, credit: 1500 });
    const refunds = [
      { amountMinor: 1000, status: 'done' },
      { amountMinor: 500, status: 'failed' },
    ];
    expect(balanceOf([{ amountMinor: 2000 }, { amountMinor: -1500 }], [{ amountMinor: 2000 }], refunds)).toMatchObject({ refunded: 1000, credit: 500, due: 0 });
  });

  it('leaves voided lines out of the total', () => {
    expect(balanceOf([{ amountMinor: 2600 }, { amountMinor: 1800, voidedAt: new Date() }], []).total).toBe(2600);
  });
});

describe('reductionNeedsLead', () => {
  it('asks for the lead when a reduction takes off more than half the total', () => {
    expect(reductionNeedsLead(-1000, 2000)).toBe(false);
    expect(reductionNeedsLead(-1001, 2000)).toBe(true);
    expect(reductionNeedsLead(5000, 2000)).toBe(false);
  });
});

describe('needsLetOut from the engine taper plan', () => {
  // The cuff-top width must be kept straight down to the cut (TRADE.md, "The cuff, as a fold plan").
  // Widths below are invented check values ("from memory" of ordinary trouser legs), not sources.
  it('is true for a leg that narrows 1 in flat over 10 in towards the hem under a 1½ in cuff', () => {
    const plan = checkTaper({ unit: 'in', cuffDepth: '1 1/2', widthAtEdge: '8', widthAbove: '9', heightAbove: '10', seamAllowance: '1' });
    expect(needsLetOut(plan)).toBe(true);
  });

  it('is false for a straight leg (the same width above and at the edge)', () => {
    const plan = checkTaper({ unit: 'in', cuffDepth: '1 1/2', widthAtEdge: '9', widthAbove: '9', heightAbove: '10', seamAllowance: '1' });
    expect(needsLetOut(plan)).toBe(false);
  });

  it('is false when every line changes by no more than the tolerance', () => {
    expect(needsLetOut({ withinTolerance: true, lines: [] })).toBe(false);
  });
});
