// The finished length pinned at the fitting, as the sheet prints it: as typed, and what it reads as.
// Relative imports, like the rest of the sheet, so benchmarks/ can run it with plain vite-node.
import { readLengthTerms } from '../../allowance/length-terms';
import { readLength, typedWithUnit } from '../../shared/length-reading';
import type { Precision, Unit } from '../../allowance/types';
import type { Translate } from '../i18n/catalog';
import type { LegSheet } from '../../shared/cut-sheet-types';

function namesOtherUnit(typed: string, unit: Unit): boolean {
  try {
    return readLengthTerms(typed).some((t) => t.unit !== null && t.unit !== unit);
  } catch {
    return false;
  }
}

/**
 * A leg's pinned length as typed, and its reading in the sheet's unit when that differs
 * ("31 3/4 + 1/8 in = 31 7/8 in"). Typed in another unit, only the reading: every length on a
 * sheet is in the sheet's unit.
 */
export function finishedText(typed: string, unit: Unit, precision: Precision): string {
  const shown = typedWithUnit(typed.trim(), unit);
  const read = readLength(typed, unit, precision);
  if (read && namesOtherUnit(typed, unit)) return read;
  return read && read !== shown ? `${shown} = ${read}` : shown;
}

/** The sheet's finished-length line: one figure for both legs, or each leg's; null when none was pinned. */
export function finishedLine(legs: LegSheet[], t: Translate): string | null {
  const pinned = legs.filter((l) => l.finished);
  if (pinned.length === 0) return null;
  const texts = pinned.map((l) => finishedText(l.finished!, l.plan.unit, l.plan.precision));
  if (legs.length === 1 || (pinned.length === legs.length && new Set(texts).size === 1)) return t('sheet.finished.one', { length: texts[0]! });
  const side = (l: LegSheet) => (l.side === 'left' ? t('sheet.legs.leftShort') : t('sheet.legs.rightShort'));
  return t('sheet.finished.each', { list: pinned.map((l, i) => `${side(l)} ${texts[i]}`).join(t('sheet.list')) });
}

/**
 * A length recorded for the bench, as typed with its unit; typed in another unit than the sheet's,
 * its reading follows ("3/16 in = 5 mm"). Never rounded in its own unit: a 3/16 in tack height is
 * not an eighths sheet's 1/4 in.
 */
export function recordedText(typed: string, unit: Unit, precision: Precision): string {
  const shown = typedWithUnit(typed.trim(), unit);
  if (!namesOtherUnit(typed, unit)) return shown;
  const read = readLength(typed, unit, precision);
  return read && read !== shown ? `${shown} = ${read}` : shown;
}
