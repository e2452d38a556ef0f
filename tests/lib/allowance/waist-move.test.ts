import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { AllowanceError, type WaistMoveInput, validateWaistMoveInput, waistMovesHem } from '@/lib/allowance';

const IN = 25.4;
const body = { rule: 'girth-slope', waistGirth: 32, seatGirth: 40, waistToSeat: 8 } as const;

describe('waistMovesHem examples', () => {
  it('girth-slope: 32 in waist, 40 in seat 8 in lower; 1 in taken in lifts the trousers 1 in, the pin mark moves 1 in down (derived; waist moves the hem: TRADE.md common practice (no source))', () => {
    const plan = waistMovesHem({ unit: 'in', waistChange: -1, ...body });
    expect([plan.rise?.text, plan.pinMarkMoves?.text, plan.direction]).toEqual(['1 in', '1 in', 'down']);
    expect(plan.rule).toEqual({ code: 'girth-slope', waistRatio: 1, seatRatio: 0, source: plan.sources['girth-slope'] });
    expect(plan.notes.map((n) => n.code)).toEqual(['pin-mark-moves', 'check-at-next-fitting']);
  });

  it('girth-slope: 34 in waist, 40 in seat 9 in lower; 1/2 in taken in lifts 3/4 in; let out 1/2 in drops 3/4 in (derived)', () => {
    const steep = { rule: 'girth-slope', waistGirth: 34, seatGirth: 40, waistToSeat: 9 } as const;
    expect(waistMovesHem({ unit: 'in', waistChange: '-1/2', ...steep }).pinMarkMoves?.text).toBe('3/4 in');
    const out = waistMovesHem({ unit: 'in', waistChange: '1/2', ...steep });
    expect([out.pinMarkMoves?.text, out.direction]).toEqual(['-3/4 in', 'up']);
  });

  it("the shop's own ratio: 1/2 per unit at the waist and 1/4 at the seat; 2 cm in at the waist and 2 cm at the seat move the mark 1.5 cm (the shop's figure)", () => {
    const plan = waistMovesHem({ unit: 'cm', waistChange: -2, seatChange: -2, rule: 'shop-ratio', waistRatio: '1/2', seatRatio: 0.25 });
    expect([plan.pinMarkMoves?.text, plan.rule.source]).toEqual(['1.5 cm', "the shop's own figure"]);
  });

  it('the rise can be capped (the band cannot pass the natural waist); a seat change is not counted by the girth rule (derived)', () => {
    const plan = waistMovesHem({ unit: 'in', waistChange: -2, seatChange: -1, mostRise: '1 1/4', ...body });
    expect(plan.pinMarkMoves?.text).toBe('1 1/4 in');
    expect(plan.notes.map((n) => n.code)).toEqual(['pin-mark-moves', 'rise-capped', 'seat-change-not-counted', 'check-at-next-fitting']);
  });

  it('the shop that has the waist done first: no move, a waist-first note (TRADE.md: adjust the waist before pinning the length, common practice (no source))', () => {
    const plan = waistMovesHem({ unit: 'in', waistChange: -1, policy: 'waist-first', ...body });
    expect([plan.rise, plan.pinMarkMoves, plan.direction]).toEqual([null, null, null]);
    expect(plan.notes).toEqual([{ code: 'waist-first', values: { waistChange: { mm: -IN, text: '-1 in' } } }]);
  });

  it.each([
    [{ waistChange: undefined }, 'waistChange', 'missing'],
    [{ rule: 'guess' }, 'rule', 'bad-choice'],
    [{ seatGirth: 30 }, 'seatGirth', 'impossible-shape'],
    [{ rule: 'shop-ratio' }, 'waistRatio', 'missing'],
    [{ rule: 'shop-ratio', waistRatio: -1 }, 'waistRatio', 'out-of-range'],
    [{ policy: 'later' }, 'policy', 'bad-choice'],
  ])('refuses %o in field %s (%s)', (fields, field, code) => {
    const input = { unit: 'in', waistChange: -1, ...body, ...fields } as WaistMoveInput;
    expect(() => waistMovesHem(input)).toThrow(AllowanceError);
    expect(() => waistMovesHem(input)).toThrow(expect.objectContaining({ field, code }));
    expect(validateWaistMoveInput(input).map((e) => [e.field, e.code])).toContainEqual([field, code]);
  });
});

describe('waistMovesHem laws', () => {
  const k16 = (min: number, max: number) => fc.integer({ min, max }).map((k) => k / 16);
  const arb = fc.record({ c: k16(0, 64), W: k16(400, 700), dS: k16(16, 200), D: k16(64, 200) });
  const at = (change: number, a: { W: number; dS: number; D: number }) =>
    waistMovesHem({ unit: 'in', waistChange: change, rule: 'girth-slope', waistGirth: a.W, seatGirth: a.W + a.dS, waistToSeat: a.D }).pinMarkMoves!.mm;

  it('no change ⇒ no move; taken in ⇒ down, let out ⇒ up by the same amount', () => {
    fc.assert(
      fc.property(arb, ({ c, ...a }) => {
        expect(at(0, a)).toBe(0);
        expect(at(-c, a)).toBeCloseTo(-at(c, a), 9);
        if (c > 0) expect(at(-c, a)).toBeGreaterThan(0);
      }),
    );
  });

  it('more taken in ⇒ the mark moves further; the move is the change × depth / (seat − waist)', () => {
    fc.assert(
      fc.property(arb, k16(1, 32), ({ c, ...a }, more) => {
        expect(at(-(c + more), a)).toBeGreaterThan(at(-c, a));
        expect(at(-c, a)).toBeCloseTo((c * a.D * IN) / a.dS, 6);
      }),
    );
  });
});
