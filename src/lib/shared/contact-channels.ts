// How a message reaches a customer: by e-mail, by text, or both, as the customer prefers, with the
// reason told to the counter when a channel cannot be used. Pure: islands show the same words.

/** What the customer prefers, as kept on the customer. */
export const CONTACT_PREFERENCES = ['email', 'text', 'both'] as const;
/** A customer's contact preference. */
export type ContactPreference = (typeof CONTACT_PREFERENCES)[number];
/** How one message goes. */
export const CHANNELS = ['email', 'sms'] as const;
/** A channel a notice goes by. */
export type Channel = (typeof CHANNELS)[number];

/** The preference in the counter's words. */
export const PREFERENCE_LABEL: Record<ContactPreference, string> = { email: 'E-mail', text: 'Text message', both: 'E-mail and text message' };

/** One send: the channel, the address or number, and why it is not what the customer asked for. */
export interface PlannedSend {
  channel: Channel;
  to: string;
  note: string | null;
}

/** Why texts cannot go, in the counter's words. */
export const TEXTS_NOT_SET_UP = 'Text messages are not set up for this shop';
/** Why a text cannot go to this customer. */
export const NO_PHONE = 'Not sent by text: no phone number';

/** The sends of one message to a customer (none, with `refused` saying why). */
export function plannedSends(
  customer: { email: string | null; phone: string | null; contactBy: ContactPreference },
  textsReady: boolean,
): { sends: PlannedSend[]; refused: string | null } {
  const email = customer.email?.trim() || null;
  const phone = customer.phone?.trim() || null;
  const wantsEmail = customer.contactBy !== 'text';
  const wantsText = customer.contactBy !== 'email';
  const textWhyNot = !wantsText ? null : !textsReady ? TEXTS_NOT_SET_UP : !phone ? NO_PHONE : null;
  const sends: PlannedSend[] = [];
  if (wantsText && !textWhyNot) sends.push({ channel: 'sms', to: phone!, note: null });
  if (email && (wantsEmail || textWhyNot)) {
    const note = textWhyNot ? (wantsEmail ? `${textWhyNot}.` : `${textWhyNot}: sent by e-mail instead.`) : null;
    sends.push({ channel: 'email', to: email, note });
  }
  if (sends.length > 0) return { sends, refused: null };
  if (!wantsText) return { sends, refused: 'The customer has no e-mail address: add one, or call them.' };
  return { sends, refused: `${textWhyNot}, and the customer has no e-mail address: add one, or call them.` };
}
