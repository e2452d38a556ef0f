import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { AllowanceError, type SleeveInput, shortenSleeve, validateSleeveInput } from '@/lib/allowance';

const IN = 25.4;
const codes = (input: SleeveInput) => shortenSleeve(input).notes.map((n) => n.code);

describe('shortenSleeve examples', () => {
  it('1 in shorter at the cuff, buttons on a closed vent: all four move up 1 in (common practice (no source))', () => {
    const plan = shortenSleeve({ unit: 'in', shortenBy: 1, buttonholes: 'none' });
    expect(plan.method).toBe('cuff');
    expect([plan.newEdgeAboveEdge?.text, plan.cutAboveEdge?.text, plan.hemDepth.text]).toEqual(['1 in', '-1/2 in', '1 1/2 in']);
    // Defaults (common practice (no source)): lowest button 1 1/4 in up, 5/8 in apart.
    expect(plan.buttons.map((b) => [b.n, b.aboveNewEdge.text, b.moveUp.text])).toEqual([
      [1, '1 1/4 in', '1 in'],
      [2, '1 7/8 in', '1 in'],
      [3, '2 1/2 in', '1 in'],
      [4, '3 1/8 in', '1 in'],
    ]);
    expect(plan.buttonholesMoveUp.text).toBe('0 in');
    expect(codes({ unit: 'in', shortenBy: 1, buttonholes: 'none' })).toEqual(['move-buttons', 'remake-vent-corners']);
  });

  it('decorative buttonholes are restitched as far up as the buttons move (common practice (no source))', () => {
    const plan = shortenSleeve({ unit: 'cm', shortenBy: 2, buttonholes: 'decorative', buttons: 3 });
    expect(plan.buttonholesMoveUp.text).toBe('2 cm');
    expect(plan.buttons.map((b) => b.moveUp.text)).toEqual(['2 cm', '2 cm', '2 cm']);
    expect(plan.notes.map((n) => n.code)).toEqual(['move-buttons', 'restitch-buttonholes', 'remake-vent-corners']);
  });

  it('working buttonholes: from the shoulder, buttons left where they are (common practice (no source))', () => {
    const plan = shortenSleeve({ unit: 'in', shortenBy: '3/4', buttonholes: 'working' });
    expect([plan.method, plan.newEdgeAboveEdge, plan.cutAboveEdge]).toEqual(['shoulder', null, null]);
    expect(plan.buttons.every((b) => b.moveUp.mm === 0)).toBe(true);
    expect(plan.notes.map((n) => n.code)).toEqual(['working-buttonholes-shorten-at-shoulder', 'recut-sleeve-head']);
  });

  it('a shop that allows 1/4 in at the cuff with working buttonholes: the holes stay and come 1/4 in nearer the edge (shop may change)', () => {
    const plan = shortenSleeve({ unit: 'in', shortenBy: '1/4', buttonholes: 'working', workingButtonholeSlack: '1/4' });
    expect(plan.method).toBe('cuff');
    expect(plan.buttons[0]!.aboveNewEdge.text).toBe('1 in');
    expect(plan.buttons[0]!.moveUp.text).toBe('0 in');
    expect(plan.notes.map((n) => n.code)).toContain('buttonholes-closer-to-edge');
  });

  it('a 4 in vent shortened 1 1/4 in no longer holds four buttons 5/8 in apart: two fit, or all four 1/3 in apart, shown floored as 5/16 in (arithmetic)', () => {
    const plan = shortenSleeve({ unit: 'in', shortenBy: '1 1/4', buttonholes: 'none', ventLength: 4 });
    expect(plan.ventAfter?.text).toBe('2 3/4 in');
    // top button 3 1/8 in; margin 1/2 in (common practice (no source)): room = 2 3/4 − 3 1/8 − 1/2 = −7/8 in.
    expect(plan.ventRoom?.text).toBe('-7/8 in');
    const short = plan.notes.find((n) => n.code === 'vent-too-short-for-buttons')!;
    expect(short.values.buttonsThatFit).toBe(2);
    expect((short.values.spacingThatFits as { text: string }).text).toBe('5/16 in');
    const m = shortenSleeve({ unit: 'mm', shortenBy: 30, buttonholes: 'none', ventLength: 100, bottomButtonAboveEdge: 30, buttonSpacing: 20 });
    // space = 100 − 30 − 12 − 30 = 28 mm for 3 gaps: 9.33 mm, floored to 9 mm (not rounded up to 9.5).
    expect((m.notes.find((n) => n.code === 'vent-too-short-for-buttons')!.values.spacingThatFits as { text: string }).text).toBe('9 mm');
  });

  it('shortened past the vent: the vent would be cut away, so from the shoulder (common practice (no source))', () => {
    expect(shortenSleeve({ unit: 'in', shortenBy: 4, buttonholes: 'none', ventLength: 4, buttons: 0 }).method).toBe('shoulder');
    expect(codes({ unit: 'in', shortenBy: 4, buttonholes: 'none', ventLength: 4, buttons: 0 })[0]).toBe('vent-cut-away-shorten-at-shoulder');
  });

  it('the lining: shortened as the sleeve, plus a fold moved up, less a pleat made deeper (derived)', () => {
    expect(shortenSleeve({ unit: 'in', shortenBy: 1, buttonholes: 'none' }).lining.shortenBy.text).toBe('1 in');
    const plan = shortenSleeve({ unit: 'mm', shortenBy: 20, buttonholes: 'none', liningFoldNow: 8, liningPleatNow: 5 });
    // 20 + (12 − 8) − (12 − 5) = 17 mm (defaults 12 mm fold and pleat: common practice (no source)).
    expect([plan.lining.shortenBy.text, plan.lining.foldAboveEdge.text, plan.lining.easePleat.text]).toEqual(['17 mm', '12 mm', '12 mm']);
  });

  it.each([
    [{ shortenBy: 0 }, 'shortenBy', 'not-positive'],
    [{ buttonholes: 'hand' }, 'buttonholes', 'bad-choice'],
    [{ buttons: 2.5 }, 'buttons', 'out-of-range'],
    [{ buttons: 'many' }, 'buttons', 'not-a-number'],
    [{ ventLength: 2 }, 'ventLength', 'impossible-shape'],
  ])('refuses %o in field %s (%s)', (fields, field, code) => {
    const input = { unit: 'in', shortenBy: 1, buttonholes: 'none', ...fields } as SleeveInput;
    expect(() => shortenSleeve(input)).toThrow(AllowanceError);
    expect(() => shortenSleeve(input)).toThrow(expect.objectContaining({ field, code }));
    expect(validateSleeveInput(input).map((e) => [e.field, e.code])).toContainEqual([field, code]);
  });
});

