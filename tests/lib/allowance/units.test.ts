import convert from 'convert-units';
import fc from 'fast-check';
import Fraction from 'fraction.js';
import { all, create } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { MM_PER_INCH, isUnit, mmToUnit, parseLength, toInches } from '@/lib/allowance';
import { parseExact } from '@/lib/allowance/parse-length';

const math = create(all!, { number: 'Fraction' });

describe('units', () => {
  it('1 in = 25.4 mm exactly (NBS 1959)', () => {
    expect(MM_PER_INCH.equals(new Fraction(254, 10))).toBe(true);
    expect(parseLength('1 in', 'mm').mm).toBe(25.4);
  });

  it('inch to mm agrees with convert-units to 1e-6 relative (convert-units uses 3.28084 ft/m)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 6400 }), (k) => {
        const text = `${k}/32`;
        const ours = parseLength(text, 'in').mm;
        const theirs = convert(k / 32)
          .from('in')
          .to('mm');
        expect(Math.abs(ours - theirs) / theirs).toBeLessThan(1e-6);
      }),
    );
  });

  it('mm to inches agrees with convert-units to 1e-6 relative (convert-units)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10160 }), (halfMm) => {
        const mm = halfMm / 2;
        const theirs = convert(mm).from('mm').to('in');
        expect(Math.abs(toInches(mm) - theirs) / theirs).toBeLessThan(1e-6);
        expect(mmToUnit(mm, 'in')).toBe(toInches(mm));
      }),
    );
  });

  it('inch and cm to mm agree exactly with mathjs unit conversion in Fraction mode (mathjs)', () => {
    fc.assert(
      fc.property(fc.integer({ min: -6400, max: 6400 }), fc.integer({ min: 1, max: 64 }), fc.constantFrom('in', 'cm'), (n, d, unit) => {
        fc.pre(Math.abs(n / d) <= 200);
        const ours = parseExact(`${n < 0 ? '-' : ''}${Math.abs(n)}/${d} ${unit}`, 'mm');
        const mathjsUnit = unit === 'in' ? 'inch' : 'cm';
        const theirs = math.unit(math.fraction(n, d), mathjsUnit).toNumeric('mm') as Fraction;
        expect(ours.equals(theirs)).toBe(true);
      }),
    );
  });

  it('knows its units', () => {
    expect(['in', 'cm', 'mm'].every(isUnit)).toBe(true);
    expect(isUnit('ft')).toBe(false);
    expect(mmToUnit(38, 'cm')).toBe(3.8);
    expect(mmToUnit(38, 'mm')).toBe(38);
  });
});
