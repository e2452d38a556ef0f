// The fitting form of a garment fitted once (a skirt or dress; later sleeves): its kind's fields from
// the registry, typed as a tailor writes them in the shop's unit, the live plan from its engine in
// the browser, and the save (the server runs the same engine and refuses what it would).
import { useQueryClient, useMutation } from '@tanstack/react-query';
import { useEffect, useMemo, useState, type RefObject } from 'react';
import { useT } from '@/components/I18n';
import { describedBy, FieldFrame, FormMessage } from '@/components/Field';
import type { Precision, Unit } from '@/lib/allowance/types';
import { ApiError, fetchJson } from '@/lib/shared/fetch-json';
import { adapterOf } from '@/lib/shared/fitting/kind-adapters';
import { savedKindTexts, shownFields, type KindField } from '@/lib/shared/fitting/kind-fields';
import type { WholeGarmentKind } from '@/lib/shared/fitting/garment-kinds';
import type { KindFittingAnswer, KindFittingView } from '@/lib/shared/kind-fitting-request';
import { readLength } from '@/lib/shared/length-reading';
import { refusalText } from '@/lib/shared/i18n/engine-messages';
import { kindChoiceWords, kindFieldLabel } from '@/lib/shared/i18n/kind-words';
import type { MessageKey } from '@/lib/shared/i18n/format';
import { PLAN_VIEWS } from './plan-views';

const INPUT = 'min-h-12 w-full rounded border-2 border-rule bg-card px-3 py-2 text-lg focus:border-accent';

interface Props {
  garmentId: string;
  kind: WholeGarmentKind;
  fitting: KindFittingView;
  unit: Unit;
  precision: Precision;
  canEdit: boolean;
  onDirtyChange?: (dirty: boolean) => void;
  saveRef?: RefObject<(() => Promise<boolean>) | null>;
}

