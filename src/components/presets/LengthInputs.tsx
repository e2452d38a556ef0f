import type { UseFormRegister, FieldErrors } from 'react-hook-form';
import { Field } from '@/components/Field';
import { LENGTHS_OF, PRESET_LENGTHS } from '@/lib/preset-settings';

const HINTS: Record<string, string> = {
  cuffDepth: 'Finished height of the cuff, e.g. 1 1/2 or 38',
  hemSection: 'Blank: same as the cuff depth',
  turnUnder: 'Blank: the usual (1/2 in or 12 mm on a cuff, 1/4 in or 6 mm on a hem)',
  hemAllowance: 'Cloth below the finished edge, turn-under included. Blank: the usual',
  slope: 'How much lower at the back than the front. Blank: level',
};

type WithSettings = { settings: Record<string, unknown> };

/** The length fields a finish uses, each labelled with its unit. */
export function LengthInputs<T extends WithSettings>({
  finish,
  unit,
  register,
  errors,
  idPrefix,
}: {
  finish: 'cuff' | 'hem';
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
          hint={HINTS[k]}
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
