import Fraction from 'fraction.js';
import { describe, expect, it } from 'vitest';
import { AllowanceError } from '@/lib/allowance';
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
