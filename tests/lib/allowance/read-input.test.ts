import fc from 'fast-check';
import Fraction from 'fraction.js';
import { describe, expect, it } from 'vitest';
import { AllowanceError } from '@/lib/allowance';
import { cuffDepthRule } from '@/lib/allowance/defaults';
import { Exact } from '@/lib/allowance/exact';
import { InputReader, isPrecision } from '@/lib/allowance/read-input';

describe('InputReader', () => {
  it('reads numbers in the plan unit and text with its own unit, exactly (1 in = 25.4 mm, NBS 1959)', () => {
    const r = new InputReader({ unit: 'in' }, false);
    expect(r.length(1.5, 'f', 'F')!.toFraction().equals(new Fraction(381, 10))).toBe(true);
    expect(r.length('38 mm', 'f', 'F')!.toFraction().equals(38)).toBe(true);
    expect(new InputReader({ unit: 'cm' }, false).length(3.85, 'f', 'F')!.toFraction().equals(new Fraction(385, 10))).toBe(true);
  });

  it('treats absent and blank as missing, and says so only when required', () => {
    const r = new InputReader({ unit: 'in' }, false);
    expect(r.length(undefined, 'f', 'F')).toBeNull();
    expect(r.length('  ', 'f', 'F')).toBeNull();
    expect(() => r.length(null, 'cuffDepth', 'Cuff depth', { required: true })).toThrow('Cuff depth is needed.');
  });

  it('puts the field and its label on every error', () => {
    const r = new InputReader({ unit: 'in' }, false);
    try {
      r.length('1 1/2/3', 'hemSection', 'Third section');
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(AllowanceError);
      expect(e).toMatchObject({ field: 'hemSection', code: 'not-a-length' });
      expect((e as Error).message).toMatch(/^Third section: /);
    }
  });

  it('checks the bounds exactly: 6 in is allowed, 6 in + 1/1000 mm is not', () => {
    const r = new InputReader({ unit: 'in' }, false);
    const max = Exact.from(new Fraction(6).mul(new Fraction(127, 5)));
    expect(r.length(6, 'f', 'F', { max })).not.toBeNull();
    expect(() => r.length('6 in + 0.001 mm', 'f', 'F', { max })).toThrow(/at most 6 in/);
    expect(() => r.length(0, 'f', 'F', { min: 'positive' })).toThrow(/more than 0/);
    expect(r.length(0, 'f', 'F', { min: 'non-negative' })!.isZero()).toBe(true);
    expect(() => r.length(-0.001, 'f', 'F', { min: 'non-negative' })).toThrow(/negative/);
  });

  it('refuses 200 in plus a hair, by number and by text (range ±200 in)', () => {
    const r = new InputReader({ unit: 'in' }, false);
    expect(r.length(200, 'f', 'F')).not.toBeNull();
    expect(() => r.length(200.0000001, 'f', 'F')).toThrow(expect.objectContaining({ code: 'too-large' }));
    expect(() => r.length(-200.0000001, 'f', 'F')).toThrow(expect.objectContaining({ code: 'too-large' }));
    expect(() => r.length(1e300, 'f', 'F')).toThrow(expect.objectContaining({ code: 'too-large' }));
    expect(() => new InputReader({ unit: 'mm' }, false).length(5080.5, 'f', 'F')).toThrow(expect.objectContaining({ code: 'too-large' }));
  });

  it('collects every error when asked, instead of throwing the first', () => {
    const r = new InputReader({ unit: 'in', precision: 12 }, true);
    r.length('x', 'a', 'A');
    r.length(-1, 'b', 'B', { min: 'positive' });
    expect(r.errors.map((e) => e.field)).toEqual(['precision', 'a', 'b']);
  });

  it('knows the precisions', () => {
    expect([8, 16, 32].every(isPrecision)).toBe(true);
    expect(isPrecision(4)).toBe(false);
  });
});

// The reader answers text it has read before from its kept value, checked against the rule in one
// small step (length), else reads and checks it in full (readLength). Both must give the same
// answer: the same exact value, or the same error with the same field, message and values.
describe('InputReader.length on kept text gives the full reading’s answer', () => {
  type Outcome = { value: string } | { error: unknown };
  const outcome = (read: () => Exact | null): Outcome => {
    try {
      const mm = read();
      return { value: mm === null ? 'null' : mm.big === null ? `${mm.n}/${mm.d}` : `big ${mm.big.toFraction()}` };
    } catch (e) {
      if (!(e instanceof AllowanceError)) throw e;
      return { error: { code: e.code, message: e.message, field: e.field, values: e.values } };
    }
  };
  const number = fc.oneof(fc.integer({ min: 0, max: 300 }).map(String), fc.constantFrom('0', '1e3', '99999999999999999', '0.0000001', '1.5', '.5'));
  const fraction = fc
    .tuple(fc.integer({ min: 0, max: 40 }), fc.integer({ min: 0, max: 40 }), fc.constantFrom('0', '1', '2', '3', '8', '16', '127', '9007199254740993'))
    .map(([w, n, d]) => `${w} ${n}/${d}`);
  // Plain shapes, mixed numbers (some not under 1, some over 0), sums, units, signs, blanks and garbage.
  const text = fc.oneof(
    number,
    fraction,
    fc
      .tuple(fc.constantFrom('', '-', ' ', '- '), fc.oneof(number, fraction), fc.constantFrom('', ' ', ' in', ' mm', ' cm', ' + 1/16', ' - 3'))
      .map((p) => p.join('')),
    fc.constantFrom('', '   ', '\t', 'abc', '1/0', '1 1/2/3', '½', '1,5', '1 3/16 in + 2 cm'),
    fc.string({ maxLength: 8 }),
  );
  const unit = fc.constantFrom('in' as const, 'cm' as const, 'mm' as const);

  it('the same value or error, for every rule and unit (the full reading is the oracle)', () => {
    fc.assert(
      fc.property(text, unit, fc.integer({ min: 0, max: 4 }), (t, u, k) => {
        const rules = [{}, { min: 'positive' as const }, { min: 'non-negative' as const }, cuffDepthRule(u), { required: true, min: 'positive' as const }];
        const rule = rules[k]!;
        const r = new InputReader({ unit: u }, false);
        const full = outcome(() => (r as unknown as { readLength: InputReader['length'] }).readLength(t, 'f', 'F', rule));
        // Twice: the first may read it in full and keep it, the second then answers from the kept value.
        expect(outcome(() => r.length(t, 'f', 'F', rule))).toEqual(full);
        expect(outcome(() => r.length(t, 'f', 'F', rule))).toEqual(full);
      }),
      { numRuns: 3000 },
    );
  });

  it('an absent field is null unless required, with or without the shortcut', () => {
    const r = new InputReader({ unit: 'in' }, false);
    expect(r.length(undefined, 'f', 'F', { min: 'positive' })).toBeNull();
    expect(() => r.length(undefined, 'cuffDepth', 'Cuff depth', cuffDepthRule('in'))).toThrow('Cuff depth is needed.');
  });
});
