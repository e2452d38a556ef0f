// The one way from a saved leg to the engine's input: the cut sheet and the pricing read the saved
// lengths straight into the engine's order (no form values, no request body, no second parse of
// the schema); which length goes where is the registry's. Pure: the engine and the sheet's types only.
import type { CuffInput, HemInput, Precision, Unit } from '../../allowance/types';
import type { OriginalHemInput } from '../../allowance/kind-types';
import type { LegOrder, TaperWidths } from '../cut-sheet/build';
import { typedForUnit } from '../../shared/length-reading';
import { FIELD_KEYS, fieldsOf, isLengthField, type FieldKey, type Finish } from '../../shared/fitting/kinds';
import { originalHemLengths, planLengths, plansOf, type LegTexts } from '../../shared/fitting/plan-lengths';
import { waistNoteOf } from './waist-note';
import { shrinkNoteOf, withShrink } from '../../shared/fitting/shrink-note';
import type { WaistOrder } from '../../shared/waist-order';

/** A leg as saved (the API's SavedLeg, or a measurements row): its side, unit, finish and lengths as typed. */
export interface StoredLeg {
  leg: 'left' | 'right';
  unit: Unit;
  finish: Finish;
  values: Partial<Record<FieldKey, { text: string }>>;
}

/**
 * The saved lengths as text the engine reads in `to`: a fitting typed in one unit and printed in
 * another keeps its own unit, so "1 1/2" typed in inches reads 38.1 mm exactly in a mm plan rather
 * than from a rounded mm. Every bare part gets the fitting's unit ("30 + 5 mm" → "30 in + 5 mm").
 */
export function savedTexts(saved: StoredLeg, to: Unit): LegTexts {
  const out: LegTexts = {};
  for (const key of FIELD_KEYS) {
    const text = saved.values[key]?.text?.trim();
    // A choice or percent has no unit to carry.
    if (text) out[key] = isLengthField(key) ? typedForUnit(text, saved.unit, to) : text;
  }
  return out;
}

/** The engine's order for one saved leg in the given unit, or null while a cuff has no depth (`letDown`: the width measured at the cut is used; `waistOrder`: the shop's). */
export function savedLegOrder(saved: StoredLeg, unit: Unit, precision: Precision, opts: { letDown?: boolean; waistOrder?: WaistOrder } = {}): LegOrder | null {
  const texts = savedTexts(saved, unit);
  const plans = plansOf(saved.finish);
  const main = saved.finish === 'original' ? originalHemLengths(texts) : planLengths(plans.main, saved.finish, texts);
  if (!main) return null;
  const scale = unit === 'in' ? { unit, precision } : { unit };
  const widths = planLengths(plans.taper, saved.finish, texts, opts.letDown);
  // The pinned length goes on the sheet as typed, in its own unit when the sheet's differs.
  const finished = texts.backPin ? { finished: texts.backPin } : {};
  // The finish's lengths no plan uses but the bench needs (the registry's 'listed'), as typed.
  const listed = fieldsOf(saved.finish).filter((f) => f.printed === 'listed' && texts[f.key as FieldKey]);
  const recorded = listed.length ? { recorded: listed.map((f) => ({ label: f.label, text: texts[f.key as FieldKey]! })) } : {};
  const note = waistNoteOf(texts, unit, precision, opts.waistOrder);
  const waist = note ? { waist: note } : {};
  const shrunk = shrinkNoteOf(texts, saved.finish, unit, precision);
  const shrink = shrunk ? { shrink: shrunk } : {};
  // The kept factory hem checks its taper at the join inside its own plan: the widths are in its input.
  if (saved.finish === 'original')
    return { side: saved.leg, finish: 'original', input: { ...scale, ...main } as unknown as OriginalHemInput, ...finished, ...recorded, ...waist };
  const taper: { taper?: TaperWidths } = widths
    ? {
        taper: {
          widthAtEdge: widths.widthAtEdge!,
          widthAbove: widths.widthAbove!,
          heightAbove: widths.heightAbove!,
          seamAllowance: widths.seamAllowance,
          widthAtCut: widths.widthAtCut,
        },
      }
    : {};
  if (plans.main === 'cuff')
    return { side: saved.leg, finish: 'cuff', input: { ...scale, ...main } as CuffInput, ...finished, ...recorded, ...waist, ...taper };
  // Unwashed cloth: the plan's own edge and hem allowance are the shrink figures (the taper check takes them from it).
  const hem = withShrink(main, texts, saved.finish, unit, precision);
  return { side: saved.leg, finish: 'hem', input: { ...scale, ...hem } as HemInput, ...finished, ...recorded, ...waist, ...shrink, ...taper };
}

/** True when a saved leg has what its plan needs (a cuff its depth): what the sheet asks of a fitting. */
export function canBePlanned(saved: Omit<StoredLeg, 'leg'>): boolean {
  if (saved.finish === 'original') return originalHemLengths(savedTexts({ ...saved, leg: 'left' }, saved.unit)) !== null;
  return planLengths(plansOf(saved.finish).main, saved.finish, savedTexts({ ...saved, leg: 'left' }, saved.unit)) !== null;
}
