// The shape of a whole-garment kind's fitting (a skirt's, later a sleeve's): its fields, typed as a
// tailor writes them, and the adapter that turns them into the engine's input. Plain data and pure
// functions: the form, the zod schema, the save check, the plan view and the sheet read the same.
import type { AllowanceError } from '@/lib/allowance';
import type { Precision, Unit } from '@/lib/allowance/types';
import type { WholeGarmentKind } from './garment-kinds';

/** One field of a kind's fitting: a length (read with the engine's parser and kept as typed + mm), a plain number, or a choice. */
export interface KindField {
  /** the key in the form, the API's `fields`, and kind_fittings.values (lengths) or .choices (the rest) */
  key: string;
  type: 'length' | 'number' | 'choice';
  /** a choice's options, in the order offered (the first is the default) */
  options?: readonly string[];
  /** the form's group it sits in (its title is the catalog's `<kind>.group.<group>`) */
  group: string;
  /** asked only when another field holds one of these values */
  showIf?: { key: string; in: readonly string[] };
  /** a place round the hem etc.: the label's `{place}` */
  place?: string;
}

/** The fields of a kind's fitting as typed: every key a string, '' when blank. */
export type KindTexts = Record<string, string>;

/** The typed texts of a saved fitting, by field key: lengths as typed, choices as kept. */
export function savedKindTexts(saved: { values: Record<string, { text: string }>; choices: Record<string, string> }): KindTexts {
  const out: KindTexts = { ...saved.choices };
  for (const [k, v] of Object.entries(saved.values)) out[k] = v.text;
  return out;
}

/** A whole-garment kind's plug: its fields and its engine (its price line: KIND_PRICE_KEYS in garment-kinds.ts). */
export interface KindAdapter<Plan = unknown> {
  kind: WholeGarmentKind;
  fields: readonly KindField[];
  /** every refusal of the engine for these texts, each keyed by the form's field (empty: it can be planned) */
  refusals(texts: KindTexts, unit: Unit): { field: string; error: AllowanceError }[];
  /** the engine's plan for texts that `refusals` accepted */
  plan(texts: KindTexts, unit: Unit, precision: Precision): Plan;
}

/** The fields shown for these texts (a field hidden by its `showIf` is left out). */
export function shownFields(fields: readonly KindField[], texts: KindTexts): KindField[] {
  return fields.filter((f) => !f.showIf || f.showIf.in.includes(texts[f.showIf.key] || fields.find((x) => x.key === f.showIf!.key)?.options?.[0] || ''));
}

/** A choice's value, or its first option when blank. */
export function choiceOf(fields: readonly KindField[], texts: KindTexts, key: string): string {
  return texts[key] || fields.find((f) => f.key === key)?.options?.[0] || '';
}
