// How the customer wants notices and pay links: e-mail, text message or both (radio buttons wired
// to react-hook-form), shown where the customer's details are typed: intake and the customer edit.
import type { FieldError, UseFormRegisterReturn } from 'react-hook-form';
import { CONTACT_PREFERENCES, PREFERENCE_LABEL } from '@/lib/shared/contact-channels';

/** The contact preference as three radio buttons, with its error (texts need a phone number). */
export function ContactByField({ id, registration, error }: { id: string; registration: UseFormRegisterReturn; error?: FieldError }) {
  return (
    <fieldset className="flex flex-col gap-1 sm:col-span-2" aria-describedby={error ? `${id}-error` : undefined}>
      <legend className="font-semibold">Send notices and pay links by</legend>
      <div className="flex flex-wrap gap-x-4">
        {CONTACT_PREFERENCES.map((p) => (
          <label key={p} className="inline-flex min-h-11 items-center gap-2 text-lg">
            {/* E-mail is checked until told otherwise, as the customer record's default. */}
            <input type="radio" value={p} {...registration} id={`${id}-${p}`} defaultChecked={p === 'email'} className="size-5" />
            {PREFERENCE_LABEL[p]}
          </label>
        ))}
      </div>
      {error && (
        <p id={`${id}-error`} className="rounded-sm border-l-4 border-cut bg-cut-soft px-2 py-1 text-base font-semibold text-cut">
          {error.message}
        </p>
      )}
    </fieldset>
  );
}
