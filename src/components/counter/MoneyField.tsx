// A money input: the person types "25.00" (or "25,5"), the form holds integer minor units.
import { useState } from 'react';
import { useController, type Control, type FieldValues, type Path } from 'react-hook-form';
import { describedBy, FieldFrame } from '@/components/Field';
import { CURRENCIES, parseMoney, type Currency } from '@/lib/pricing/money';

interface Props<T extends FieldValues> {
  control: Control<T>;
  name: Path<T>;
  label: string;
  currency: Currency;
  id: string;
  hint?: string;
}

/** The amount as typed back from minor units, in the currency's own decimals ("25.00"). */
export function plainAmount(minor: number, currency: Currency): string {
  const digits = CURRENCIES[currency];
  return Number.isFinite(minor) ? (minor / 10 ** digits).toFixed(digits) : '';
}

/** A labelled amount field wired to react-hook-form through its controller. */
export function MoneyField<T extends FieldValues>({ control, name, label, currency, id, hint }: Props<T>) {
  const { field, fieldState } = useController({ control, name });
  const [text, setText] = useState(() => (typeof field.value === 'number' ? plainAmount(field.value, currency) : ''));
  return (
    <FieldFrame id={id} label={label} hint={hint} error={fieldState.error?.message}>
      <input
        id={id}
        ref={field.ref}
        name={field.name}
        inputMode="decimal"
        autoComplete="off"
        value={text}
        onBlur={field.onBlur}
        onChange={(e) => {
          setText(e.target.value);
          field.onChange(parseMoney(e.target.value, currency) ?? Number.NaN);
        }}
        aria-invalid={fieldState.error ? true : undefined}
        aria-describedby={describedBy(id, fieldState.error, hint)}
        className="rounded border-2 border-rule bg-card px-3 py-2 text-lg tabular-nums focus:border-accent"
      />
    </FieldFrame>
  );
}
