import Fraction from 'fraction.js';
import {
  addDependencies,
  create,
  divideDependencies,
  evaluateDependencies,
  multiplyDependencies,
  subtractDependencies,
  unaryMinusDependencies,
  type MathJsInstance,
} from 'mathjs';
import { AllowanceError } from './allowance-error';
import { type LengthTerm, readLengthTerms, termUnits } from './length-terms';
import { checkRange } from './parse-length';
import type { Unit } from './types';

const FACTOR: Record<Unit, string> = { in: '127/5', cm: '10', mm: '1' };

let math: MathJsInstance | undefined;

// Created on first use, with only + − × ÷ and the parser, so importing the engine costs little.
function mathjs(): MathJsInstance {
  math ??= create(
    // mathjs's typings declare each dependency map as possibly undefined; they are always present.
    {
      evaluateDependencies: evaluateDependencies!,
      addDependencies: addDependencies!,
      subtractDependencies: subtractDependencies!,
      multiplyDependencies: multiplyDependencies!,
      divideDependencies: divideDependencies!,
      unaryMinusDependencies: unaryMinusDependencies!,
    },
    { number: 'Fraction' },
  );
  return math;
}

function literal(digits: string): string {
  return digits.startsWith('.') ? `0${digits}` : digits;
}

/** The restricted expression (digits, + − * / and brackets only) that gives the terms' sum in mm. */
export function termsExpression(terms: LengthTerm[], units: Unit[]): string {
  return terms
    .map((t, k) => {
      const parts: string[] = [];
      if (t.whole !== null) parts.push(literal(t.whole));
      if (t.num !== null && t.den !== null) parts.push(`${t.num} / ${t.den}`);
      const value = `(${parts.join(' + ')}) * ${FACTOR[units[k]!]}`;
      return k === 0 ? (t.sign < 0 ? `-${value}` : value) : `${t.sign < 0 ? '-' : '+'} ${value}`;
    })
    .join(' ');
}

/** Evaluate the terms exactly with a mathjs instance in Fraction mode; the result is in mm. */
export function evaluateTerms(terms: LengthTerm[], units: Unit[]): Fraction {
  let result: unknown;
  try {
    result = mathjs().evaluate(termsExpression(terms, units));
  } catch (e) {
    if (e instanceof Error && /division by zero/i.test(e.message)) {
      throw new AllowanceError('divide-by-zero', 'A fraction cannot have 0 below the line.');
    }
    throw new AllowanceError('not-a-length', 'That length could not be worked out. Try 1 1/2 or 38 mm.');
  }
  if (!(result instanceof Fraction)) {
    throw new AllowanceError('not-a-length', 'That length could not be worked out. Try 1 1/2 or 38 mm.');
  }
  return result;
}

/** parseExact worked out by mathjs instead: the reference the tests hold the engine's own sums to.
 * Only tests import this module, so the server never loads mathjs. */
export function parseExactWithMathjs(text: string, unit: Unit): Fraction {
  const terms = readLengthTerms(text);
  return checkRange(evaluateTerms(terms, termUnits(terms, unit)));
}
