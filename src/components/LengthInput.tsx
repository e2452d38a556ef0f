import type { ReactNode } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';
import { describedBy, FieldFrame } from './Field';

interface Props {
  id: string;
  label: string;
  unit: string;
  registration: UseFormRegisterReturn;
  hint?: ReactNode;
  error?: string;
  /** shown between the input and its hint, e.g. quick picks */
  children?: ReactNode;
}

/** One labelled length as typed ("1 1/2", "38 mm"), the unit beside it, hint and error tied to it. */
export function LengthInput({ id, label, unit, registration, hint, error, children }: Props) {
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error}>
      <div className="flex items-stretch">
        <input
          id={id}
          type="text"
          inputMode="text"
          autoComplete="off"
          spellCheck={false}
          enterKeyHint="next"
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(id, error, hint)}
          className={'measure w-full min-w-0 rounded-l-md border-2 bg-card px-3 text-xl ' + (error ? 'border-cut' : 'border-rule focus:border-accent')}
          {...registration}
        />
        <span aria-hidden="true" className="flex min-w-12 items-center justify-center rounded-r-md border-2 border-l-0 border-rule bg-paper px-2 text-base text-muted">
          {unit}
        </span>
      </div>
      {children}
    </FieldFrame>
  );
}
