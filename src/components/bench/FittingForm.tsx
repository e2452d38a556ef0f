import { useT } from '@/components/I18n';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useRef, useState, type MutableRefObject } from 'react';
import { useForm, useWatch, type Resolver } from 'react-hook-form';
import { Segmented } from '@/components/calculator/Segmented';
import { Dialog } from '@/components/Dialog';
import { useDebounced } from '@/components/calculator/use-debounced';
import { PresetPicker, type PresetSettings } from '@/components/presets/PresetPicker';
import { usePresets } from '@/components/presets/use-presets';
import type { Precision, Unit } from '@/lib/allowance/types';
import type { FittingView } from '@/lib/shared/bench-types';
import { PRESET_LENGTHS, type PresetLength, type PresetView } from '@/lib/shared/preset-settings';
import { readFinish } from '@/lib/shared/fitting/kinds';
import { ApiError, fetchJson } from '@/lib/shared/fetch-json';
import { zodLengthText } from '@/lib/shared/i18n/check-words';
import type { MessageKey } from '@/lib/shared/i18n/format';
import {
  LEG_LENGTH_LABELS,
  LEGS,
  legFormValues,
  measurementsRequest,
  type Leg,
  type LegLength,
  type Measurements,
  type MeasurementsInput,
} from '@/lib/shared/measurement-request';
import { readLength, typedForUnit } from '@/lib/shared/length-reading';
import { afterSave } from './after-save';
import { LegFields } from './LegFields';
import { LegPlanView } from './LegPlan';
import { WaistNoteLine } from './WaistNoteLine';
import { PlanSummary } from './PlanSummary';
import { useLegPlan } from './use-leg-plan';
import { keepDraft, readDraft } from './use-draft';

interface Props {
  garmentId: string;
  fitting: FittingView;
  unit: Unit;
  precision: Precision;
  /** told whenever the form gains or loses unsaved changes */
  onDirtyChange?: (dirty: boolean) => void;
  /** filled with a function that saves the form as it stands: true once saved */
  saveRef?: MutableRefObject<(() => Promise<boolean>) | null>;
  /** the pair's old hem or cuff is let down first (letDownFirst): the width at the cut is asked for and used */
  letDown?: boolean;
}

// A reset keeps the inputs it knows: without this a key typed between a reset (the default
// landing, a save coming back) and the next render found no field, was dropped, and the field was
// then put back to the reset's value.
const KEEP_FIELDS = { keepFieldsRef: true } as const;

const resolver = zodResolver(measurementsRequest) as unknown as Resolver<MeasurementsInput, unknown, Measurements>;

function formValues(fitting: FittingView, unit: Unit): MeasurementsInput {
  const byLeg = new Map(fitting.legs.map((l) => [l.leg, l]));
  return { unit: fitting.legs[0]?.unit ?? unit, legs: { left: legFormValues(byLeg.get('left')), right: legFormValues(byLeg.get('right')) } };
}

/** A preset's main length as a short note, e.g. "cuff 1 1/2 in". */
function presetLine(preset: PresetView | undefined): string {
  if (!preset) return '';
  const s = preset.settings;
  const main = s.finish === 'cuff' ? s.cuffDepth && `cuff ${s.cuffDepth} ${s.unit}` : s.hemAllowance && `hem ${s.hemAllowance} ${s.unit}`;
  return main ? `(${main})` : '';
}

/** The form with a preset's finish and lengths on the given legs (its id recorded, its name shown). */
function withPreset(form: MeasurementsInput, legs: readonly Leg[], preset: PresetView): MeasurementsInput {
  const next = structuredClone(form);
  const p = preset.settings;
  for (const l of legs) {
    const typed = next.legs[l];
    typed.preset = preset.name;
    typed.presetId = preset.id;
    typed.finish = readFinish(p.finish, Boolean(p.slope)) ?? 'plain';
    for (const f of Object.keys(PRESET_LENGTHS) as PresetLength[]) typed[f] = typedForUnit(p[f] ?? '', p.unit, next.unit);
  }
  return next;
}

