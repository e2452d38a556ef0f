// What the counter's routes accept, checked the same way in the islands' forms and on the server.
import { z } from 'zod';
import { text } from './text';
import { CURRENCIES } from '../pricing/money';
import { PRICE_KEYS } from '../pricing/price-keys';

// Amounts are integer minor units; a million in any currency is no trouser alteration.
const MAX_MINOR = 100_000_000;
const amount = (what: string) =>
  z
    .number({ error: `Enter the ${what}.` })
    .int(`${what[0]!.toUpperCase()}${what.slice(1)} must be whole minor units (cents, pence).`)
    .min(0, `The ${what} cannot be below zero.`)
    .max(MAX_MINOR, `The ${what} is far too large.`);

/** One priced piece of work as the lead sets it. */
export const priceItemInput = z.object({
  key: z.enum(PRICE_KEYS),
  label: text().trim().min(1, 'Name the line.').max(80, 'Keep the name under 80 characters.'),
  amountMinor: amount('price'),
});

/** The lead's price list page: currency, hours, automatic ready notice and every line. */
export const priceListInput = z.object({
  currency: z.enum(Object.keys(CURRENCIES) as [keyof typeof CURRENCIES, ...(keyof typeof CURRENCIES)[]], { error: 'Choose a currency from the list.' }),
  hours: text().trim().max(300, 'Keep the hours under 300 characters.'),
  location: text().trim().max(120, 'Keep the address under 120 characters.'),
  autoReadyNotice: z.boolean(),
  // A list sent before a line was added (a client written for fewer lines) keeps the lines it leaves out.
  items: z.array(priceItemInput).min(1, 'Send at least one line of the list.').max(PRICE_KEYS.length, 'Send each line of the list once.'),
});

const kindName = text().trim().min(1, 'Name the kind of work, e.g. "Replace zip".').max(80, 'Keep the name under 80 characters.');

/** A kind of work the lead adds to the price list: a flat price, and whether rush applies to it. */
export const priceKindInput = z.object({
  name: kindName,
  amountMinor: amount('price'),
  rushApplies: z.boolean({ error: 'Say whether rush applies (true or false).' }),
});

/** A change to a kind of work: rename, re-price, rush or not, retire (or bring back). Old tickets keep their lines. */
export const priceKindPatch = z
  .object({
    name: kindName.optional(),
    amountMinor: amount('price').optional(),
    rushApplies: z.boolean({ error: 'Say whether rush applies (true or false).' }).optional(),
    retired: z.boolean({ error: 'Say whether the kind is retired (true or false).' }).optional(),
  })
  .refine((p) => Object.values(p).some((v) => v !== undefined), 'Change at least one thing.');

/** Lines worked out from the garments' finishes and plans, with or without rush. */
export const autoLinesInput = z.object({ rush: z.boolean() });

/** A line added at the counter: from the list, or an adjustment with its reason. */
export const lineInput = z.discriminatedUnion('source', [
  z.object({ source: z.literal('list'), key: z.enum(PRICE_KEYS, { error: 'Choose a line from the price list.' }) }),
  // One of the lead's kinds of work; kept on the ticket as a line from the list.
  z.object({ source: z.literal('kind'), kindId: z.uuid('Choose a kind of work from the price list.') }),
  z.object({
    source: z.literal('adjust'),
    label: text().trim().min(1, 'Say what the adjustment is for.').max(80, 'Keep it under 80 characters.'),
    amountMinor: z
      .number({ error: 'Enter the amount.' })
      .int('Whole minor units only.')
      .min(-MAX_MINOR)
      .max(MAX_MINOR)
      .refine((n) => n !== 0, 'An adjustment of nothing changes nothing.'),
    reason: text().trim().min(3, 'Give the reason for the adjustment.').max(300, 'Keep the reason under 300 characters.'),
  }),
  z.object({
    source: z.literal('no-charge'),
    reason: text().trim().min(3, 'Say why this work is handed over with no charge.').max(300, 'Keep the reason under 300 characters.'),
  }),
]);

/** Voiding a wrong price line: it stays on the ticket, struck through, with this reason. */
export const voidLineInput = z.object({
  reason: text().trim().min(3, 'Give the reason the line is wrong.').max(300, 'Keep the reason under 300 characters.'),
});

/** A payment taken at the counter, any amount up to what is due: in cash, by card, or from the
 * credit kept on the customer. Deposit or balance is worked out from what it leaves due. */
export const paymentInput = z.object({
  method: z.enum(['cash', 'card', 'credit'], { error: 'Choose cash, card or kept credit.' }),
  amountMinor: amount('amount').refine((n) => n > 0, 'Enter an amount above zero.'),
});

/** Settling a credit owed to the customer: cash back, a refund on the counter's card terminal, a
 * refund of an online payment through the payment service, or kept as credit on the customer. */
export const refundInput = z.object({
  method: z.enum(['cash', 'card', 'online', 'credit'], { error: 'Choose how the credit is settled.' }),
  amountMinor: amount('amount').refine((n) => n > 0, 'Enter an amount above zero.'),
  reason: text().trim().max(300, 'Keep the note under 300 characters.').optional(),
});

/** A notice the counter sends by hand: the ready notice, or the open pay link by e-mail or text. */
export const noticeInput = z.discriminatedUnion(
  'kind',
  [
    z.object({
      kind: z.literal('ready'),
      /** true: send it again after it has gone (a new, numbered notice) */
      again: z.boolean({ error: 'Say whether to send it again (true or false).' }).optional(),
    }),
    z.object({
      kind: z.literal('pay-link'),
      channel: z.enum(['email', 'sms'], { error: 'Send the pay link by e-mail or by text (email or sms).' }),
    }),
  ],
  { error: 'Send the ready notice (kind "ready") or the pay link (kind "pay-link").' },
);

/** The claim slip's copies: 1–3 slips and 0–3 tear-off tags per garment (query ?slips=&tags=). */
export const slipCopiesQuery = z.object({
  slips: z.coerce.number().int('Print a whole number of slips.').min(1, 'Print at least one slip.').max(3, 'Print at most 3 slips.').default(1),
  tags: z.coerce.number().int('Print a whole number of tags.').min(0, 'Tags cannot be fewer than none.').max(3, 'Print at most 3 tags per garment.').default(1),
});
