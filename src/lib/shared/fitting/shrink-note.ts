// Unwashed cloth on a hem → the shrink lines as the sheet and the garment page print them (the same
// figures on both). The engine's shrinkAllowance gives the allowance and the unwashed hem allowance; here each is put in
// whole display steps rounded down the leg (a longer hem shrinks to a little long, never short), and
// the chalked edge and the cut are sums of the printed figures, so they add up as a tailor reads them.
import { stepRatio, stepsText } from '../../allowance/format-length';
import { parseLength } from '../../allowance/parse-length';
import { readShrinkInput, shrinkAllowance } from '../../allowance/shrink-allowance';
import type { ShrinkInput } from '../../allowance/kind-types';
// validateShrinkInput's own two parts: validate-kinds would bring every other kind into the page.
import { collect } from '../../allowance/validate-input';
import type { Precision, Unit } from '../../allowance/types';
import type { ShrinkNote } from '../cut-sheet-types';
import type { Finish } from './kinds';
import type { LegTexts } from './plan-lengths';
import { legShrinkInput } from './shrink-input';

// Whole display steps of a length in mm: up (the safe side of the cloth), or to the nearest.
function steps(mm: number, unit: Unit, precision: Precision, up: boolean): number {
  const [a, b] = stepRatio(unit, precision);
  const x = (mm * a) / b;
  // The engine's mm is the double of an exact value; a whole step of it came out whole in every case
  // tried (1–10 %, eighths, sixteenths, mm, cm), and a stray last bit would only add a step: safe side.
  return up ? Math.ceil(x) : Math.round(x);
}

/** The shrink lines for a leg's lengths (read in the given unit), or null with no unwashed cloth chosen, on a cuff or kept factory hem, or while the engine refuses the input (the save refuses it first). */
export function shrinkNoteOf(texts: LegTexts, finish: Finish, unit: Unit, precision: Precision): ShrinkNote | null {
  const input = legShrinkInput(texts, finish, unit, precision);
  if (!input || collect<ShrinkInput>(input, readShrinkInput).length > 0) return null;
  const plan = shrinkAllowance(input);
  const say = (n: number) => stepsText(n, unit, precision);
  const allowance = steps(plan.finishedEdgeBelowMark.mm, unit, precision, true);
  const hem = steps(plan.hemAllowanceUnwashed.mm, unit, precision, true);
  const pinText = texts.backPin?.trim();
  const pin = pinText ? steps(parseLength(pinText, unit, precision).mm, unit, precision, false) : 0;
  return {
    code: plan.percent === 0 ? 'none' : 'shrink',
    cloth: input.cloth,
    percent: String(plan.percent),
    source: plan.percentSource,
    length: say(steps(parseLength(String(input.lengthToMark), unit, precision).mm, unit, precision, false)),
    allowance: say(allowance),
    hem: say(hem),
    pin: pinText ? say(pin) : '',
    edge: say(pin + allowance),
    cut: say(pin + allowance + hem),
    cutBelow: say(allowance + hem),
  };
}

/** A hem plan's lengths as typed, with unwashed cloth on a plain or sloped hem: the plan's own finished edge and cut. */
export type HemLengths = Partial<Record<string, string>>;

/**
 * A hem plan's lengths with unwashed cloth chosen: the finished edge chalked the printed shrink
 * allowance below the pin mark and the unwashed hem allowance in place of the typed one, both in
 * whole display steps exactly as the shrink lines print them, so the plan's lines, its cloth check,
 * its taper check and the sheet's strip are the shrink figures and there is one set of lines. The
 * garment page's live plan (leg-plan.ts) and the sheet (saved-leg.ts) both go through here.
 * Unchanged with no unwashed cloth, no shrinkage expected, or while the engine refuses the input.
 */
export function withShrink<L extends HemLengths>(lengths: L, texts: LegTexts, finish: Finish, unit: Unit, precision: Precision): L {
  const note = shrinkNoteOf(texts, finish, unit, precision);
  if (!note || note.code === 'none') return lengths;
  return { ...lengths, edgeBelowMark: note.allowance, hemAllowance: note.hem };
}
