// A labelled input with its error message, wired to react-hook-form.
import type { InputHTMLAttributes, ReactNode } from 'react';
import type { FieldError, UseFormRegisterReturn } from 'react-hook-form';

interface Props extends InputHTMLAttributes<HTMLInputElement> {
  label: string;
  registration: UseFormRegisterReturn;
  error?: FieldError;
  hint?: string;
}

/** The ids an input points to with aria-describedby: its error and its hint, when shown. */
export function describedBy(id: string, error: unknown, hint: unknown): string | undefined {
  return [error ? `${id}-error` : '', hint ? `${id}-hint` : ''].filter(Boolean).join(' ') || undefined;
}

/** A field's frame: label above, the input, then the hint and the error in words. */
export function FieldFrame({ id, label, hint, error, children }: { id: string; label: string; hint?: ReactNode; error?: string; children: ReactNode }) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      {children}
      {hint && (
        <p id={`${id}-hint`} className="text-sm text-muted">
          {hint}
        </p>
      )}
      {error && (
        // No alert role: the input is aria-invalid and points here, and react-hook-form focuses the
        // first invalid field on submit, so the message is read without interrupting live typing.
        <p id={`${id}-error`} className="rounded-sm border-l-4 border-cut bg-cut-soft px-2 py-1 text-base font-semibold text-cut">
          {error}
        </p>
      )}
    </div>
  );
}

/** One form field: label above, input, then the error in words. */
export function Field({ label, registration, error, hint, id, ...input }: Props) {
  const fieldId = id ?? registration.name;
  return (
    <FieldFrame id={fieldId} label={label} hint={hint} error={error?.message}>
      <input
        id={fieldId}
        {...input}
        {...registration}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(fieldId, error, hint)}
        className="rounded border-2 border-rule bg-card px-3 py-2 text-lg focus:border-accent"
      />
    </FieldFrame>
  );
}

/** The main button of a form. */
export function SubmitButton({ busy, children }: { busy: boolean; children: string }) {
  return (
    <button type="submit" disabled={busy} className="min-h-11 rounded bg-accent px-5 py-2 text-lg font-semibold text-white disabled:opacity-60">
      {busy ? 'Working…' : children}
    </button>
  );
}

/** A form-level message: error (red) or done (green). */
export function FormMessage({ kind, children }: { kind: 'error' | 'ok'; children: ReactNode }) {
  const look = kind === 'error' ? 'border-cut bg-cut-soft text-cut' : 'border-ok bg-ok-soft text-ok';
  return (
    <p role={kind === 'error' ? 'alert' : 'status'} className={`rounded border-2 px-3 py-2 font-semibold ${look}`}>
      {children}
    </p>
  );
}
