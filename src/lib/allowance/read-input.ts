import { AllowanceError } from './allowance-error';
import type { Exact } from './exact';
import { exactFromNumber } from './exact-number';
import { formatExactQ } from './format-length';
import { checkRangeExact, keptTexts, readExact } from './parse-length';
import type { Precision, Unit } from './types';
import { isPrecision, isUnit, mmPerUnitRatio } from './units';

/** What a length field may hold beyond the ±200 in range. */
export interface LengthRule {
  required?: boolean;
  min?: 'positive' | 'non-negative';
  max?: Exact;
  /** the smallest workable value, with why (shown after "must be at least …") and that reason's code for the catalog */
  least?: { value: Exact; why: string; code: string };
}

export { isPrecision } from './units';

const NO_RULE: LengthRule = {};
// Never pushed to: a reader that does not collect throws its first error instead.
const NO_ERRORS = Object.freeze([]) as readonly AllowanceError[] as AllowanceError[];

// As value.trim() === '' (the same white space), without making the trimmed copy of every typed length.
function isBlank(text: string): boolean {
  for (let k = 0; k < text.length; k++) {
    const c = text.charCodeAt(k);
    if (c > 32 && c < 127) return false;
    if (!(c === 32 || (c >= 9 && c <= 13)) && text.slice(k, k + 1).trim() !== '') return false;
  }
  return true;
}

// True when a length read from text passes the rule (as InputReader.length checks it; blank text is never kept).
function meetsRule(mm: Exact, rule: LengthRule): boolean {
  const s = mm.sign();
  if (rule.min === 'positive' ? s <= 0 : rule.min === 'non-negative' && s < 0) return false;
  if (rule.least !== undefined && mm.compare(rule.least.value) < 0) return false;
  return rule.max === undefined || mm.compare(rule.max) <= 0;
}

/**
 * Reads and checks a plan's inputs, naming the field in each AllowanceError. Throws the first
 * error, or, when collecting, keeps them all and goes on with a stand-in value.
 */
export class InputReader {
  /** the errors kept when collecting (always empty otherwise: the first error is thrown) */
  readonly errors: AllowanceError[];
  readonly unit: Unit;
  readonly precision: Precision;
  // The unit's texts read before, looked up by every length field.
  private readonly kept: ReadonlyMap<string, Exact>;

  constructor(
    input: unknown,
    private readonly collect: boolean,
  ) {
    // Every plan reads its input once; only validation collects, so only it needs a list.
    this.errors = collect ? [] : NO_ERRORS;
    if (typeof input !== 'object' || input === null) {
      throw new AllowanceError('bad-input', 'The plan input must be an object.');
    }
    const { unit, precision } = input as { unit?: unknown; precision?: unknown };
    if (!isUnit(unit)) throw new AllowanceError('bad-unit', 'Choose a unit: in, cm or mm.', 'unit');
    this.unit = unit;
    this.kept = keptTexts(unit);
    this.precision = 16;
    if (precision !== undefined) {
      if (isPrecision(precision)) this.precision = precision;
      else this.fail(new AllowanceError('bad-precision', 'Show inches to 1/8, 1/16 or 1/32.', 'precision'));
    }
  }

  private fail(e: AllowanceError): void {
    if (!this.collect) throw e;
    this.errors.push(e);
  }

  /** Refuse a field read elsewhere (numbers, choices): thrown, or kept when collecting. */
  refuse(e: AllowanceError): void {
    this.fail(e);
  }

  /** A length field in mm, or null when absent (blank text counts as absent). */
  length(value: unknown, field: string, label: string, rule: LengthRule = NO_RULE): Exact | null {
    // Text read before (most typed lengths) is only checked against the rule: small enough to inline.
    if (typeof value === 'string') {
      const kept = this.kept.get(value);
      if (kept !== undefined && meetsRule(kept, rule)) return kept;
    } else if (value === undefined && rule.required !== true) return null;
    return this.readLength(value, field, label, rule);
  }

  private readLength(value: unknown, field: string, label: string, rule: LengthRule): Exact | null {
    if (value === undefined || value === null || (typeof value === 'string' && isBlank(value))) {
      if (rule.required) this.fail(new AllowanceError('missing', `${label} is needed.`, field, { label }));
      return null;
    }
    let mm: Exact;
    try {
      mm = this.exact(value);
    } catch (e) {
      if (!(e instanceof AllowanceError)) throw e;
      // The reader's own sentence has no values: the catalog says its code's words after the label.
      this.fail(new AllowanceError(e.code, `${label}: ${e.message}`, field, { label, inner: 'yes' }));
      return null;
    }
    // A number input carries its sign; only text needs the exact value asked.
    const s = typeof value === 'number' ? Math.sign(value) : mm.sign();
    if (rule.min === 'positive' && s <= 0) {
      this.fail(new AllowanceError('not-positive', `${label} must be more than 0.`, field, { label }));
      return null;
    }
    if (rule.min === 'non-negative' && s < 0) {
      this.fail(new AllowanceError('negative', `${label} cannot be negative.`, field, { label }));
      return null;
    }
    if (rule.least !== undefined && mm.compare(rule.least.value) < 0) {
      const least = formatExactQ(rule.least.value, this.unit, this.precision);
      this.fail(new AllowanceError('out-of-range', `${label} must be at least ${least}: ${rule.least.why}`, field, { label, least, why: rule.least.code }));
      return null;
    }
    if (rule.max !== undefined && mm.compare(rule.max) > 0) {
      const most = formatExactQ(rule.max, this.unit, this.precision);
      this.fail(new AllowanceError('out-of-range', `${label} must be at most ${most}.`, field, { label, most }));
      return null;
    }
    return mm;
  }

  private exact(value: unknown): Exact {
    if (typeof value === 'number') {
      if (!Number.isFinite(value)) throw new AllowanceError('not-a-length', 'A length must be a finite number.');
      const [a, b] = mmPerUnitRatio(this.unit);
      // The range check also refuses 1e-310 and other lengths under a thousandth of a mm.
      const tiny = value !== 0 && Math.abs(value) * a < b / 1000;
      if (tiny || Math.abs(value) * a > 5079 * b) return checkRangeExact(exactFromNumber(value, a, b));
      return exactFromNumber(value, a, b);
    }
    if (typeof value === 'string') return readExact(value, this.unit);
    throw new AllowanceError('not-a-length', 'Give a number or text such as 1 1/2.');
  }
}