/** Both legs' fitting as a form, the chosen leg's live plan beside it; nothing typed is lost on a failed save. */
export function FittingForm({ garmentId, fitting, unit, precision, onDirtyChange, saveRef, letDown = false }: Props) {
  const client = useQueryClient();
  const t = useT();
  const form = useForm<MeasurementsInput, unknown, Measurements>({ defaultValues: formValues(fitting, unit), resolver, mode: 'onChange' });
  const { register, control, setValue, setError, reset, getValues, handleSubmit, formState } = form;
  const values = useWatch({ control }) as Measurements;
  const [leg, setLeg] = useState<Leg>('left');
  const current = useDebounced(values.legs[leg], 250);
  // Asked once for the leg: the summary bar and the full plan show the same answer.
  const planned = useLegPlan(current, values.unit, precision, letDown);
  const [presetsOpen, setPresetsOpen] = useState(false);
  const other: Leg = leg === 'left' ? 'right' : 'left';
  const draftKey = `cuffwright:fitting-draft:${garmentId}`;
  const [restored, setRestored] = useState(false);
  const restoredDraft = useRef(false);
  // The form as it stood when the last save was sent, to tell what was typed while it was on its way.
  const sent = useRef<MeasurementsInput | null>(null);
  const [typedWhileSaving, setTypedWhileSaving] = useState(false);
  /** Puts back what was typed (the dotted paths in `newer`, read from `kept`) as unsaved changes. */
  const keepTyped = useCallback(
    (kept: MeasurementsInput, newer: string[]) => {
      for (const path of newer) {
        const value = path.split('.').reduce<unknown>((o, k) => (o as Record<string, unknown>)[k], kept);
        setValue(path as `legs.left.${LegLength}`, value as string, { shouldDirty: true, shouldValidate: true });
      }
    },
    [setValue],
  );

  // Lengths typed before a reload come back, marked unsaved, until saved or discarded.
  useEffect(() => {
    const draft = readDraft<MeasurementsInput>(draftKey);
    if (draft) {
      restoredDraft.current = true;
      reset(draft, { ...KEEP_FIELDS, keepDefaultValues: true });
      setRestored(true);
    }
  }, [draftKey, reset]);
  useEffect(() => keepDraft(draftKey, values, formState.isDirty), [draftKey, values, formState.isDirty]);

  const save = useMutation({
    mutationFn: (body: Measurements) => fetchJson<FittingView>(`/api/garments/${garmentId}/measurements`, { method: 'PUT', body }),
    onSuccess: (saved) => {
      client.setQueryData(['fitting', garmentId], saved);
      // The garment's "fitting saved" (asked before it passes Chalk-marked) may have changed.
      void client.invalidateQueries({ queryKey: ['garment', garmentId] });
      const stored = formValues(saved, unit);
      const { values: kept, newer } = afterSave(sent.current ?? getValues(), getValues(), stored);
      reset(stored, KEEP_FIELDS);
      // Lengths typed during the save stay on screen and keep the form unsaved.
      keepTyped(kept, newer);
      setTypedWhileSaving(newer.length > 0);
      setRestored(false);
    },
    onError: (e) => {
      if (!(e instanceof ApiError)) return;
      for (const [path, message] of Object.entries(e.issues)) {
        setError(path as `legs.left.${LegLength}`, { type: 'server', message });
        const side = path.split('.')[1];
        if (side === 'left' || side === 'right') setLeg(side);
      }
    },
  });

  // Leaving the page with unsaved lengths asks first.
  useEffect(() => {
    const warn = (e: BeforeUnloadEvent) => {
      if (formState.isDirty) e.preventDefault();
    };
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [formState.isDirty]);

  useEffect(() => onDirtyChange?.(formState.isDirty), [onDirtyChange, formState.isDirty]);

  // One way to save, from the button or from printing: checked, sent, errors marked; true once saved.
  const saveNow = (): Promise<boolean> => {
    let saved = false;
    return handleSubmit(async (body) => {
      sent.current = structuredClone(getValues());
      setTypedWhileSaving(false);
      saved = await save.mutateAsync(body).then(
        () => true,
        () => false,
      );
    })().then(() => saved);
  };
  if (saveRef) saveRef.current = saveNow;

  // zod's faults in the page's words, the field named as its label is (field.<key>, else the registry's English).
  const errorFor = (f: LegLength) => {
    const named = t(`field.${f}` as MessageKey);
    return zodLengthText(t, formState.errors.legs?.[leg]?.[f], named === `field.${f}` ? LEG_LENGTH_LABELS[f] : named);
  };

  const applyPreset = (_settings: PresetSettings, preset: PresetView) => {
    setLegs(withPreset(getValues(), [leg], preset), { shouldDirty: true, shouldValidate: true });
    setFromDefault(null);
  };
  const setLegs = (next: MeasurementsInput, how: { shouldDirty: boolean; shouldValidate: boolean }) => {
    for (const l of LEGS) for (const [k, v] of Object.entries(next.legs[l])) setValue(`legs.${l}.${k as LegLength}`, v as string, how);
  };

  // A new fitting starts from the house default, said on screen, one tap from another preset.
  const presets = usePresets();
  const [fromDefault, setFromDefault] = useState<string | null>(null);
  const prefilled = useRef(false);
  useEffect(() => {
    const houseDefault = presets.data?.find((p) => p.house && p.isDefault);
    if (prefilled.current || !houseDefault || fitting.legs.length > 0 || restoredDraft.current) return;
    prefilled.current = true;
    // As the form's starting point, not a change: opening a garment alone asks nothing on leaving.
    // The presets can land after the tailor has started typing (a slow connection): what was typed
    // is laid over the default and stays a change to save, never taken into the starting point.
    const blank = formValues(fitting, unit);
    const start = withPreset(blank, LEGS, houseDefault);
    const { values: kept, newer } = afterSave(blank, getValues(), start);
    reset(start, KEEP_FIELDS);
    keepTyped(kept, newer);
    setFromDefault(houseDefault.id);
  }, [presets.data, fitting, unit, reset, getValues, keepTyped]);

  const copyOther = () => {
    const from = values.legs[other];
    for (const [k, v] of Object.entries(from)) setValue(`legs.${leg}.${k as LegLength}`, v as string, { shouldDirty: true, shouldValidate: true });
  };

  return (
    <div className="flex flex-col gap-4">
      <PlanSummary leg={leg} planned={planned} />
      <WaistNoteLine note={fitting.waist?.[leg]} />
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,30rem)_minmax(0,1fr)]">
        <form
          aria-label={t('fitting.form')}
          noValidate
          onSubmit={(e) => {
            e.preventDefault();
            void saveNow();
          }}
          // A field brought into view (focus, Tab) stops below the summary bar, never under it.
          className="flex flex-col gap-5 rounded-lg border-2 border-rule bg-card p-4 [&_input]:scroll-mt-48"
        >
          <Segmented
            name="leg"
            legend={t('fitting.leg')}
            value={leg}
            onChange={setLeg}
            options={LEGS.map((l) => ({ value: l, label: t('fitting.legName', { leg: l }) }))}
          />
          <p className="text-base text-muted">
            Lengths in <strong className="text-ink">{values.unit}</strong>; fractions welcome (1 1/2, 1½, 31 3/4 + 1/8), or name a unit (38 mm).
          </p>
          {/* In a dialog on the top layer: opening the list moves no field (it used to push them 500 px down). */}
          <button
            type="button"
            aria-haspopup="dialog"
            onClick={() => setPresetsOpen(true)}
            className="min-h-11 self-start rounded-md border-2 border-ink bg-card px-4 text-lg font-extrabold"
          >
            Presets for the {leg} leg…
          </button>
          <Dialog open={presetsOpen} onClose={() => setPresetsOpen(false)} title={`Presets for the ${leg} leg`} testId="presets-dialog">
            <p className="text-base text-muted">A tap fills the {leg} leg’s finish and allowances; the pins and widths stay as typed.</p>
            {values.legs[leg].preset && (
              <button
                type="button"
                onClick={() => {
                  setValue(`legs.${leg}.preset`, '', { shouldDirty: true });
                  setValue(`legs.${leg}.presetId`, '', { shouldDirty: true });
                  setPresetsOpen(false);
                }}
                className="min-h-11 self-start rounded border-2 border-ink px-3 text-lg font-semibold"
              >
                Not from a preset (keep the lengths)
              </button>
            )}
            <PresetPicker
              unit={values.unit}
              onApply={(p, preset) => {
                applyPreset(p, preset);
                setPresetsOpen(false);
              }}
            />
          </Dialog>
          {/* Always one line, preset or none ("not from a preset" is in the list): applying one moves no field either. */}
          <p data-testid="leg-preset" className="flex min-h-11 flex-wrap items-center gap-x-3 text-lg">
            {values.legs[leg].preset && fromDefault && values.legs[leg].presetId === fromDefault ? (
              <>
                <span>
                  From house default: <strong>{values.legs[leg].preset}</strong> {presetLine(presets.data?.find((p) => p.id === fromDefault))}
                </span>
                <button
                  type="button"
                  onClick={() => setPresetsOpen(true)}
                  className="min-h-11 rounded border-2 border-accent px-3 text-base font-semibold text-accent"
                >
                  Change
                </button>
              </>
            ) : values.legs[leg].preset ? (
              <span>
                From the preset <strong>{values.legs[leg].preset}</strong>
              </span>
            ) : (
              <span className="text-muted">Not from a preset.</span>
            )}
          </p>
          <LegFields
            key={leg}
            leg={leg}
            finish={values.legs[leg].finish}
            unit={values.unit}
            register={register}
            onFinish={(f) => setValue(`legs.${leg}.finish`, f, { shouldDirty: true })}
            errorFor={errorFor}
            readingFor={(f) => readLength(values.legs[leg][f], values.unit, precision)}
            letDown={letDown}
          />
          <button type="button" onClick={copyOther} className="min-h-11 self-start rounded-md border-2 border-ink px-4 text-lg font-semibold">
            {t('fitting.sameAs', { other })}
          </button>
          <div className="flex flex-col gap-2 border-t-2 border-rule pt-3">
            {restored && formState.isDirty && (
              <div role="status" className="flex flex-col gap-2 rounded border-2 border-warn bg-warn-soft px-3 py-2 font-semibold text-warn">
                <p>{t('fitting.restored')}</p>
                <button
                  type="button"
                  onClick={() => {
                    reset(formValues(fitting, unit), KEEP_FIELDS);
                    setRestored(false);
                  }}
                  className="min-h-11 self-start rounded border-2 border-warn bg-card px-3"
                >
                  {t('fitting.discard')}
                </button>
              </div>
            )}
            {save.error && (
              <p role="alert" className="rounded border-2 border-cut bg-cut-soft px-3 py-2 font-semibold text-cut">
                {t('fitting.notSaved', { error: save.error.message })}
              </p>
            )}
            {save.isSuccess && !formState.isDirty && (
              <p role="status" className="rounded border-2 border-ok bg-ok-soft px-3 py-2 font-semibold text-ok">
                {t('fitting.saved')}
              </p>
            )}
            {save.isSuccess && typedWhileSaving && formState.isDirty && (
              <p role="status" className="rounded border-2 border-warn bg-warn-soft px-3 py-2 font-semibold text-warn">
                {t('fitting.savedTyped')}
              </p>
            )}
            <button
              type="submit"
              disabled={save.isPending}
              className="min-h-14 rounded-lg bg-accent px-5 text-xl font-extrabold text-white disabled:opacity-60"
            >
              {save.isPending
                ? t('fitting.saving')
                : formState.isDirty || (fromDefault && fitting.legs.length === 0)
                  ? t('fitting.save')
                  : t('fitting.saveNoChanges')}
            </button>
          </div>
        </form>
        <LegPlanView leg={leg} values={current} unit={values.unit} precision={precision} planned={planned} />
      </div>
    </div>
  );
}
