// The one customer schema: intake's new customer, POST /api/customers and PATCH /api/customers/[id]
// all pick from it, so a rule (an empty e-mail means none) is the same everywhere. Plain zod:
// islands import it.
import { z } from 'zod';
import { text } from './text';
import { CONTACT_PREFERENCES } from './contact-channels';

const blankToNull = (v: string | null | undefined) => (v === '' || v === undefined ? null : v);
const optionalText = (max: number, message: string) =>
  z
    .union([text().trim().max(max, message), z.null()])
    .optional()
    .transform(blankToNull);

/** Every customer field as typed: a name, and a phone, e-mail and notes that may be blank (blank = none). */
export const customerFields = z.object({
  name: text().trim().min(1, 'Give the customer a name').max(120, 'Keep the name under 120 characters.'),
  phone: optionalText(40, 'Keep the phone number under 40 characters.'),
  email: z
    .union([z.literal(''), z.email('Enter an e-mail address like name@example.com').max(200, 'Keep the e-mail under 200 characters.'), z.null()])
    .optional()
    .transform(blankToNull),
  notes: optionalText(2000, 'Keep the notes under 2000 characters.'),
  /** how notices and pay links reach them; left out, by e-mail */
  contactBy: z.enum(CONTACT_PREFERENCES, { error: 'Choose e-mail, text message or both.' }).optional(),
});

/** The message when texts are asked for without a number to send them to. */
export const TEXT_NEEDS_PHONE = 'A text message needs a phone number: add one, or choose e-mail.';

/** A new customer (intake, POST /api/customers): the name is needed, the rest may be left out;
 * texts need a phone number. */
export const newCustomer = customerFields.superRefine((c, ctx) => {
  if ((c.contactBy === 'text' || c.contactBy === 'both') && !c.phone) ctx.addIssue({ code: 'custom', path: ['contactBy'], message: TEXT_NEEDS_PHONE });
});

/** The body of PATCH /api/customers/[id]: any of name, phone, e-mail, notes, contact preference; a
 * field left out is kept (the service checks texts against the phone as it will stand). */
export const customerPatch = customerFields.partial();

/** A new customer once checked. */
export type NewCustomer = z.output<typeof newCustomer>;
/** A customer change once checked. */
export type CustomerPatch = z.output<typeof customerPatch>;

/** The query of GET /api/customers?q=…: what is typed in the search box. */
export const customerQuery = text().trim().max(80, 'Keep the search under 80 characters.');

/** Digits only, as a phone is searched (spaces, dashes, brackets and + dropped). */
export function phoneDigits(phone: string): string {
  return phone.replace(/\D+/g, '');
}
