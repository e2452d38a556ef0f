// What a typed length reads as, worked out in the browser with the engine's own grammar and exact
// arithmetic. A sum ("31 3/4 + 1/8") is added term by term with fraction.js, as the engine does,
// so mathjs never reaches the page.
import Fraction from 'fraction.js';
import { formatExact } from '../allowance/format-length';
import { readLengthTerms, termUnits } from '../allowance/length-terms';
import { isAllowanceError } from '../allowance/allowance-error';
import { checkRange, termMm, withUnitsNamed } from '../allowance/parse-length';
import type { Precision, Unit } from '../allowance/types';

/** The exact length in mm of typed text in a unit, or null when it is blank or cannot be read. */
export function exactMm(text: string, unit: Unit): Fraction | null {
  if (text.trim() === '') return null;
  try {
    const terms = readLengthTerms(text);
    const units = termUnits(terms, unit);
    return checkRange(terms.reduce((sum, t, k) => sum.add(termMm(t, units[k]!)), new Fraction(0)));
  } catch {
    return null;
  }
}

/** What typed text reads as in the unit, rounded for display ("31 7/8 in"), or null when it does not read. */
export function readLength(text: string, unit: Unit, precision: Precision): string | null {
  const mm = exactMm(text, unit);
  return mm === null ? null : formatExact(mm, unit, precision);
}

/** True when the text names its own unit ("38 mm", "1 1/2 in"). */
export function namesUnit(text: string): boolean {
  try {
    return readLengthTerms(text).some((t) => t.unit !== null);
  } catch {
    return /[a-z"″”]/i.test(text);
  }
}

/** A typed length with the unit it was typed in: its own when it names one, else the form's. */
export function typedWithUnit(text: string, unit: Unit): string {
  return namesUnit(text) ? text : `${text} ${unit}`;
}

/**
 * Typed text to be read in another unit than it was typed in: every bare part gets the unit it was
 * typed in ("30 + 5 mm" typed in inches → "30 in + 5 mm"), so it reads exactly, never from a rounded
 * figure. The same unit, or text the reader refuses, comes back as typed (the plan's check names it).
 */
export function typedForUnit(text: string, from: Unit, to: Unit): string {
  if (from === to || text.trim() === '') return text;
  try {
    return withUnitsNamed(text, from);
  } catch (e) {
    if (!isAllowanceError(e)) throw e;
    return text;
  }
}

/** A typed length carried to another unit: its exact value written as the new unit writes it, or unchanged (ok false) when it does not read. */
export function convertTyped(text: string, from: Unit, to: Unit, precision: Precision): { text: string; ok: boolean } {
  if (text.trim() === '') return { text, ok: true };
  const mm = exactMm(text, from);
  if (mm === null) return { text, ok: false };
  // The field shows its unit beside it, so the number goes in bare.
  return { text: formatExact(mm, to, precision).replace(/\s*(in|cm|mm)$/, ''), ok: true };
}

/** The reading of a typed length in the shop's unit, or null when it says no more than the typed text ("1 1/2 in"). */
export function shopReading(text: string, typedUnit: Unit, shopUnit: Unit, precision: Precision): string | null {
  const mm = exactMm(text, typedUnit);
  if (mm === null) return null;
  const read = formatExact(mm, shopUnit, precision);
  return read === typedWithUnit(text, typedUnit) ? null : read;
}

/** A saved length as typed with its own unit, plus its reading in the shop's unit when that says more ("38 mm (= 1 1/2 in)"). */
export function typedAndRead(text: string, typedUnit: Unit, shopUnit: Unit, precision: Precision): string {
  const typed = typedWithUnit(text, typedUnit);
  const read = shopReading(text, typedUnit, shopUnit, precision);
  return read ? `${typed} (= ${read})` : typed;
}
