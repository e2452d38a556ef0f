import type { UseFormRegister, FieldErrors } from 'react-hook-form';
import { Field } from '@/components/Field';
import { FIELD, type Part } from '@/lib/shared/fitting/kinds';
import { LENGTHS_OF, PRESET_LENGTHS } from '@/lib/shared/preset-settings';

type WithSettings = { settings: Record<string, unknown> };

/** The length fields a finish uses, each labelled with its unit. */
export function LengthInputs<T extends WithSettings>({
  finish,
  unit,
  register,
  errors,
  idPrefix,
}: {
  finish: Part;
  unit: string;
  register: UseFormRegister<T>;
  errors: FieldErrors<T>;
  idPrefix: string;
}) {
  const settingsErrors = (errors as FieldErrors<WithSettings>).settings as Record<string, { message?: string; type?: string }> | undefined;
  return (
    <div className="grid gap-3 sm:grid-cols-3">
      {LENGTHS_OF[finish].map((k) => (
        <Field
          key={k}
          id={`${idPrefix}-${k}`}
          label={`${PRESET_LENGTHS[k]} (${unit})`}
          hint={FIELD[k].presetHint ?? FIELD[k].hint}
          inputMode="text"
          autoComplete="off"
          spellCheck={false}
          registration={register(`settings.${k}` as never)}
          error={settingsErrors?.[k] as never}
        />
      ))}
    </div>
  );
}
