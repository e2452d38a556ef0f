import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { AllowanceError, formatLength, parseLength, type Precision, type Unit } from '@/lib/allowance';
import Fraction from 'fraction.js';
import { parseExact, withUnitsNamed } from '@/lib/allowance/parse-length';
import { parseExactWithMathjs } from '@/lib/allowance/length-expression';

// 1 in = 25.4 mm exactly (NBS 1959): every inch value below is that arithmetic.
describe('parseLength accepts', () => {
  it.each([
    ['1 1/2', 'in', 38.1, '1 1/2 in'],
    ['1½', 'in', 38.1, '1 1/2 in'],
    ['1 ½', 'in', 38.1, '1 1/2 in'],
    ['1-1/2', 'in', 38.1, '1 1/2 in'],
    ['1.5', 'in', 38.1, '1 1/2 in'],
    ['.5', 'in', 12.7, '1/2 in'],
    ['3/2', 'in', 38.1, '1 1/2 in'],
    ['1 ⁹⁄₁₆', 'in', 39.6875, '1 9/16 in'],
    ['1⁹⁄₁₆', 'in', 39.6875, '1 9/16 in'],
    ['9⁄16', 'in', 14.2875, '9/16 in'],
    ['⅝', 'in', 15.875, '5/8 in'],
    ['2¾ in', 'in', 69.85, '2 3/4 in'],
    ['1 1/2"', 'in', 38.1, '1 1/2 in'],
    ['1 1/2 inches', 'in', 38.1, '1 1/2 in'],
    ['1 1/2 IN', 'in', 38.1, '1 1/2 in'],
    ['38 mm', 'in', 38, '1 1/2 in'],
    ['3.8cm', 'in', 38, '1 1/2 in'],
    ['38', 'mm', 38, '38 mm'],
    ['3.85', 'cm', 38.5, '3.85 cm'],
    ['1 in', 'mm', 25.4, '25.5 mm'],
    ['31 3/4 + 1/8', 'in', 809.625, '31 7/8 in'],
    ['31 3/4+1/8', 'in', 809.625, '31 7/8 in'],
    ['32 - 1/4', 'in', 806.45, '31 3/4 in'],
    ['32 − 1/4', 'in', 806.45, '31 3/4 in'],
    ['32-1/4', 'in', 819.15, '32 1/4 in'],
    ['30 in + 5 mm', 'in', 767, '30 3/16 in'],
    ['30 in + 1/2', 'mm', 762.5, '762.5 mm'],
    ['-1/4', 'in', -6.35, '-1/4 in'],
    ['- 1 1/4', 'in', -31.75, '-1 1/4 in'],
    ['  2  ', 'in', 50.8, '2 in'],
    ['200', 'in', 5080, '200 in'],
    ['-200 in', 'mm', -5080, '-5080 mm'],
    ['⅓', 'in', 127 / 15, '5/16 in'],
  ] as const)('"%s" in a %s plan → %s mm, "%s" (arithmetic)', (text, unit, mm, shown) => {
    const len = parseLength(text, unit);
    expect(len.mm).toBeCloseTo(mm, 9);
    expect(len.text).toBe(shown);
  });

  it('shows the result at the precision asked for', () => {
    expect(parseLength('40 mm', 'in', 8).text).toBe('1 5/8 in');
    expect(parseLength('40 mm', 'in', 32).text).toBe('1 9/16 in');
  });
});

