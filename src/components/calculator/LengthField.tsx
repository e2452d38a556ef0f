import type { ReactNode } from 'react';
import type { UseFormRegister } from 'react-hook-form';
import type { CalculatorValues, LengthField as Field } from './calculator-values';

interface Props {
  name: Field;
  label: string;
  unit: string;
  register: UseFormRegister<CalculatorValues>;
  hint?: ReactNode;
  error?: string;
  children?: ReactNode;
}

/** One labelled length input: hint and field message tied to it with aria-describedby. */
export function LengthField({ name, label, unit, register, hint, error, children }: Props) {
  const id = `f-${name}`;
  const describedBy = [hint ? `${id}-hint` : '', error ? `${id}-error` : ''].filter(Boolean).join(' ');
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-base font-semibold">
        {label}
      </label>
      <div className="flex items-stretch">
        <input
          id={id}
          type="text"
          inputMode="text"
          autoComplete="off"
          spellCheck={false}
          enterKeyHint="next"
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy || undefined}
          className={
            'w-full min-w-0 rounded-l-md border-2 bg-card px-3 text-xl ' +
            (error ? 'border-cut' : 'border-rule focus:border-accent')
          }
          {...register(name)}
        />
        <span
          aria-hidden="true"
          className="flex min-w-12 items-center justify-center rounded-r-md border-2 border-l-0 border-rule bg-paper px-2 text-base text-muted"
        >
          {unit}
        </span>
      </div>
      {children}
      {hint && (
        <p id={`${id}-hint`} className="text-sm text-muted">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="rounded-sm border-l-4 border-cut bg-cut-soft px-2 py-1 text-base font-semibold text-cut">
          {error}
        </p>
      )}
    </div>
  );
}
