import { describe, expect, it } from 'vitest';
import { AllowanceError } from '@/lib/allowance';
import { readLengthTerms, termUnits } from '@/lib/allowance/length-terms';

describe('readLengthTerms', () => {
  it('reads a mixed number as one term', () => {
    expect(readLengthTerms('1 1/2')).toEqual([{ sign: 1, whole: '1', num: '1', den: '2', unit: null }]);
    expect(readLengthTerms('1-1/2')).toEqual([{ sign: 1, whole: '1', num: '1', den: '2', unit: null }]);
    expect(readLengthTerms('1½ in')).toEqual([{ sign: 1, whole: '1', num: '1', den: '2', unit: 'in' }]);
  });

  it('reads spaced + and - as arithmetic', () => {
    expect(readLengthTerms('31 3/4 + 1/8')).toEqual([
      { sign: 1, whole: '31', num: '3', den: '4', unit: null },
      { sign: 1, whole: null, num: '1', den: '8', unit: null },
    ]);
    expect(readLengthTerms('-32 - 1/4')).toMatchObject([{ sign: -1 }, { sign: -1 }]);
  });

  it('keeps decimals as typed', () => {
    expect(readLengthTerms('3.85cm')).toEqual([{ sign: 1, whole: '3.85', num: null, den: null, unit: 'cm' }]);
  });

  it('refuses a second sign after an operator', () => {
    expect(() => readLengthTerms('1 + -2')).toThrow(AllowanceError);
  });
});

describe('termUnits', () => {
  it('uses the plan unit when none is named', () => {
    expect(termUnits(readLengthTerms('1 + 2'), 'cm')).toEqual(['cm', 'cm']);
  });

  it('never lends a named unit to the unnamed parts: a bare number is the plan unit', () => {
    expect(termUnits(readLengthTerms('30 in + 1/2'), 'mm')).toEqual(['in', 'mm']);
    expect(termUnits(readLengthTerms('30 + 5 mm'), 'in')).toEqual(['in', 'mm']);
  });

  it('takes each named unit as named', () => {
    expect(termUnits(readLengthTerms('30 in + 5 mm'), 'cm')).toEqual(['in', 'mm']);
    expect(termUnits(readLengthTerms('30 in + 5 mm + 1'), 'cm')).toEqual(['in', 'mm', 'cm']);
  });
});