/** A whole-garment kind's fitting: its fields by group, the live plan, and the save. */
export function KindFittingForm({ garmentId, kind, fitting, unit: shopUnit, precision, canEdit, onDirtyChange, saveRef }: Props) {
  const t = useT();
  const adapter = adapterOf(kind)!;
  // A saved fitting keeps the unit it was typed in; a new one takes the shop's.
  const unit = fitting.unit ?? shopUnit;
  const [saved, setSaved] = useState(() => savedKindTexts(fitting));
  const [texts, setTexts] = useState(saved);
  const [issues, setIssues] = useState<Record<string, string>>({});
  const dirty = adapter.fields.some((f) => (texts[f.key] ?? '') !== (saved[f.key] ?? ''));
  useEffect(() => onDirtyChange?.(dirty), [dirty, onDirtyChange]);
  const client = useQueryClient();
  const save = useMutation({
    mutationFn: () =>
      fetchJson<KindFittingAnswer>(`/api/garments/${garmentId}/kind-fitting`, {
        method: 'PUT',
        body: { kind, unit, fields: Object.fromEntries(adapter.fields.map((f) => [f.key, texts[f.key] ?? ''])) },
      }),
    onSuccess: (view) => {
      setIssues({});
      setSaved(savedKindTexts(view));
      client.setQueryData(['kind-fitting', garmentId], view);
      void client.invalidateQueries({ queryKey: ['garment', garmentId] });
    },
    onError: (e) => setIssues(e instanceof ApiError ? Object.fromEntries(Object.entries(e.issues).map(([k, v]) => [k.replace(/^fields\./, ''), v])) : {}),
  });
  useEffect(() => {
    if (!saveRef) return;
    saveRef.current = () =>
      save.mutateAsync().then(
        () => true,
        () => false,
      );
  });
  const label = (f: KindField) => kindFieldLabel(t, kind, f);
  // The engine in the browser: the live plan, and each refusal under its field.
  const live = useMemo(() => {
    const refusals = adapter.refusals(texts, unit);
    if (refusals.length > 0) return { plan: null, refusals };
    try {
      return { plan: adapter.plan(texts, unit, precision), refusals };
    } catch {
      return { plan: null, refusals };
    }
  }, [adapter, texts, unit, precision]);
  const liveIssue = (key: string) => {
    const r = live.refusals.find((x) => x.field === key);
    return r
      ? refusalText(
          t,
          { code: r.error.code, values: r.error.values as Record<string, string | number> | undefined },
          key,
          label(adapter.fields.find((f) => f.key === key)!),
        )
      : undefined;
  };
  const shown = shownFields(adapter.fields, texts);
  const groups = [...new Set(shown.map((f) => f.group))];
  const View = PLAN_VIEWS[kind];
  const typedAny = adapter.fields.some((f) => f.type !== 'choice' && (texts[f.key] ?? '').trim() !== '');
  return (
    <section aria-labelledby="kind-fitting-heading" className="flex flex-col gap-4">
      <h2 id="kind-fitting-heading" className="text-2xl font-extrabold">
        {t('kindFitting.heading', { kind: t(`kind.${kind}` as MessageKey) })}
      </h2>
      <p className="text-base text-muted">{t('kindFitting.unitNote', { unit })}</p>
      {fitting.takenBy && <p className="text-base text-muted">{t('kindFitting.taken', { who: fitting.takenBy })}</p>}
      <form
        noValidate
        aria-label={t('kindFitting.heading', { kind: t(`kind.${kind}` as MessageKey) })}
        onSubmit={(e) => {
          e.preventDefault();
          save.mutate();
        }}
        className="flex flex-col gap-4"
      >
        {groups.map((g) => (
          <fieldset key={g} className="grid gap-3 rounded-lg border-2 border-rule bg-card p-4 sm:grid-cols-2" disabled={!canEdit}>
            <legend className="px-1 text-xl font-extrabold">{t(`${kind}.group.${g}` as MessageKey)}</legend>
            {g !== 'hem' && <p className="text-base text-muted sm:col-span-2">{t(`${kind}.groupHint.${g}` as MessageKey)}</p>}
            {shown
              .filter((f) => f.group === g)
              .map((f) => {
                const id = `kf-${f.key}`;
                const error = issues[f.key] ?? (texts[f.key]?.trim() ? liveIssue(f.key) : undefined);
                const hintKey = `${kind}.hint.${f.key}`;
                const hint = t(hintKey as MessageKey);
                const reads = f.type === 'length' && texts[f.key]?.trim() ? readLength(texts[f.key]!, unit, precision) : null;
                const hintText = [hint !== hintKey ? hint : '', reads ? t('kindFitting.reads', { length: reads }) : ''].filter(Boolean).join(' ');
                return (
                  <FieldFrame key={f.key} id={id} label={label(f)} hint={hintText || undefined} error={error}>
                    {f.type === 'choice' ? (
                      <select
                        id={id}
                        value={texts[f.key] || f.options![0]}
                        onChange={(e) => setTexts({ ...texts, [f.key]: e.target.value })}
                        className={INPUT}
                        aria-describedby={describedBy(id, error, hintText)}
                      >
                        {f.options!.map((o) => (
                          <option key={o} value={o}>
                            {kindChoiceWords(t, kind, f.key, o)}
                          </option>
                        ))}
                      </select>
                    ) : (
                      <input
                        id={id}
                        type="text"
                        inputMode="text"
                        autoComplete="off"
                        value={texts[f.key] ?? ''}
                        onChange={(e) => setTexts({ ...texts, [f.key]: e.target.value })}
                        aria-invalid={error ? true : undefined}
                        aria-describedby={describedBy(id, error, hintText)}
                        className={INPUT}
                      />
                    )}
                  </FieldFrame>
                );
              })}
          </fieldset>
        ))}
        {canEdit && (
          <div className="flex flex-wrap items-center gap-4">
            <button
              type="submit"
              disabled={save.isPending}
              className="min-h-12 rounded bg-accent px-5 py-2 text-lg font-semibold text-white disabled:opacity-60"
            >
              {save.isPending ? t('kindFitting.saving') : t('kindFitting.save')}
            </button>
            {save.isSuccess && !dirty && <FormMessage kind="ok">{t('kindFitting.saved')}</FormMessage>}
            {save.isError && <FormMessage kind="error">{t('kindFitting.refused', { error: save.error.message })}</FormMessage>}
          </div>
        )}
      </form>
      {View &&
        (live.plan ? (
          <View plan={live.plan} />
        ) : (
          <p className="text-lg text-muted">
            {typedAny && live.refusals[0]
              ? t('skirt.plan.refused', { text: liveIssue(live.refusals[0].field) ?? live.refusals[0].error.message })
              : t('skirt.plan.waiting')}
          </p>
        ))}
    </section>
  );
}
