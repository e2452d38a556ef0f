import { AllowanceError } from './allowance-error';
import { type LengthToken, tokenizeLength } from './length-tokens';
import type { Unit } from './types';

/** One signed length of an expression: whole (or decimal) digits plus an optional fraction, and a unit if named. */
export interface LengthTerm {
  sign: 1 | -1;
  /** ASCII digits, maybe with one '.', or null for a bare fraction */
  whole: string | null;
  /** ASCII integer digits of a fraction, or null */
  num: string | null;
  den: string | null;
  unit: Unit | null;
  /** the number as typed when it had a decimal comma ("3,8"): metric lengths only */
  comma?: string;
}

const HINT = 'Try 1 1/2, 1-1/2, 1½, 1.5, 38 mm or 31 3/4 + 1/8.';

function bad(message: string): AllowanceError {
  return new AllowanceError('not-a-length', message);
}

function isInteger(digits: string): boolean {
  return !digits.includes('.');
}

function checkDenominator(den: string): void {
  if (/^0+$/.test(den)) throw new AllowanceError('divide-by-zero', 'A fraction cannot have 0 below the line.');
}

class TermReader {
  private i = 0;

  constructor(private readonly tokens: LengthToken[]) {}

  private peek(offset = 0): LengthToken | undefined {
    return this.tokens[this.i + offset];
  }

  private spaceAfter(offset = 0): boolean {
    return this.peek(offset + 1)?.space ?? true;
  }

  read(): LengthTerm[] {
    const terms: LengthTerm[] = [];
    let sign: 1 | -1 = 1;
    const first = this.peek();
    if (first?.kind === 'hyphen' || first?.kind === 'minus' || first?.kind === 'plus') {
      sign = first.kind === 'plus' ? 1 : -1;
      this.i += 1;
    }
    for (;;) {
      terms.push(this.term(sign));
      const op = this.peek();
      if (op === undefined) return terms;
      if (op.kind === 'plus' || op.kind === 'minus') {
        sign = op.kind === 'plus' ? 1 : -1;
      } else if (op.kind === 'hyphen') {
        if (!op.space || !this.spaceAfter()) {
          throw bad(`Put spaces round a minus (32 - 1/4); write a mixed number as 1-1/2 or 1 1/2. ${HINT}`);
        }
        sign = -1;
      } else {
        throw bad(`Something is missing between two parts of the length. ${HINT}`);
      }
      this.i += 1;
    }
  }

  private term(sign: 1 | -1): LengthTerm {
    const q = this.quantity();
    let unit: Unit | null = null;
    const u = this.peek();
    if (u?.kind === 'unit') {
      unit = u.unit;
      this.i += 1;
      if (this.peek()?.kind === 'unit') throw new AllowanceError('bad-unit', 'Give one unit per length, e.g. 30 in or 38 mm.');
    }
    return { sign, ...q, unit };
  }

  private quantity(): Omit<LengthTerm, 'sign' | 'unit'> {
    const t = this.peek();
    if (t === undefined) throw bad(`A number is missing at the end. ${HINT}`);
    if (t.kind === 'vulgar') {
      this.i += 1;
      return { whole: null, num: t.num, den: t.den };
    }
    if (t.kind === 'number' && t.script === 'sup') return { whole: null, ...this.smallFraction() };
    if (t.kind !== 'number' || t.script !== 'plain') {
      if (t.kind === 'hyphen' || t.kind === 'minus' || t.kind === 'plus') throw bad(`Two signs in a row. ${HINT}`);
      if (t.kind === 'unit') throw bad(`A number must come before “${t.word}”. ${HINT}`);
      throw bad(`A number is missing. ${HINT}`);
    }
    this.i += 1;
    if (this.peek()?.kind === 'slash') {
      this.i += 1;
      return { whole: null, ...this.fractionAfterSlash(t.digits) };
    }
    const next = this.peek();
    const mixed =
      next?.kind === 'vulgar' ||
      (next?.kind === 'number' && next.script === 'sup') ||
      (next?.kind === 'number' && next.script === 'plain' && next.space && this.peek(1)?.kind === 'slash') ||
      (next?.kind === 'hyphen' && !next.space && !this.spaceAfter() && this.startsFraction(1));
    if (!mixed) {
      if (next?.kind === 'number') throw bad(`Two numbers in a row. ${HINT}`);
      return t.comma === undefined ? { whole: t.digits, num: null, den: null } : { whole: t.digits, num: null, den: null, comma: t.comma };
    }
    if (!isInteger(t.digits)) throw bad(`A decimal cannot take a fraction too. ${HINT}`);
    if (next.kind === 'hyphen') this.i += 1;
    const frac = this.fractionPart();
    if (BigInt(frac.num) >= BigInt(frac.den)) {
      throw bad(`In a mixed number the fraction must be less than 1, as in 1 3/4. ${HINT}`);
    }
    return { whole: t.digits, ...frac };
  }

