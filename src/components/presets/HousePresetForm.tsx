// The lead's form for a new house preset.
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Segmented } from '@/components/calculator/Segmented';
import { Field, FormMessage, SubmitButton } from '@/components/Field';
import { ApiError } from '@/lib/fetch-json';
import { presetCreateInput } from '@/lib/preset-settings';
import { LengthInputs } from './LengthInputs';
import { useCreatePreset } from './use-presets';

type Input = z.input<typeof presetCreateInput>;

const FINISHES = [
  { value: 'cuff' as const, label: 'Cuff' },
  { value: 'hem' as const, label: 'Plain hem' },
];
const UNITS = [
  { value: 'in' as const, label: 'in' },
  { value: 'cm' as const, label: 'cm' },
  { value: 'mm' as const, label: 'mm' },
];

/** Name, finish, unit and lengths of a house preset; optionally the new house default. */
export function HousePresetForm() {
  const { register, handleSubmit, formState, watch, setValue, setError, reset } = useForm<Input>({
    resolver: zodResolver(presetCreateInput),
    defaultValues: { scope: 'house', isDefault: false, settings: { finish: 'cuff', unit: 'in' } },
  });
  const create = useCreatePreset();
  const finish = watch('settings.finish');
  const unit = watch('settings.unit');
  const submit = handleSubmit((v) =>
    create.mutate(v, {
      onSuccess: () => reset({ scope: 'house', isDefault: false, name: '', settings: { finish, unit, cuffDepth: '', hemSection: '', turnUnder: '', hemAllowance: '', slope: '' } }),
      onError: (e) => {
        if (e instanceof ApiError) for (const [k, m] of Object.entries(e.issues)) setError(k as never, { message: m });
      },
    }),
  );
  return (
    <form noValidate onSubmit={submit} aria-labelledby="new-house-heading" className="flex flex-col gap-4 rounded-lg border-2 border-ink bg-card p-5">
      <h2 id="new-house-heading" className="text-2xl font-extrabold">New house preset</h2>
      <Field label="Preset name" id="house-name" autoComplete="off" registration={register('name')} error={formState.errors.name} />
      <div className="grid gap-4 sm:grid-cols-2">
        <Segmented name="house-finish" legend="Finish" options={FINISHES} value={finish} onChange={(v) => setValue('settings.finish', v)} />
        <Segmented name="house-unit" legend="Unit" options={UNITS} value={unit} onChange={(v) => setValue('settings.unit', v)} />
      </div>
      <LengthInputs finish={finish} unit={unit} register={register} errors={formState.errors} idPrefix="house" />
      <label className="flex min-h-11 items-center gap-3 text-lg font-semibold">
        <input type="checkbox" className="size-6 accent-accent" {...register('isDefault')} />
        Make it the house default (preselected for everyone)
      </label>
      {create.isError && <FormMessage kind="error">{create.error.message}</FormMessage>}
      {create.isSuccess && <FormMessage kind="ok">House preset {create.data.name} saved.</FormMessage>}
      <SubmitButton busy={create.isPending}>Save house preset</SubmitButton>
    </form>
  );
}
