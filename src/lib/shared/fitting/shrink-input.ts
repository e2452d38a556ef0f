// A leg's shrink fields (the registry's group 'shrink') → the engine's ShrinkInput: one rule for the
// garment page's live plan, the save check and the sheet. The length that shrinks to the mark is
// the back pin when left blank (both are measured down to the same pin mark).
import type { ShrinkInput } from '../../allowance/kind-types';
import type { Precision, Unit } from '../../allowance/types';
import { FIELD, type Finish } from './kinds';
import type { LegTexts } from './plan-lengths';

/** The finishes whose hem may be left long to shrink (plain and sloped hems). */
export const SHRINK_FINISHES: readonly Finish[] = FIELD.shrinkCloth.finishes;

/** The engine's shrink input for a leg, or null when no unwashed cloth is chosen (or the finish takes none). */
export function legShrinkInput(texts: LegTexts, finish: Finish, unit: Unit, precision: Precision = 8): ShrinkInput | null {
  const cloth = texts.shrinkCloth?.trim();
  if (!cloth || !SHRINK_FINISHES.includes(finish)) return null;
  // The shop's own percent is asked only for 'other' (a preset keeps its figure and its source).
  const percent = cloth === 'other' ? texts.shrinkPercent?.trim() : '';
  const hem = texts.hemAllowance?.trim();
  return {
    unit,
    ...(unit === 'in' ? { precision } : {}),
    cloth: cloth as ShrinkInput['cloth'],
    ...(percent ? { shrinkPercent: percent } : {}),
    lengthToMark: texts.lengthToMark?.trim() || texts.backPin?.trim() || '',
    ...(hem ? { hemAllowance: hem } : {}),
  };
}