  private startsFraction(offset: number): boolean {
    const t = this.peek(offset);
    if (t?.kind === 'vulgar') return true;
    if (t?.kind === 'number' && t.script === 'sup') return true;
    return t?.kind === 'number' && t.script === 'plain' && this.peek(offset + 1)?.kind === 'slash';
  }

  private fractionPart(): { num: string; den: string } {
    const t = this.peek()!;
    if (t.kind === 'vulgar') {
      this.i += 1;
      return { num: t.num, den: t.den };
    }
    if (t.kind === 'number' && t.script === 'sup') return this.smallFraction();
    if (t.kind === 'number') {
      this.i += 2;
      return this.fractionAfterSlash(t.digits);
    }
    throw bad(`A fraction is missing. ${HINT}`);
  }

  /** "⁹⁄₁₆": superscript digits, a slash, subscript digits. */
  private smallFraction(): { num: string; den: string } {
    const num = this.peek()!;
    const slash = this.peek(1);
    const den = this.peek(2);
    if (slash?.kind !== 'slash' || den?.kind !== 'number' || den.script !== 'sub' || num.kind !== 'number') {
      throw bad(`Write a small fraction as ⁹⁄₁₆, or simply 9/16. ${HINT}`);
    }
    this.i += 3;
    checkDenominator(den.digits);
    this.noSecondSlash();
    return { num: num.digits, den: den.digits };
  }

  private fractionAfterSlash(num: string): { num: string; den: string } {
    const den = this.peek();
    if (den?.kind !== 'number' || den.script !== 'plain') throw bad(`A number must follow “/”. ${HINT}`);
    if (!isInteger(num) || !isInteger(den.digits)) throw bad(`A fraction takes whole numbers, as in 3/4. ${HINT}`);
    this.i += 1;
    checkDenominator(den.digits);
    this.noSecondSlash();
    return { num, den: den.digits };
  }

  private noSecondSlash(): void {
    if (this.peek()?.kind === 'slash') throw bad(`Only one “/” per fraction. ${HINT}`);
  }
}

/** Read typed length text into signed terms, checking the grammar. Throws AllowanceError. */
export function readLengthTerms(text: string): LengthTerm[] {
  return new TermReader(tokenizeLength(text)).read();
}

/**
 * The unit each term stands in: its own, else the plan's. A bare number always means the plan's
 * unit, never a unit written elsewhere in the text ("30 + 5 mm" in an inch plan is 30 in + 5 mm).
 * A decimal comma is for metric lengths only: in inches it is refused, repeating what was typed.
 */
export function termUnits(terms: LengthTerm[], planUnit: Unit): Unit[] {
  return terms.map((t) => {
    const unit = t.unit ?? planUnit;
    if (t.comma !== undefined && unit === 'in') {
      throw bad(`“${t.comma}”: inches take a decimal point, as in ${t.comma.replace(',', '.')}, or a fraction such as 1 1/2.`);
    }
    return unit;
  });
}
