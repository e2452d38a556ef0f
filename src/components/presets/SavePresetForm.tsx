// Keeps the leg's current settings as one of the person's own presets.
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Field, FormMessage, SubmitButton } from '@/components/Field';
import { presetCreateInput, type PresetSettings, type PresetView } from '@/lib/shared/preset-settings';
import { PresetSummary } from './PresetSummary';
import { useCreatePreset } from './use-presets';

const nameOnly = presetCreateInput.pick({ name: true });
type NameInput = z.input<typeof nameOnly>;

/** A name field and a button that save `current` as a personal preset. */
export function SavePresetForm({ current, onSaved }: { current: PresetSettings; onSaved?: (preset: PresetView) => void }) {
  const { register, handleSubmit, formState, reset } = useForm<NameInput>({ resolver: zodResolver(nameOnly) });
  const save = useCreatePreset();
  return (
    <form
      noValidate
      aria-labelledby="save-preset-heading"
      onSubmit={handleSubmit((v) =>
        save.mutate(
          { name: v.name, scope: 'personal', settings: current },
          {
            onSuccess: (p) => {
              reset();
              onSaved?.(p);
            },
          },
        ),
      )}
      className="flex flex-col gap-3 rounded-md border-2 border-dashed border-rule p-4"
    >
      <h3 id="save-preset-heading" className="text-lg font-extrabold">
        Keep these settings as your preset
      </h3>
      <PresetSummary settings={current} />
      <Field label="Name for your preset" id="own-preset-name" autoComplete="off" registration={register('name')} error={formState.errors.name} />
      {save.isError && <FormMessage kind="error">{save.error.message}</FormMessage>}
      {save.isSuccess && <FormMessage kind="ok">Saved as {save.data.name}.</FormMessage>}
      <SubmitButton busy={save.isPending}>Save as my preset</SubmitButton>
    </form>
  );
}
