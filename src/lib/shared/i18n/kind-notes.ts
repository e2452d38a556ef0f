// The values of a newer kind's note (skirt, levelling) as a catalog message takes them: lengths as
// written, a place round the hem by its name, plain numbers to two places.
import type { NoteValue } from '@/lib/allowance';
import type { MessageKey, Translate } from './format';

/** A note's values in words: a Len by its text, a place (`at`) by `skirt.place.<at>`, numbers rounded to two places. */
export function noteValues(t: Translate, values: Readonly<Record<string, NoteValue>>): Record<string, string | number> {
  const out: Record<string, string | number> = {};
  for (const [k, v] of Object.entries(values)) {
    if (typeof v === 'object' && v !== null && 'text' in v) out[k] = v.text.replace(/^[-−]\s*/, '');
    else if (k === 'at' && typeof v === 'string') out[k] = t(`skirt.place.${v}` as MessageKey);
    else if (typeof v === 'number') out[k] = Math.round(v * 100) / 100;
    else out[k] = String(v);
  }
  return out;
}
