import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { AllowanceError, type OriginalHemInput, planOriginalHem, validateOriginalHemInput } from '@/lib/allowance';

const IN = 25.4;
const at = (plan: ReturnType<typeof planOriginalHem>) => Object.fromEntries(plan.lines.map((l) => [l.name, l.belowMark.text]));

describe('planOriginalHem examples', () => {
  it('2 in shorter, 5/8 in factory hem, 3/8 in seams: cut 1 1/4 in away, the join takes 3/4 in (derived arithmetic; 3/8 in seam common practice (no source))', () => {
    const plan = planOriginalHem({ unit: 'in', shortenBy: 2, factoryHem: '5/8', inseamNow: 32 });
    expect(plan.method).toBe('cut-and-join');
    expect(at(plan)).toEqual({ join: '-5/8 in', 'leg-cut': '-1/4 in', 'band-cut': '1 in', 'band-top': '1 3/8 in', 'present-edge': '2 in' });
    expect([plan.removed.text, plan.seamTakes.text]).toEqual(['1 1/4 in', '3/4 in']);
    // the two pieces: crotch to leg cut 29 3/4 in, band 1 in: 30 3/4 in = the new 30 in + 2 × 3/8 in.
    expect([plan.pieces.leg?.text, plan.pieces.band.text, plan.pieces.total?.text, plan.pieces.newInseam?.text]).toEqual([
      '29 3/4 in',
      '1 in',
      '30 3/4 in',
      '30 in',
    ]);
    expect(plan.cautions).toContain('heavy-seams-needle');
  });

  it('1/2 in shorter is under twice the seam allowance: fold only, half-way between the join and the band top (derived)', () => {
    const plan = planOriginalHem({ unit: 'in', shortenBy: '1/2', factoryHem: '5/8' });
    expect(plan.method).toBe('fold-only');
    expect(at(plan)).toEqual({ join: '-5/8 in', fold: '-3/8 in', 'band-top': '-1/8 in', 'present-edge': '1/2 in' });
    expect(plan.removed.text).toBe('0 in');
    expect(plan.notes.map((n) => n.code)).toEqual(['chalk-on-both-legs', 'fold-only']);
  });

  it('metric: 5 cm shorter, 2 cm hem, 1 cm seams: cut 3 cm away (derived)', () => {
    const plan = planOriginalHem({ unit: 'cm', shortenBy: 5, factoryHem: 2, seamAllowance: 1 });
    expect(at(plan)).toEqual({ join: '-2 cm', 'leg-cut': '-1 cm', 'band-cut': '2 cm', 'band-top': '3 cm', 'present-edge': '5 cm' });
    expect(plan.removed.text).toBe('3 cm');
  });

  it('taper at the new height: 7 in flat at the edge, 8 in 10 in up, 2 1/2 in shorter: the leg is 1/4 in wider than the band (arithmetic; 1/8 in tolerance TRADE.md common practice)', () => {
    const plan = planOriginalHem({ unit: 'in', shortenBy: '2 1/2', factoryHem: '5/8', widthAtEdge: 7, widthAbove: 8, heightAbove: 10 });
    expect(plan.taper).toEqual({
      mismatch: { mm: IN / 4, text: '1/4 in' },
      perSeam: { mm: IN / 4, text: '1/4 in' },
      perSide: { mm: IN / 8, text: '1/8 in' },
      withinTolerance: false,
    });
    expect(plan.notes.map((n) => n.code)).toContain('take-in-leg-above-join');
    const boot = planOriginalHem({ unit: 'in', shortenBy: '2 1/2', factoryHem: '5/8', widthAtEdge: 9, widthAbove: 8, heightAbove: 10 });
    expect(boot.notes.map((n) => n.code)).toContain('take-in-band');
    const slight = planOriginalHem({ unit: 'in', shortenBy: 1, factoryHem: '5/8', widthAtEdge: 7, widthAbove: 8, heightAbove: 10 });
    expect(slight.taper?.withinTolerance).toBe(true);
  });

  it.each([
    [{ shortenBy: 0 }, 'shortenBy', 'not-positive'],
    [{ factoryHem: undefined }, 'factoryHem', 'missing'],
    [{ widthAtEdge: 7 }, 'widthAbove', 'missing'],
    [{ inseamNow: 2 }, 'shortenBy', 'impossible-shape'],
  ])('refuses %o in field %s (%s)', (fields, field, code) => {
    const input = { unit: 'in', shortenBy: 2, factoryHem: '5/8', ...fields } as OriginalHemInput;
    expect(() => planOriginalHem(input)).toThrow(AllowanceError);
    expect(() => planOriginalHem(input)).toThrow(expect.objectContaining({ field, code }));
    expect(validateOriginalHemInput(input).map((e) => [e.field, e.code])).toContainEqual([field, code]);
  });
});

