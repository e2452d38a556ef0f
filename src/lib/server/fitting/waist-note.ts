// A pending waist change on a saved leg → how far the pin mark moves, as the sheet and the garment
// page print it. The engine's waistMovesHem (rule 'girth-slope', policy 'record') gives the rise;
// here it is rounded to the sheet's step and added to the pin as printed, so pin + move = mark holds
// on the page as a tailor adds it up. Pure: the engine and the shared types only.
import { isAllowanceError } from '../../allowance/allowance-error';
import { stepRatio, stepsText } from '../../allowance/format-length';
import { parseLength } from '../../allowance/parse-length';
import type { Precision, Unit } from '../../allowance/types';
import { WAIST_MOVE_SOURCES, waistMovesHem } from '../../allowance/waist-move';
import type { WaistNote } from '../../shared/cut-sheet-types';
import type { LegTexts } from '../../shared/fitting/plan-lengths';
import type { WaistOrder } from '../../shared/waist-order';

// Whole display steps of a length in mm (1/p in, or 0.5 mm), to the nearest.
function steps(mm: number, unit: Unit, precision: Precision): number {
  const [a, b] = stepRatio(unit, precision);
  return Math.round((mm * a) / b);
}

/** The pending waist change's note for a leg's lengths (read in the given unit), or null when none is pending; a waist-first shop moves no mark. */
export function waistNoteOf(texts: LegTexts, unit: Unit, precision: Precision, order: WaistOrder = 'record'): WaistNote | null {
  const change = texts.waistChange;
  if (!change) return null;
  const changeText = stepsText(steps(parseLength(change, unit, precision).mm, unit, precision), unit, precision);
  const base = { change: changeText, rule: 'girth-slope', by: '', direction: 'none' as const, pin: '', mark: '', source: '' };
  // The shop alters the waist first and pins the length after (the engine's policy 'waist-first').
  if (order === 'waist-first') return { ...base, code: 'first', source: WAIST_MOVE_SOURCES.policy };
  try {
    const plan = waistMovesHem({
      unit,
      precision,
      policy: 'record',
      rule: 'girth-slope',
      waistChange: change,
      waistGirth: texts.waistGirth ?? '',
      seatGirth: texts.seatGirth ?? '',
      waistToSeat: texts.waistToSeat ?? '',
    });
    const rise = steps(plan.rise?.mm ?? 0, unit, precision);
    const source = plan.rule.source;
    if (rise === 0) return { ...base, code: 'none', source };
    const moved = { ...base, by: stepsText(Math.abs(rise), unit, precision), direction: rise > 0 ? ('down' as const) : ('up' as const), source };
    if (!texts.backPin) return { ...moved, code: 'movesBy' };
    // The mark as printed: the pin to the sheet's step, plus the move in whole steps (they add up as printed).
    const pin = steps(parseLength(texts.backPin, unit, precision).mm, unit, precision);
    return { ...moved, code: 'moves', pin: stepsText(pin, unit, precision), mark: stepsText(pin + rise, unit, precision) };
  } catch (e) {
    if (isAllowanceError(e)) return { ...base, code: 'needs' };
    throw e;
  }
}
