// A labelled input with its error message, wired to react-hook-form.
import type { InputHTMLAttributes } from 'react';
import type { FieldError, UseFormRegisterReturn } from 'react-hook-form';

interface Props extends InputHTMLAttributes<HTMLInputElement> {
  label: string;
  registration: UseFormRegisterReturn;
  error?: FieldError;
  hint?: string;
}

/** One form field: label above, input, then the error in words. */
export function Field({ label, registration, error, hint, id, ...input }: Props) {
  const fieldId = id ?? registration.name;
  const describedBy = [error ? `${fieldId}-error` : '', hint ? `${fieldId}-hint` : ''].filter(Boolean).join(' ') || undefined;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={fieldId} className="font-semibold">
        {label}
      </label>
      <input
        id={fieldId}
        {...input}
        {...registration}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className="rounded border-2 border-rule bg-card px-3 py-2 text-lg focus:border-accent"
      />
      {hint && (
        <p id={`${fieldId}-hint`} className="text-sm text-muted">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${fieldId}-error`} role="alert" className="text-sm font-semibold text-cut">
          {error.message}
        </p>
      )}
    </div>
  );
}

/** The main button of a form. */
export function SubmitButton({ busy, children }: { busy: boolean; children: string }) {
  return (
    <button
      type="submit"
      disabled={busy}
      className="min-h-11 rounded bg-accent px-5 py-2 text-lg font-semibold text-white disabled:opacity-60"
    >
      {busy ? 'Working…' : children}
    </button>
  );
}

/** A form-level message: error (red) or done (green). */
export function FormMessage({ kind, children }: { kind: 'error' | 'ok'; children: React.ReactNode }) {
  const look = kind === 'error' ? 'border-cut bg-cut-soft text-cut' : 'border-ok bg-ok-soft text-ok';
  return (
    <p role={kind === 'error' ? 'alert' : 'status'} className={`rounded border-2 px-3 py-2 font-semibold ${look}`}>
      {children}
    </p>
  );
}
