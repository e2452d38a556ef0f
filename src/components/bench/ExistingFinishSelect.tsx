import type { FieldError, UseFormRegisterReturn } from 'react-hook-form';
import { describedBy, FieldFrame } from '@/components/Field';
import { EXISTING_FINISHES, EXISTING_FINISH_LABELS } from '@/lib/shared/existing-finish';

const HINT = 'What the bottoms are now. An old cuff is let down and pressed out before the new finish is made.';

/** The "Existing finish" choice of a garment (plain hem, cuff, unfinished), labelled, with its hint. */
export function ExistingFinishSelect({
  id,
  registration,
  error,
  hint = true,
}: {
  id: string;
  registration: UseFormRegisterReturn;
  error?: FieldError;
  hint?: boolean;
}) {
  return (
    <FieldFrame id={id} label="Existing finish" hint={hint ? HINT : undefined} error={error?.message}>
      <select
        id={id}
        {...registration}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, error, hint ? HINT : undefined)}
        className="min-h-12 rounded border-2 border-rule bg-card px-3 py-2 text-lg focus:border-accent"
      >
        {EXISTING_FINISHES.map((f) => (
          <option key={f} value={f}>
            {EXISTING_FINISH_LABELS[f]}
          </option>
        ))}
      </select>
    </FieldFrame>
  );
}
