import { describe, expect, it } from 'vitest';
import { validateCuffInput, validateHemInput, validateTaperInput } from '@/lib/allowance';

describe('input validation', () => {
  it('a sound cuff input has no errors', () => {
    expect(validateCuffInput({ unit: 'in', cuffDepth: '1 1/2', available: '5' })).toEqual([]);
  });

  it('names every bad field of a cuff input at once', () => {
    const errors = validateCuffInput({ unit: 'in', cuffDepth: 0, hemSection: 'abc', turnUnder: -1, available: '1/0' });
    expect(errors.map((e) => [e.field, e.code])).toEqual([
      ['cuffDepth', 'not-positive'],
      ['hemSection', 'not-a-length'],
      ['turnUnder', 'negative'],
      ['available', 'divide-by-zero'],
    ]);
    for (const e of errors) expect(e.message).toMatch(/\w{3}/);
  });

  it('a missing cuff depth and a bad unit are named', () => {
    expect(validateCuffInput({ unit: 'in' }).map((e) => e.field)).toEqual(['cuffDepth']);
    expect(validateCuffInput({ unit: 'ft', cuffDepth: 1 }).map((e) => e.field)).toEqual(['unit']);
    expect(validateCuffInput('nonsense').map((e) => e.code)).toEqual(['bad-input']);
  });

  it('checks hem and taper inputs field by field', () => {
    expect(validateHemInput({ unit: 'mm', hemAllowance: -4, slope: 'x' }).map((e) => e.field)).toEqual(['hemAllowance', 'slope']);
    expect(validateTaperInput({ unit: 'in', cuffDepth: 1.5, widthAtEdge: 7, widthAbove: 0 }).map((e) => e.field)).toEqual(['widthAbove', 'heightAbove']);
    expect(validateTaperInput({ unit: 'in', cuffDepth: 1.5, widthAtEdge: 7, widthAbove: 8, heightAbove: 12 })).toEqual([]);
  });

  it('a taper whose widths give no leg at the cut is refused by validation too, on widthAbove (arithmetic: 1.5 mm − 218.5/150 × 114 mm < 0)', () => {
    const errors = validateTaperInput({ unit: 'mm', cuffDepth: 38, widthAtEdge: 1.5, widthAbove: 220, heightAbove: 150 });
    expect(errors.map((e) => [e.field, e.code])).toEqual([['widthAbove', 'out-of-range']]);
    expect(errors[0]!.message).toMatch(/no leg/);
  });
});
