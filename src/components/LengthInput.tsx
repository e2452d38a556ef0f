import type { ChangeEventHandler, FocusEventHandler, ReactNode, Ref } from 'react';
import { describedBy, FieldFrame } from './Field';

/** What ties the input to its form: react-hook-form's register(name), or a value and onChange of plain state. */
export interface InputBinding {
  name: string;
  value?: string;
  onChange?: ChangeEventHandler<HTMLInputElement>;
  onBlur?: FocusEventHandler<HTMLInputElement>;
  ref?: Ref<HTMLInputElement>;
}

interface Props {
  id: string;
  label: string;
  unit: string;
  registration: InputBinding;
  hint?: ReactNode;
  error?: string;
  /** what the typed text reads as ("31 7/8 in"), shown beside it once it parses */
  reading?: string | null;
  /** a word about the value that is not an error (e.g. left as typed when the unit changed) */
  note?: string | null;
  /** shown between the input and its hint, e.g. quick picks */
  children?: ReactNode;
}

/** One labelled length as typed ("1 1/2", "38 mm"), the unit beside it, hint and error tied to it. */
export function LengthInput({ id, label, unit, registration, hint, error, reading, note, children }: Props) {
  const described = [describedBy(id, error, hint), reading ? `${id}-reading` : '', note ? `${id}-note` : ''].filter(Boolean).join(' ') || undefined;
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
          aria-describedby={described}
          className={`measure w-full min-w-0 rounded-l-md border-2 bg-card px-3 text-xl ${error ? 'border-cut' : 'border-rule focus:border-accent'}`}
          {...registration}
        />
        <span
          aria-hidden="true"
          className="flex min-w-12 items-center justify-center rounded-r-md border-2 border-l-0 border-rule bg-paper px-2 text-base text-muted"
        >
          {unit}
        </span>
      </div>
      {reading && (
        <p id={`${id}-reading`} data-testid={`${id}-reading`} className="measure text-base font-semibold text-ok">
          <span className="sr-only">Reads as </span>= {reading}
        </p>
      )}
      {note && (
        <p id={`${id}-note`} className="rounded-sm border-l-4 border-warn bg-warn-soft px-2 py-1 text-base font-semibold text-warn">
          {note}
        </p>
      )}
      {children}
    </FieldFrame>
  );
}
