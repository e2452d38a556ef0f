// Non-length inputs of the newer kinds (percentages, angles, fractions of a circle, counts, choices,
// yes/no), read with the same InputReader so a refusal names its field and validation collects them all.
import Fraction from 'fraction.js';
import { AllowanceError } from './allowance-error';
import { Exact } from './exact';
import { exactFromNumber } from './exact-number';
import type { InputReader } from './read-input';

/** What a plain number field may hold. */
export interface NumberRule {
  required?: boolean;
  /** smallest allowed (inclusive unless `above`) */
  min?: number;
  /** true: the value must be more than `min`, not equal */
  above?: boolean;
  /** largest allowed (inclusive unless `below`) */
  max?: number;
  below?: boolean;
  integer?: boolean;
}

// A decimal ("7.5"), a fraction ("3/4") or a mixed number ("1 1/2"), with an optional % for percents.
const NUMBER_TEXT = /^\s*(\d+(?:\.\d+)?|\d+\s+\d+\/\d+|\d+\/\d+|\.\d+)\s*(%?)\s*$/;

function exactOfText(text: string, percent: boolean): Exact | null {
  const m = NUMBER_TEXT.exec(text);
  if (m === null || (m[2] === '%' && !percent)) return null;
  const parts = /^(?:(\d+)\s+)?(\d+)\/(\d+)$/.exec(m[1]!);
  if (parts === null) return Exact.from(new Fraction(m[1]!));
  const den = Number(parts[3]);
  if (den === 0) return null;
  return Exact.from(new Fraction(Number(parts[1] ?? 0)).add(new Fraction(Number(parts[2]), den)));
}

/** A plain number field (exact), or null when absent; `percent` reads "10%" and 10 alike as 10. */
export function readNumber(r: InputReader, value: unknown, field: string, rule: NumberRule = {}, percent = false): Exact | null {
  if (value === undefined || value === null || (typeof value === 'string' && value.trim() === '')) {
    if (rule.required) r.refuse(new AllowanceError('missing', 'This value is needed.', field));
    return null;
  }
  let x: Exact | null = null;
  if (typeof value === 'number' && Number.isFinite(value)) x = exactFromNumber(value);
  else if (typeof value === 'string') x = exactOfText(value, percent);
  if (x === null) {
    r.refuse(new AllowanceError('not-a-number', 'Give a number.', field));
    return null;
  }
  const n = x.valueOf();
  const low = rule.min !== undefined && (rule.above ? x.compare(exactFromNumber(rule.min)) <= 0 : x.compare(exactFromNumber(rule.min)) < 0);
  const high = rule.max !== undefined && (rule.below ? x.compare(exactFromNumber(rule.max)) >= 0 : x.compare(exactFromNumber(rule.max)) > 0);
  if (low || high || (rule.integer && !Number.isInteger(n))) {
    const values: Record<string, number | string> = {};
    if (rule.min !== undefined) values[rule.above ? 'above' : 'min'] = rule.min;
    if (rule.max !== undefined) values[rule.below ? 'below' : 'max'] = rule.max;
    if (rule.integer) values.whole = 'yes';
    r.refuse(new AllowanceError('out-of-range', 'This value is out of range.', field, values));
    return null;
  }
  return x;
}

/** One of a fixed list of codes, or `fallback` when absent (null when there is none and it is not required). */
export function readChoice<T extends string>(r: InputReader, value: unknown, field: string, choices: readonly T[], fallback: T | null = null): T | null {
  if (value === undefined || value === null || value === '') {
    if (fallback === null) r.refuse(new AllowanceError('missing', 'Choose one.', field, { choices: choices.join('|') }));
    return fallback;
  }
  if (typeof value === 'string' && (choices as readonly string[]).includes(value)) return value as T;
  r.refuse(new AllowanceError('bad-choice', 'Choose one of the listed values.', field, { choices: choices.join('|') }));
  return fallback;
}

/** A yes/no field, `fallback` when absent. */
export function readYesNo(r: InputReader, value: unknown, field: string, fallback: boolean): boolean {
  if (value === undefined || value === null) return fallback;
  if (typeof value === 'boolean') return value;
  r.refuse(new AllowanceError('bad-choice', 'Choose yes or no.', field, { choices: 'true|false' }));
  return fallback;
}
