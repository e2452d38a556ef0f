// Which of a leg's lengths go into which of the engine's plans, read from the registry: the one
// rule the bench's live plan, the save check, the cut sheet and the pricing all follow.
import { engineFields, fieldsOf, partOf, type EnginePlan, type FieldKey, type Finish } from './kinds';

/** A leg's lengths by key, as typed or saved ('' or absent: not taken). */
export type LegTexts = Partial<Record<FieldKey, string>>;

/** The engine's two plans for a finish: its cuff or hem, and the taper check under it (the kept factory hem checks its taper inside its own plan). */
export function plansOf(finish: Finish): { main: EnginePlan; taper: EnginePlan } {
  if (finish === 'original') return { main: 'originalHem', taper: 'originalHem' };
  return partOf(finish) === 'cuff' ? { main: 'cuff', taper: 'taper' } : { main: 'hem', taper: 'hemTaper' };
}

/** The registry's keys whose engine name differs in planOriginalHem's input (the join's seam allowance is not the let-out one). */
export const ORIGINAL_HEM_KEYS: Partial<Record<FieldKey, string>> = { joinSeam: 'seamAllowance' };

/** The lengths planOriginalHem takes from a leg kept on its factory hem, under the engine's names, or null while the shortening or the hem's depth is blank. */
export function originalHemLengths(texts: LegTexts): Record<string, string> | null {
  const lengths = planLengths('originalHem', 'original', texts);
  if (!lengths) return null;
  return Object.fromEntries(Object.entries(lengths).map(([k, v]) => [ORIGINAL_HEM_KEYS[k as FieldKey] ?? k, v]));
}

/** The scale a plan is asked in: inches carry their precision, metric needs none. */
export function planScale<U extends 'in' | 'cm' | 'mm', P extends number>(unit: U, precision: P): { unit: U; precision?: P } {
  return unit === 'in' ? { unit, precision } : { unit };
}

/**
 * The lengths (trimmed) one plan takes from a leg of this finish, or null while a length it needs
 * is blank. Only the finish's own fields are read (a plain hem's slope stays out); the let-down
 * fields join only on a pair let down first whose width at the cut was measured (the old fold says
 * where the taper followed down stops holding; without that width there is nothing to hold to).
 */
export function planLengths(plan: EnginePlan, finish: Finish, texts: LegTexts, letDown = false): Partial<Record<FieldKey, string>> | null {
  const asked = new Set(fieldsOf(finish, true).map((f) => f.key));
  for (const { key, use } of engineFields(plan)) if (use === 'required' && (!asked.has(key) || (texts[key] ?? '').trim() === '')) return null;
  return givenLengths(plan, finish, texts, letDown);
}

/** The lengths given for one plan, as planLengths reads them, without asking for the needed ones (the engine names what is missing). */
export function givenLengths(plan: EnginePlan, finish: Finish, texts: LegTexts, letDown = false): Partial<Record<FieldKey, string>> {
  const asked = new Set(fieldsOf(finish, true).map((f) => f.key));
  const measuredAtCut = letDown && (texts.widthAtCut ?? '').trim() !== '';
  const out: Partial<Record<FieldKey, string>> = {};
  for (const { key, use } of engineFields(plan)) {
    const value = (texts[key] ?? '').trim();
    if (value === '' || !asked.has(key) || (use === 'letDown' && !measuredAtCut)) continue;
    out[key] = value;
  }
  return out;
}
