// The words of a whole-garment kind's fields (a skirt, sleeves), from the catalog, in one place: the
// fitting form's labels and the fitting history's lines say a field and its value alike.
import type { Precision, Unit } from '@/lib/allowance/types';
import { isUnit } from '@/lib/allowance/units';
import type { WholeGarmentKind } from '../fitting/garment-kinds';
import { adapterOf } from '../fitting/kind-adapters';
import type { KindField } from '../fitting/kind-fields';
import { typedAndRead } from '../length-reading';
import type { MessageKey, Translate } from './format';

/** A kind's field as the form labels it (a place round the hem by its name: "Centre front: pins above the edge"). */
export function kindFieldLabel(t: Translate, kind: WholeGarmentKind, f: KindField): string {
  const key = f.place ? f.key.split('-')[0] : f.key;
  return t(`${kind}.field.${key}` as MessageKey, f.place ? { place: t(`${kind}.place.${f.place}` as MessageKey) } : {});
}

/** A choice's option in words ("Half or part of a circle"), as the form offers it. */
export function kindChoiceWords(t: Translate, kind: WholeGarmentKind, key: string, option: string): string {
  return t(`${kind}.${key}.${option}` as MessageKey);
}

/** A saved value in words: a length as typed with its unit (and the shop's reading), a choice by its option, a number as typed, none as "nothing". */
export function kindValueWords(
  t: Translate,
  kind: WholeGarmentKind,
  f: KindField,
  value: unknown,
  typedUnit: Unit,
  shopUnit: Unit,
  precision: Precision,
): string {
  if (value === null || value === undefined || value === '') return t('kindHistory.nothing');
  const text = String(value);
  if (f.type === 'length') return typedAndRead(text, typedUnit, shopUnit, precision);
  if (f.type === 'choice' && f.options?.includes(text)) return kindChoiceWords(t, kind, f.key, text);
  return text;
}

/** One history line of a kind's fitting (`kind-fitting.changed`): "Hem depth wanted: 1 in → 7/8 in"; null for a field the kind does not have. */
export function kindChangeLine(t: Translate, kind: WholeGarmentKind, detail: Record<string, unknown>, shopUnit: Unit, precision: Precision): string | null {
  const f = adapterOf(kind)?.fields.find((x) => x.key === detail.field);
  if (!f) return null;
  const typedIn = isUnit(detail.unit) ? detail.unit : shopUnit;
  const words = (v: unknown) => kindValueWords(t, kind, f, v, typedIn, shopUnit, precision);
  return t('kindHistory.change', { field: kindFieldLabel(t, kind, f), old: words(detail.old), new: words(detail.new) });
}

/** Where a kind's field stands in its form (for one save's lines in the form's order); past the end when unknown. */
export function kindFieldRank(kind: WholeGarmentKind, field: unknown): number {
  const fields = adapterOf(kind)?.fields ?? [];
  const i = fields.findIndex((f) => f.key === field);
  return i < 0 ? fields.length : i;
}
