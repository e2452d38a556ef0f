// The engine's warnings and crease verdicts rendered from their codes and values through the
// catalog. The engine keeps its English sentence (the API's `message`); English rendered here is
// the same sentence, word for word (tests/lib/i18n/engine-messages.test.ts).
import type { CreaseLanding, PlanWarning } from '@/lib/allowance/types';
import type { MessageKey, Translate } from './format';

// Values a variant of a message may lack: an ICU select needs every one it reads.
const ABSENT = { most: 'none', measured: 'none', fits: 'none' } as const;

// The cuff that does not fit: what still fits, each alternative in its own words, joined.
function stillFits(t: Translate, v: Record<string, string>): string {
  const parts: string[] = [];
  if (v.shorter) parts.push(t('warning.not-enough-cloth.shorter', { depth: v.depth ?? '', shorter: v.shorter }));
  if (v.deepest) parts.push(t('warning.not-enough-cloth.deepest', { deepest: v.deepest }));
  if (v.faced) parts.push(t('warning.not-enough-cloth.faced', { faced: v.faced }));
  if (v.plainFits === 'yes') parts.push(t('warning.not-enough-cloth.plain', { plain: v.plain ?? '' }));
  return parts.length === 0 ? 'none' : parts.join(t('warning.not-enough-cloth.separator'));
}

/** Where an old crease lands, in the catalog's words. */
export function creaseText(t: Translate, c: Pick<CreaseLanding, 'place' | 'values'>): string {
  return t(`crease.${c.place}` as MessageKey, c.values);
}

/** One engine warning in the catalog's words. */
export function warningText(t: Translate, w: Pick<PlanWarning, 'code' | 'values'>): string {
  const v = w.values ?? {};
  if (w.code === 'old-crease-visible') return creaseText(t, { place: v.place as CreaseLanding['place'], values: v });
  if (w.code === 'not-enough-cloth' && v.finish !== 'hem') return t('warning.not-enough-cloth', { ...ABSENT, ...v, fits: stillFits(t, v) });
  return t(`warning.${w.code}` as MessageKey, { ...ABSENT, ...v });
}
