// The reading shown beside a length field and the carrying of typed lengths to another unit.
// 1 in = 25.4 mm exactly (NBS 1959, docs/TRADE.md): every inch figure below is that arithmetic.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseLength, type Unit } from '@/lib/allowance';
import { convertTyped, readLength, typedAndRead, typedWithUnit } from '@/lib/shared/length-reading';

describe('readLength', () => {
  it.each([
    ['31 3/4 + 1/8', 'in', '31 7/8 in'], // 31.75 + 0.125 = 31.875 in
    ['1 ½', 'in', '1 1/2 in'],
    ['38 mm', 'in', '1 1/2 in'], // 38 mm = 1.496 in, nearest 1/8 is 1 1/2
    ['5', 'mm', '5 mm'],
    ['3.85', 'cm', '3.85 cm'],
  ] as const)('reads %s in %s as %s', (typed, unit, shown) => {
    expect(readLength(typed, unit, 8)).toBe(shown);
  });

  it('reads nothing for blank or unreadable text', () => {
    expect(readLength('', 'in', 8)).toBeNull();
    expect(readLength('abc', 'in', 8)).toBeNull();
    expect(readLength('1 1/2 +', 'in', 8)).toBeNull();
  });

  it('agrees with the engine for any sum of fractions', () => {
    const term = fc.tuple(fc.integer({ min: 0, max: 40 }), fc.constantFrom(2, 4, 8, 16, 32), fc.integer({ min: 0, max: 31 }));
    fc.assert(
      fc.property(fc.array(term, { minLength: 1, maxLength: 4 }), fc.constantFrom<Unit>('in', 'cm', 'mm'), (terms, unit) => {
        const text = terms.map(([w, d, n]) => `${w} ${n % d}/${d}`).join(' + ');
        expect(readLength(text, unit, 16)).toBe(parseLength(text, unit, 16).text);
      }),
    );
  });
});

describe('convertTyped', () => {
  it.each([
    ['1 ½', 'in', 'cm', '3.8'], // 38.1 mm to the half millimetre: 38 mm
    ['5', 'in', 'mm', '127'], // 5 × 25.4 = 127 mm
    ['31 3/4 + 1/8', 'in', 'mm', '809.5'], // 809.625 mm to the half millimetre
    ['40', 'mm', 'in', '1 5/8'], // 40 mm = 1.575 in, nearest 1/8 is 1 5/8
    ['38 mm', 'in', 'cm', '3.8'], // a length naming its own unit keeps its meaning
    ['', 'in', 'mm', ''],
  ] as const)('carries %s from %s to %s as %s', (typed, from, to, written) => {
    expect(convertTyped(typed, from, to, 8)).toEqual({ text: written, ok: true });
  });

  it('leaves unreadable text alone and says so', () => {
    expect(convertTyped('1 1/2 +', 'in', 'cm', 8)).toEqual({ text: '1 1/2 +', ok: false });
  });
});

describe('typedWithUnit', () => {
  it('keeps a length that names its own unit as typed, and gives a bare one the form’s unit', () => {
    expect(typedWithUnit('38 mm', 'in')).toBe('38 mm');
    expect(typedWithUnit('1 1/2', 'in')).toBe('1 1/2 in');
    expect(typedWithUnit('31 3/4 + 1/8', 'in')).toBe('31 3/4 + 1/8 in');
  });
});

describe('typedAndRead', () => {
  it('shows a saved length as typed with its own unit, and the shop-unit reading when it says more', () => {
    // 38 mm = 1.496 in: 1 1/2 in to the eighth.
    expect(typedAndRead('38 mm', 'in', 'in', 8)).toBe('38 mm (= 1 1/2 in)');
    expect(typedAndRead('31 3/4 + 1/8', 'in', 'in', 8)).toBe('31 3/4 + 1/8 in (= 31 7/8 in)');
    expect(typedAndRead('1 1/2', 'in', 'in', 8)).toBe('1 1/2 in');
    // 4 cm = 1.575 in: 1 5/8 in to the eighth.
    expect(typedAndRead('4', 'cm', 'in', 8)).toBe('4 cm (= 1 5/8 in)');
  });
});