describe('parseLength refuses', () => {
  it.each([
    ['', 'empty'],
    ['   ', 'empty'],
    ['abc', 'not-a-length'],
    ['1/0', 'divide-by-zero'],
    ['1 1/0', 'divide-by-zero'],
    ['1e400', 'not-a-length'],
    ['1e5', 'not-a-length'],
    ['NaN', 'not-a-length'],
    ['Infinity', 'not-a-length'],
    ['-Infinity', 'not-a-length'],
    ['--2', 'not-a-length'],
    ['1//2', 'not-a-length'],
    ['1 1/2/3', 'not-a-length'],
    ['2 in cm', 'bad-unit'],
    ['½½', 'not-a-length'],
    // a decimal comma is for metric lengths: in an inch plan it is refused (our rule)
    ['1,5', 'not-a-length'],
    ['1,500 mm', 'not-a-length'],
    ['1,5,2 mm', 'not-a-length'],
    ['5-3', 'not-a-length'],
    ['32 -1/4', 'not-a-length'],
    ['1 3/2', 'not-a-length'],
    ['1.5 1/2', 'not-a-length'],
    ['1.5/2', 'not-a-length'],
    ['1 2', 'not-a-length'],
    ['1.2.3', 'not-a-length'],
    ['1.', 'not-a-length'],
    ['+', 'not-a-length'],
    ['1 +', 'not-a-length'],
    ['in', 'not-a-length'],
    ['2 ft', 'bad-unit'],
    ["2'", 'bad-unit'],
    ['201', 'too-large'],
    ['5081 mm', 'too-large'],
    ['99999999999999999999999', 'too-large'],
    ['1 + 1/2 * 3', 'not-a-length'],
    ['(1)', 'not-a-length'],
    ['x = 3', 'not-a-length'],
    ['1 🧵', 'not-a-length'],
    ['1'.repeat(200), 'not-a-length'],
  ])('"%s" with code %s and a message', (text, code) => {
    let caught: unknown;
    try {
      parseLength(text, 'in');
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(AllowanceError);
    expect((caught as AllowanceError).code).toBe(code);
    expect((caught as AllowanceError).message.length).toBeGreaterThan(10);
  });

  it('explains the decimal comma in inches, repeating what was typed', () => {
    expect(() => parseLength('1,5', 'in')).toThrow(/“1,5”.*point/);
  });

  it.each([
    // decimal commas as metric shops write them (arithmetic: 1 cm = 10 mm)
    ['3,8 cm', 'in', 38],
    ['3,8 cm', 'cm', 38],
    ['1,5', 'cm', 15],
    ['1,5', 'mm', 1.5],
    ['38,5 mm', 'mm', 38.5],
    ['1,50', 'cm', 15],
    ['31,75 + 0,5', 'cm', 322.5],
  ] as const)('reads the decimal comma in "%s" in a %s plan as %s mm (arithmetic)', (text, unit, mm) => {
    expect(parseLength(text, unit).mm).toBeCloseTo(mm, 9);
  });

  it.each([
    ['1,500', 'cm'],
    ['1,5,2', 'mm'],
    ['1,5.2', 'cm'],
    ['1.5,2', 'mm'],
  ] as const)('refuses the unclear "%s" in a %s plan with a message that repeats it', (text, unit) => {
    expect(() => parseLength(text, unit)).toThrow(expect.objectContaining({ code: 'not-a-length' }));
    let message = '';
    try {
      parseLength(text, unit);
    } catch (e) {
      message = (e as Error).message;
    }
    expect(message).toContain(text.startsWith('1.5,') ? '1.5,2' : text);
  });

  it('strips invisible characters (zero-width space, BOM, soft hyphen, word joiner) before reading (1 in = 25.4 mm, NBS 1959)', () => {
    expect(parseLength('1\u200B 1/2', 'in').mm).toBeCloseTo(38.1, 9);
    expect(parseLength('\uFEFF38 mm', 'in').mm).toBe(38);
    expect(parseLength('3\u00AD8', 'mm').mm).toBe(38);
    expect(parseLength('1\u2060½\u200E', 'in').mm).toBeCloseTo(38.1, 9);
    expect(() => parseLength('\u200B\uFEFF', 'in')).toThrow(expect.objectContaining({ code: 'empty' }));
  });

  it('a bare number always means the plan unit: "30 + 5 mm" in an inch plan is 30 in + 5 mm = 767 mm, not 35 mm (NBS 1959 arithmetic)', () => {
    expect(parseLength('30 + 5 mm', 'in').mm).toBeCloseTo(767, 9);
    expect(parseLength('30 in + 1/2', 'mm').mm).toBeCloseTo(762.5, 9);
    expect(parseLength('30 in + 5 mm + 1', 'cm').mm).toBeCloseTo(777, 9);
  });

  it("names every part's unit so the text reads the same in a plan of another unit", () => {
    expect(withUnitsNamed('30 + 5 mm', 'in')).toBe('30 in + 5 mm');
    expect(withUnitsNamed('-1 1/2 - 1/8', 'in')).toBe('-1 1/2 in - 1/8 in');
    expect(withUnitsNamed('3,8', 'cm')).toBe('3.8 cm');
    for (const [text, unit] of [
      ['30 + 5 mm', 'in'],
      ['31 3/4 + 1/8', 'in'],
      ['3,8 + 2 mm', 'cm'],
    ] as const) {
      expect(parseLength(withUnitsNamed(text, unit), 'mm').mm).toBe(parseLength(text, unit).mm);
    }
  });

  it('refuses a unit outside in, cm, mm', () => {
    expect(() => parseLength('1', 'ft' as Unit)).toThrow(AllowanceError);
  });
});

const unitArb = fc.constantFrom<Unit>('in', 'cm', 'mm');
const precisionArb = fc.constantFrom<Precision>(8, 16, 32);

/** Simple forms that take the fast path: whole, decimal, fraction, mixed, with or without a unit. */
const simpleText = fc
  .tuple(
    fc.integer({ min: 0, max: 150 }),
    fc.integer({ min: 0, max: 63 }),
    fc.constantFrom(2, 4, 8, 16, 32, 64, 3, 10),
    fc.constantFrom('', ' in', ' mm', 'cm', '"'),
    fc.constantFrom('mixed', 'hyphen', 'fraction', 'decimal', 'whole'),
    fc.boolean(),
  )
  .map(([w, n, d, unit, form, neg]) => {
    const num = n % d;
    const body =
      form === 'mixed' && num > 0
        ? `${w} ${num}/${d}`
        : form === 'hyphen' && num > 0
          ? `${w}-${num}/${d}`
          : form === 'fraction'
            ? `${w * d + num}/${d}`
            : form === 'decimal'
              ? `${w}.${n}`
              : `${w}`;
    return `${neg ? '-' : ''}${body}${unit}`;
  });

describe('parseLength laws', () => {
  it('the fraction.js fast path equals the mathjs path', () => {
    fc.assert(
      fc.property(simpleText, unitArb, (text, unit) => {
        expect(parseExact(text, unit).equals(parseExactWithMathjs(text, unit))).toBe(true);
      }),
    );
  });

  it('a sum added with fraction.js equals the sum worked out by mathjs (mathjs in Fraction mode)', () => {
    const op = fc.constantFrom(' + ', ' - ', '+', ' − ');
    fc.assert(
      fc.property(simpleText, fc.array(fc.tuple(op, simpleText), { minLength: 1, maxLength: 4 }), unitArb, (first, rest, unit) => {
        const text = first + rest.map(([o, t]) => o + t.replace(/^-/, '')).join('');
        let ours: Fraction | string;
        let theirs: Fraction | string;
        try {
          ours = parseExact(text, unit);
        } catch (e) {
          if (!(e instanceof AllowanceError)) throw e;
          ours = e.code;
        }
        try {
          theirs = parseExactWithMathjs(text, unit);
        } catch (e) {
          if (!(e instanceof AllowanceError)) throw e;
          theirs = e.code;
        }
        // Both read the same value, or both refuse it for the same reason (out of range, too small).
        if (typeof ours === 'string' || typeof theirs === 'string') expect(ours).toBe(theirs);
        else expect(ours.equals(theirs)).toBe(true);
      }),
    );
  });

  it('a sum typed out equals the sum of its parts', () => {
    fc.assert(
      fc.property(simpleText, simpleText, fc.constantFrom(' + ', ' - ', '+', ' − '), unitArb, (a, b, op, unit) => {
        const pa = parseExact(a, unit);
        const pb = parseExact(b.replace(/^-/, ''), unit);
        // Each part is read alone, so a bare part takes the plan's unit whatever the other part names.
        const text = `${a}${op}${b.replace(/^-/, '')}`;
        const expected = op.includes('+') ? pa.add(pb) : pa.sub(pb);
        fc.pre(expected.abs().compare(5080) <= 0);
        // Under a thousandth of a mm is no length (our rule), e.g. 0.04 in − 1 1/64 mm
        fc.pre(expected.n === 0n || expected.abs().compare(new Fraction(1, 1000)) >= 0);
        expect(parseExact(text, unit).equals(expected)).toBe(true);
      }),
    );
  });

  it('a bare number takes the plan unit, whatever unit another part names', () => {
    const bare = fc.tuple(fc.integer({ min: 0, max: 60 }), fc.integer({ min: 0, max: 15 })).map(([w, n]) => (n === 0 ? `${w}` : `${w} ${n}/16`));
    const named = fc.tuple(fc.integer({ min: 1, max: 60 }), fc.constantFrom('in', 'mm', 'cm')).map(([w, u]) => `${w} ${u}`);
    fc.assert(
      fc.property(bare, named, unitArb, fc.boolean(), (a, b, unit, bareFirst) => {
        const text = bareFirst ? `${a} + ${b}` : `${b} + ${a}`;
        expect(parseExact(text, unit).equals(parseExact(a, unit).add(parseExact(b, unit)))).toBe(true);
      }),
    );
  });

  it('parse(format(x)) lies within half a display step of x', () => {
    fc.assert(
      fc.property(fc.double({ min: -5000, max: 5000, noNaN: true }), unitArb, precisionArb, (mm, unit, precision) => {
        const back = parseLength(formatLength(mm, { unit, precision }), unit, precision).mm;
        const step = unit === 'in' ? 25.4 / precision : 0.5;
        expect(Math.abs(back - mm)).toBeLessThanOrEqual(step / 2 + 1e-9);
      }),
    );
  });

  it('for any text, parseLength returns a finite Len or throws an AllowanceError with a message', () => {
    const alphabet = fc.constantFrom(...'0123456789 ./-+−–⁄,½¼¾⅛⅜⅝⅞⅓⁹₁₆ineschmm"e()*xNaIfty'.split(''));
    const texts = fc.oneof(fc.string({ unit: alphabet, maxLength: 16 }), fc.string({ unit: 'binary', maxLength: 16 }), fc.string());
    fc.assert(
      fc.property(texts, unitArb, (text, unit) => {
        try {
          const len = parseLength(text, unit);
          expect(Number.isFinite(len.mm)).toBe(true);
          expect(Math.abs(len.mm)).toBeLessThanOrEqual(5080);
          expect(len.text).toMatch(/^-?\d/);
        } catch (e) {
          expect(e).toBeInstanceOf(AllowanceError);
          expect((e as AllowanceError).message).not.toBe('');
          // Quoted input may say anything; the engine's own words never leak NaN or undefined
          expect((e as AllowanceError).message.replace(/“[^”]*”/g, '')).not.toMatch(/NaN|undefined|Infinity/);
        }
      }),
      { numRuns: 2000 },
    );
  });
});
