import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { AllowanceError, HEM_POINTS, type LevelHemInput, levelHem, validateLevelHemInput } from '@/lib/allowance';

const changes = (input: LevelHemInput) => levelHem(input).points.map((p) => [p.at, p.newLineAboveEdge.text]);

describe('levelHem examples', () => {
  it('marker set at the hem wanted: the new line runs along the pins; each place shortens by its pin height (arithmetic; common practice (no source))', () => {
    const plan = levelHem({
      unit: 'in',
      markerHeight: 15,
      hemFromFloor: 15,
      points: [
        { at: 'centre-front', pinAboveEdge: 1 },
        { at: 'left-side', pinAboveEdge: '3/4' },
        { at: 'centre-back', pinAboveEdge: '1/2' },
      ],
    });
    expect(plan.newLineBelowPins.text).toBe('0 in');
    expect(plan.points.map((p) => [p.at, p.newLineAboveEdge.text, p.cutAboveEdge.text])).toEqual([
      ['centre-front', '1 in', '-1 in'],
      ['left-side', '3/4 in', '-1 1/4 in'],
      ['centre-back', '1/2 in', '-1 1/2 in'],
    ]);
    expect(plan.unevenBy.text).toBe('1/2 in');
    expect(plan.notes.map((n) => n.code)).toEqual(['chalk-from-pins', 'uneven-hem']);
  });

  it('marker at 12 in for a hem 14 in from the floor: the new line runs 2 in above the pins (arithmetic)', () => {
    const plan = levelHem({ unit: 'in', markerHeight: 12, hemFromFloor: 14, points: [{ at: 'centre-front', pinAboveEdge: '1/2' }] });
    expect(plan.newLineBelowPins.text).toBe('-2 in');
    expect(changes({ unit: 'in', markerHeight: 12, hemFromFloor: 14, points: [{ at: 'centre-front', pinAboveEdge: '1/2' }] })).toEqual([
      ['centre-front', '2 1/2 in'],
    ]);
  });

  it('marked in flats, worn with shoes lifting 2 in: the hem rises 2 in with the wearer, so it is made 2 in longer (derived; mark in the shoes to be worn, common practice (no source))', () => {
    const base = { unit: 'in', markerHeight: 15, hemFromFloor: 15, points: [{ at: 'centre-back', pinAboveEdge: 3 }] } as const;
    expect(changes(base)).toEqual([['centre-back', '3 in']]);
    const heels = levelHem({ ...base, shoesAtMarking: 0, shoesToWear: 2 });
    expect(heels.points[0]!.newLineAboveEdge.text).toBe('1 in');
    expect(heels.shoeRise.text).toBe('2 in');
    expect(heels.notes.map((n) => n.code)).toContain('shoes-differ');
  });

  it('letting down: the old fold shows, and the cloth is checked with a 5 cm hem (arithmetic)', () => {
    const plan = levelHem({
      unit: 'cm',
      markerHeight: 40,
      hemFromFloor: 43,
      hemDepth: 5,
      points: [
        { at: 'centre-front', pinAboveEdge: 1, cloth: 8 },
        { at: 'centre-back', pinAboveEdge: 2, cloth: 5 },
      ],
    });
    expect(plan.points.map((p) => [p.newLineAboveEdge.text, p.spare?.text, p.enough])).toEqual([
      ['4 cm', '7 cm', true],
      ['5 cm', '5 cm', true],
    ]);
    const down = levelHem({ unit: 'cm', markerHeight: 40, hemFromFloor: 36, hemDepth: 5, points: [{ at: 'left-back', pinAboveEdge: 1, cloth: 6 }] });
    expect(down.points[0]!.newLineAboveEdge.text).toBe('-3 cm');
    expect([down.points[0]!.spare?.text, down.points[0]!.enough]).toEqual(['-2 cm', false]);
    expect(down.notes).toContainEqual({ code: 'not-enough-cloth', values: { at: 'left-back', shortBy: { mm: 20, text: '2 cm' } } });
    expect(down.notes.map((n) => n.code)).toContain('old-hem-line-shows');
  });

  it.each([
    [{ points: [] }, 'points', 'out-of-range'],
    [{ points: [{ at: 'hip', pinAboveEdge: 1 }] }, 'points.0.at', 'bad-choice'],
    [{ points: [{ at: 'centre-front', pinAboveEdge: -1 }] }, 'points.0.pinAboveEdge', 'negative'],
    [
      {
        points: [
          { at: 'centre-front', pinAboveEdge: 1 },
          { at: 'centre-front', pinAboveEdge: 2 },
        ],
      },
      'points.1.at',
      'impossible-shape',
    ],
    [{ markerHeight: 0, points: [{ at: 'centre-front', pinAboveEdge: 1 }] }, 'markerHeight', 'not-positive'],
  ])('refuses %o in field %s (%s)', (fields, field, code) => {
    const input = { unit: 'in', markerHeight: 15, hemFromFloor: 15, ...fields } as LevelHemInput;
    expect(() => levelHem(input)).toThrow(AllowanceError);
    expect(() => levelHem(input)).toThrow(expect.objectContaining({ field, code }));
    expect(validateLevelHemInput(input).map((e) => [e.field, e.code])).toContainEqual([field, code]);
  });
});