describe('planOriginalHem laws', () => {
  const k32 = (min: number, max: number) => fc.integer({ min, max }).map((k) => k / 32);
  const arb = fc.record({ s: k32(1, 256), h: k32(8, 48), a: k32(4, 24), inseam: k32(800, 1200) });

  it('cut-and-join ⇔ shortening ≥ 2 × seam allowance, and then the lines run in order: join, leg cut ≤ band cut, band top, edge', () => {
    fc.assert(
      fc.property(arb, ({ s, h, a }) => {
        const plan = planOriginalHem({ unit: 'in', shortenBy: s, factoryHem: h, seamAllowance: a });
        expect(plan.method === 'cut-and-join').toBe(s >= 2 * a);
        const mm = plan.lines.map((l) => l.belowMark.mm);
        for (let k = 1; k < mm.length; k++) {
          const tie = plan.lines[k - 1]!.name === 'leg-cut' && plan.lines[k]!.name === 'band-cut';
          if (tie) expect(mm[k]!).toBeGreaterThanOrEqual(mm[k - 1]!);
          else expect(mm[k]!).toBeGreaterThan(mm[k - 1]!);
        }
      }),
    );
  });

  it('the two pieces are the new length + 2 × seam allowance; cloth removed + 2a = the shortening', () => {
    fc.assert(
      fc.property(arb, ({ s, h, a, inseam }) => {
        fc.pre(s >= 2 * a);
        const plan = planOriginalHem({ unit: 'in', shortenBy: s, factoryHem: h, seamAllowance: a, inseamNow: inseam });
        expect(plan.pieces.total!.mm).toBeCloseTo((inseam - s + 2 * a) * IN, 9);
        expect(plan.removed.mm + plan.seamTakes.mm).toBeCloseTo(s * IN, 9);
      }),
    );
  });

  it('folding only, the fold lies half-way between the join and the band top (they meet when folded)', () => {
    fc.assert(
      fc.property(arb, ({ s, h, a }) => {
        fc.pre(s < 2 * a);
        const pos = Object.fromEntries(
          planOriginalHem({ unit: 'in', shortenBy: s, factoryHem: h, seamAllowance: a }).lines.map((l) => [l.name, l.belowMark.mm]),
        );
        expect(pos.fold! - pos.join!).toBeCloseTo(pos['band-top']! - pos.fold!, 9);
      }),
    );
  });

  it('the taper mismatch grows with the shortening and is 0 on a straight leg', () => {
    fc.assert(
      fc.property(arb, k32(-32, 32), k32(1, 256), ({ s, h }, dw, extra) => {
        const at = (x: number) =>
          planOriginalHem({ unit: 'in', shortenBy: x, factoryHem: h, widthAtEdge: 8, widthAbove: 8 + dw, heightAbove: 12 }).taper!.mismatch.mm;
        if (dw === 0) expect(at(s)).toBe(0);
        else expect(Math.abs(at(s + extra))).toBeGreaterThan(Math.abs(at(s)));
      }),
    );
  });
});
