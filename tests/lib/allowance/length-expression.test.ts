import Fraction from 'fraction.js';
import { describe, expect, it } from 'vitest';
import { evaluateTerms, termsExpression } from '@/lib/allowance/length-expression';
import { readLengthTerms, termUnits } from '@/lib/allowance/length-terms';

function expression(text: string, unit: 'in' | 'cm' | 'mm') {
  const terms = readLengthTerms(text);
  return { terms, units: termUnits(terms, unit) };
}

describe('length expressions', () => {
  it('hand mathjs only digits, brackets and + - * /', () => {
    const { terms, units } = expression('-31 3/4 + 1/8 in - 2.5 in', 'mm');
    const text = termsExpression(terms, units);
    expect(text).toMatch(/^[0-9 ()+\-*/.]+$/);
  });

  it('31 3/4 + 1/8 in is 31 7/8 in exactly, 809.625 mm (1 in = 25.4 mm, NBS 1959)', () => {
    const { terms, units } = expression('31 3/4 + 1/8', 'in');
    expect(evaluateTerms(terms, units).equals(new Fraction(809625, 1000))).toBe(true);
  });

  it('mixes units exactly: 30 in + 5 mm = 767 mm (NBS 1959 arithmetic)', () => {
    const { terms, units } = expression('30 in + 5 mm', 'in');
    expect(evaluateTerms(terms, units).equals(767)).toBe(true);
  });

  it('keeps decimals exact: 0.1 + 0.2 cm = 3 mm (arithmetic)', () => {
    const { terms, units } = expression('0.1 + 0.2', 'cm');
    expect(evaluateTerms(terms, units).equals(3)).toBe(true);
  });
});
