// The engine's warnings and crease verdicts rendered from their codes and values through the
// catalog. The engine keeps its English sentence (the API's `message`); English rendered here is
// the same sentence, word for word (tests/lib/i18n/engine-messages.test.ts).
import type { CreaseLanding, PlanWarning } from '@/lib/allowance/types';
import type { MessageKey, Translate } from './format';

// Values a variant of a message may lack: an ICU select needs every one it reads.
const ABSENT = { most: 'none', measured: 'none', fits: 'none', edge: 'none' } as const;

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

/** An engine refusal as it travels (the API's 422 `refusals`, or an AllowanceError): its code and values. */
export interface Refusal {
  code: string;
  values?: Readonly<Record<string, string | number>>;
}

// Values a refusal's variants may lack (an ICU select needs every one it reads).
const REFUSAL_ABSENT = { label: 'none', inner: 'no', why: 'none', most: 'none', rule: 'none', choices: 'none', yesNo: 'no' } as const;

/**
 * One engine refusal in the catalog's words. The field is named by `label` when given, else by the
 * catalog's `refusalField.<field>` (the last part of a path such as legs.left.widthAtCut), else by
 * the engine's own English label (fields the catalog does not have yet).
 */
export function refusalText(t: Translate, r: Refusal, field?: string, label?: string): string {
  const v = r.values ?? {};
  if (!label && field && v.label !== undefined) {
    const key = `refusalField.${field.split('.').pop()}`;
    const named = t(key as MessageKey);
    if (named !== key) label = named;
  }
  const yesNo = v.choices === 'true|false' ? 'yes' : 'no';
  // ICU select cases cannot hold hyphens: the catalog writes the engine's rule codes with underscores.
  const cases = { rule: String(v.rule ?? 'none').replaceAll('-', '_'), why: String(v.why ?? 'none').replaceAll('-', '_') };
  return t(`refusal.${r.code}` as MessageKey, { ...REFUSAL_ABSENT, ...v, ...cases, yesNo, ...(label ? { label } : {}) });
}
