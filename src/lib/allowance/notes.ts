// Warnings, advice and cautions of the newer kinds of work (skirt hems, sleeves, jeans, waist,
// shrinkage) as a code and its values: the words live in the message catalog, keyed by code, so
// no sentence here is baked with a number.
import { formatExact } from './format-length';
import { fractionFromNumber } from './exact-number';
import type { Len, Precision, Unit } from './types';

/** A value a note names: a length, a plain number (a ratio, a percent, a count), a code or a yes/no. */
export type NoteValue = Len | number | string | boolean;

/** A warning or a piece of advice: its code and the values the catalog message shows. */
export interface Note<C extends string = string> {
  code: C;
  values: Readonly<Record<string, NoteValue>>;
}

/** A caution the sheet prints where the work can hurt; the shop's own safety practice comes first. */
export type CautionCode = 'iron-and-steam' | 'blades-and-rippers' | 'needles-and-pins' | 'heavy-seams-needle' | 'hot-wash-and-dryer';

/** A default the shop may change, with where its figure comes from. */
export interface ShopDefault<T> {
  value: T;
  /** a published source, "from memory: …" or "common practice (no source)" */
  source: string;
  shopMayChange: true;
}

/** A note with its values. */
export function note<C extends string>(code: C, values: Record<string, NoteValue> = {}): Note<C> {
  return { code, values };
}

/**
 * A length worked out in floating point (a circle's π is in it) as a Len: the number read as the
 * decimal it prints as, rounded to the display step like every exact length.
 */
export function numberLen(mm: number, unit: Unit, precision: Precision): Len {
  return { mm, text: formatExact(fractionFromNumber(mm), unit, precision) };
}
