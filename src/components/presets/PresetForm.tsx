// One form for a preset: a new house preset (the lead), a new one of your own, or an edit of either.
import { zodResolver } from '@hookform/resolvers/zod';
import { useId } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Segmented } from '@/components/calculator/Segmented';
import { Field, FormMessage, SubmitButton } from '@/components/Field';
import { ApiError } from '@/lib/shared/fetch-json';
import { presetCreateInput, type PresetView } from '@/lib/shared/preset-settings';
import { PART_IDS, PART_LABELS } from '@/lib/shared/fitting/kinds';
import { LengthInputs } from './LengthInputs';
import { useCreatePreset, useUpdatePreset } from './use-presets';

type Input = z.input<typeof presetCreateInput>;

const FINISHES = PART_IDS.map((p) => ({ value: p, label: PART_LABELS[p] }));
const UNITS = [
  { value: 'in' as const, label: 'in' },
  { value: 'cm' as const, label: 'cm' },
  { value: 'mm' as const, label: 'mm' },
];

const BLANK_LENGTHS = { cuffDepth: '', hemSection: '', turnUnder: '', hemAllowance: '', slope: '' };

type Props = { scope: 'house' | 'personal'; editing?: undefined; onDone?: undefined } | { scope?: undefined; editing: PresetView; onDone: () => void };

/** Name, finish, unit and lengths; a new house preset may also become the house default. */
export function PresetForm({ scope, editing, onDone }: Props) {
  const idPrefix = useId().replace(/[^a-zA-Z0-9_-]/g, '');
  const house = editing ? editing.house : scope === 'house';
  const start: Input = editing
    ? { name: editing.name, scope: house ? 'house' : 'personal', settings: { ...BLANK_LENGTHS, ...editing.settings } }
    : { name: '', scope: house ? 'house' : 'personal', isDefault: false, settings: { finish: 'cuff', unit: 'in' } };
  const { register, handleSubmit, formState, watch, setValue, setError, reset } = useForm<Input>({
    resolver: zodResolver(presetCreateInput),
    defaultValues: start,
  });
  const create = useCreatePreset();
  const update = useUpdatePreset();
  const finish = watch('settings.finish');
  const unit = watch('settings.unit');
  const onError = (e: Error) => {
    if (e instanceof ApiError) for (const [k, m] of Object.entries(e.issues)) setError(k as never, { message: m });
  };
  const submit = handleSubmit((v) =>
    editing
      ? update.mutate({ id: editing.id, name: v.name, settings: v.settings }, { onSuccess: onDone, onError })
      : create.mutate(v, { onSuccess: () => reset({ ...start, name: '', settings: { finish, unit, ...BLANK_LENGTHS } }), onError }),
  );
  const title = editing ? `Edit ${editing.name}` : house ? 'New house preset' : 'New preset of your own';
  const failed = editing ? update.error : create.error;
  return (
    <form noValidate onSubmit={submit} aria-label={title} className="flex flex-col gap-4 rounded-lg border-2 border-ink bg-card p-5">
      <h2 className="text-2xl font-extrabold">{title}</h2>
      {editing && <p className="text-muted">Fittings that used this preset keep pointing at it and show its new name; the change is kept in its history.</p>}
      <Field label="Preset name" id={`${idPrefix}-name`} autoComplete="off" registration={register('name')} error={formState.errors.name} />
      <div className="grid gap-4 sm:grid-cols-2">
        <Segmented name={`${idPrefix}-finish`} legend="Finish" options={FINISHES} value={finish} onChange={(v) => setValue('settings.finish', v)} />
        <Segmented name={`${idPrefix}-unit`} legend="Unit" options={UNITS} value={unit} onChange={(v) => setValue('settings.unit', v)} />
      </div>
      <LengthInputs finish={finish} unit={unit} register={register} errors={formState.errors} idPrefix={idPrefix} />
      {house && !editing && (
        <label className="flex min-h-11 items-center gap-3 text-lg font-semibold">
          <input type="checkbox" className="size-6 accent-accent" {...register('isDefault')} />
          Make it the house default (a new fitting starts from it)
        </label>
      )}
      {failed && <FormMessage kind="error">{failed.message}</FormMessage>}
      {!editing && create.isSuccess && (
        <FormMessage kind="ok">
          {house ? 'House preset' : 'Your preset'} {create.data.name} saved.
        </FormMessage>
      )}
      <div className="flex flex-wrap gap-3">
        <SubmitButton busy={editing ? update.isPending : create.isPending}>
          {editing ? 'Save changes' : house ? 'Save house preset' : 'Save my preset'}
        </SubmitButton>
        {editing && (
          <button type="button" onClick={onDone} className="min-h-11 rounded border-2 border-ink px-4 font-semibold">
            Cancel
          </button>
        )}
      </div>
    </form>
  );
}
