import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useForm, type Resolver } from 'react-hook-form';
import type { z } from 'zod';
import { Field, FormMessage, SubmitButton } from '@/components/Field';
import { withQuery } from '@/components/WithQuery';
import { SCALE_LABELS, SCALES, settingsRequest } from '@/lib/shared/bench-requests';
import type { BenchSettings } from '@/lib/shared/bench-types';
import { fetchJson } from '@/lib/shared/fetch-json';
import { FITTING_RULE_LABELS, FITTING_RULES } from '@/lib/shared/fitting-rule';
import { DEFAULT_STEP_LABELS, GARMENT_STEPS, stepLabel } from '@/lib/shared/garment-steps';
import { LANGUAGE_NAMES, LANGUAGES } from '@/lib/shared/i18n/languages';
import { WAIST_ORDER_LABELS, WAIST_ORDERS } from '@/lib/shared/waist-order';
import { useBenchSettings } from './use-bench';

type Form = z.input<typeof settingsRequest>;
type Settings = z.output<typeof settingsRequest>;
const resolver = zodResolver(settingsRequest) as unknown as Resolver<Form, unknown, Settings>;

function SettingsForm({ initial }: { initial: BenchSettings }) {
  const client = useQueryClient();
  const { register, handleSubmit, formState } = useForm<Form, unknown, Settings>({ resolver, defaultValues: initial });
  const save = useMutation({
    mutationFn: (body: Settings) => fetchJson<BenchSettings>('/api/bench-settings', { method: 'PUT', body }),
    onSuccess: (saved) => client.setQueryData(['bench-settings'], saved),
  });
  return (
    <form noValidate aria-label="Bench settings" onSubmit={handleSubmit((v) => save.mutate(v))} className="flex flex-col gap-6">
      <fieldset className="flex flex-col gap-2 rounded-lg border-2 border-rule bg-card p-4">
        <legend className="px-1 text-xl font-extrabold">Measure in</legend>
        <p className="text-muted">New fittings are typed and shown this way; saved ones keep the unit they were taken in.</p>
        {SCALES.map((s) => (
          <label key={s} className="inline-flex min-h-11 items-center gap-3 text-lg">
            <input type="radio" value={s} {...register('scale')} className="size-5" /> {SCALE_LABELS[s]}
          </label>
        ))}
      </fieldset>
      <fieldset className="grid gap-3 rounded-lg border-2 border-rule bg-card p-4 sm:grid-cols-2">
        <legend className="px-1 text-xl font-extrabold">The shop’s words for the steps</legend>
        <p className="text-muted sm:col-span-2">Leave a name blank for the usual one. The order stays as it is.</p>
        {GARMENT_STEPS.map((s, i) => (
          <Field
            key={s}
            label={`Step ${i + 1}`}
            registration={register(`stepLabels.${s}`)}
            placeholder={DEFAULT_STEP_LABELS[s]}
            id={`step-${s}`}
            error={formState.errors.stepLabels?.[s]}
          />
        ))}
      </fieldset>
      <fieldset className="flex flex-col gap-2 rounded-lg border-2 border-rule bg-card p-4">
        <legend className="px-1 text-xl font-extrabold">A garment with no fitting saved</legend>
        <p className="text-muted">When someone marks it past {stepLabel('marked', initial.stepLabels)}, with nothing saved to cut by:</p>
        {FITTING_RULES.map((r) => (
          <label key={r} className="inline-flex min-h-11 items-center gap-3 text-lg">
            <input type="radio" value={r} {...register('fittingRule')} className="size-5" /> {FITTING_RULE_LABELS[r]}
          </label>
        ))}
      </fieldset>
      <fieldset className="flex flex-col gap-2 rounded-lg border-2 border-rule bg-card p-4">
        <legend className="px-1 text-xl font-extrabold">A waist change still to do</legend>
        <p className="text-muted">Taking in or letting out the waist moves where the trousers sit, and the hem with them. At the fitting:</p>
        {WAIST_ORDERS.map((o) => (
          <label key={o} className="inline-flex min-h-11 items-center gap-3 text-lg">
            <input type="radio" value={o} {...register('waistOrder')} className="size-5" /> {WAIST_ORDER_LABELS[o]}
          </label>
        ))}
      </fieldset>
      <fieldset className="flex flex-col gap-2 rounded-lg border-2 border-rule bg-card p-4">
        <legend className="px-1 text-xl font-extrabold">Language</legend>
        <p className="text-muted">The garment pages, the fitting form and the printed cut sheets; dates follow it.</p>
        {LANGUAGES.map((l) => (
          <label key={l} lang={l} className="inline-flex min-h-11 items-center gap-3 text-lg">
            <input type="radio" value={l} {...register('language')} className="size-5" /> {LANGUAGE_NAMES[l]}
          </label>
        ))}
      </fieldset>
      {save.error && <FormMessage kind="error">Not saved: {save.error.message}</FormMessage>}
      {save.isSuccess && <FormMessage kind="ok">Saved.</FormMessage>}
      <div>
        <SubmitButton busy={save.isPending}>Save settings</SubmitButton>
      </div>
    </form>
  );
}

function Loader() {
  const settings = useBenchSettings();
  if (settings.isError)
    return (
      <p role="alert" className="font-semibold text-cut">
        {settings.error.message}
      </p>
    );
  if (settings.isPending) return <p className="text-muted">Loading…</p>;
  return <SettingsForm initial={settings.data} />;
}

/** The lead's bench settings island: the measuring scale, the shop's names for the steps, its rule for cutting with no fitting. */
export default withQuery(Loader);