describe('shortenSleeve laws', () => {
  const k16 = (min: number, max: number) => fc.integer({ min, max }).map((k) => k / 16);
  const arb = fc.record({
    s: k16(1, 64),
    holes: fc.constantFrom('none', 'decorative', 'working') as fc.Arbitrary<SleeveInput['buttonholes']>,
    n: fc.integer({ min: 0, max: 5 }),
    vent: fc.option(k16(64, 128)),
  });

  it('at the cuff the buttons move up exactly as far as the sleeve is shortened, keeping their distance from the edge', () => {
    fc.assert(
      fc.property(arb, ({ s, holes, n, vent }) => {
        const plan = shortenSleeve({ unit: 'in', shortenBy: s, buttonholes: holes, buttons: n, ...(vent === null ? {} : { ventLength: vent }) });
        const before = shortenSleeve({ unit: 'in', shortenBy: 1 / 16, buttonholes: 'none', buttons: n }).buttons;
        plan.buttons.forEach((b, k) => {
          if (plan.method === 'cuff' && holes !== 'working') {
            expect(b.moveUp.mm).toBeCloseTo(s * IN, 9);
            expect(b.aboveNewEdge.mm).toBeCloseTo(before[k]!.aboveNewEdge.mm, 9);
          } else expect(b.moveUp.mm).toBe(0);
        });
      }),
    );
  });

  it('working buttonholes forbid the cuff past the slack; the shoulder is chosen exactly then or when the vent would go', () => {
    fc.assert(
      fc.property(arb, ({ s, holes, n, vent }) => {
        fc.pre(vent === null || n === 0 || 1.25 + (n - 1) * 0.625 < vent);
        const plan = shortenSleeve({ unit: 'in', shortenBy: s, buttonholes: holes, buttons: n, ...(vent === null ? {} : { ventLength: vent }) });
        expect(plan.method === 'shoulder').toBe(holes === 'working' || (vent !== null && s >= vent));
      }),
    );
  });

  it('the vent loses what the sleeve loses at the cuff; the lining loses it too when fold and pleat are kept', () => {
    fc.assert(
      fc.property(arb, ({ s, n, vent }) => {
        fc.pre(vent !== null && s < vent && (n === 0 || 1.25 + (n - 1) * 0.625 < vent));
        const plan = shortenSleeve({ unit: 'in', shortenBy: s, buttonholes: 'none', buttons: n, ventLength: vent! });
        expect(plan.ventAfter!.mm).toBeCloseTo((vent! - s) * IN, 9);
        expect(plan.lining.shortenBy.mm).toBeCloseTo(s * IN, 9);
      }),
    );
  });
});