describe('levelHem laws', () => {
  const k16 = (min: number, max: number) => fc.integer({ min, max }).map((k) => k / 16);
  const arb = fc.record({
    marker: k16(64, 640),
    floor: k16(16, 640),
    shoesAt: k16(0, 64),
    shoesTo: k16(0, 64),
    pins: fc.uniqueArray(fc.tuple(fc.constantFrom(...HEM_POINTS), k16(0, 96), k16(0, 64)), { minLength: 1, maxLength: 8, selector: (p) => p[0] }),
  });
  type Drawn = typeof arb extends fc.Arbitrary<infer T> ? T : never;
  const plan = (a: Drawn, shift = { floor: 0, rise: 0 }) =>
    levelHem({
      unit: 'in',
      markerHeight: a.marker,
      hemFromFloor: a.floor + shift.floor,
      shoesAtMarking: a.shoesAt,
      shoesToWear: a.shoesTo + shift.rise,
      points: a.pins.map(([at, pin, cloth]) => ({ at, pinAboveEdge: pin, cloth })),
    });

  it('the new line is level: between two places it differs as the pins do, and unevenBy is the spread', () => {
    fc.assert(
      fc.property(arb, (a) => {
        const p = plan(a).points;
        for (const x of p) for (const y of p) expect(x.newLineAboveEdge.mm - y.newLineAboveEdge.mm).toBeCloseTo(x.pinAboveEdge.mm - y.pinAboveEdge.mm, 9);
        const c = p.map((x) => x.newLineAboveEdge.mm);
        expect(plan(a).unevenBy.mm).toBeCloseTo(Math.max(...c) - Math.min(...c), 9);
      }),
    );
  });

  it('higher shoes ⇒ a longer hem by exactly the rise; a higher hem wanted ⇒ shorter by exactly that', () => {
    fc.assert(
      fc.property(arb, k16(1, 48), (a, t) => {
        const base = plan(a).points;
        const heels = plan(a, { floor: 0, rise: t }).points;
        const higher = plan(a, { floor: t, rise: 0 }).points;
        base.forEach((p, k) => {
          expect(p.newLineAboveEdge.mm - heels[k]!.newLineAboveEdge.mm).toBeCloseTo(t * 25.4, 9);
          expect(higher[k]!.newLineAboveEdge.mm - p.newLineAboveEdge.mm).toBeCloseTo(t * 25.4, 9);
        });
      }),
    );
  });

  it('enough ⇔ spare ≥ 0, with spare = cloth + change − hem depth', () => {
    fc.assert(
      fc.property(arb, (a) => {
        const r = plan(a);
        r.points.forEach((p, k) => {
          const cloth = a.pins[k]![2] * 25.4;
          expect(p.spare!.mm).toBeCloseTo(cloth + p.newLineAboveEdge.mm - r.hemDepth.mm, 9);
          expect(p.enough).toBe(p.spare!.mm >= 0);
        });
      }),
    );
  });
});
