// What the counter's routes answer (a ticket's money, the price list), as zod schemas of the JSON
// sent (dates as ISO strings); the types they describe are in src/lib/shared/counter-views.ts, and
// route() holds each handler's return type to its schema (DEVELOPERS.md "Adding an API route").
import { z } from 'zod';
import { LINK_STATUSES, paymentJson, refundJson } from '@/db/schema/payments';
import { priceLineJson } from '@/db/schema/prices';
import { CONTACT_PREFERENCES } from '@/lib/shared/contact-channels';
import { GARMENT_STEPS } from '@/lib/shared/garment-steps';
import { PERIODS } from '@/lib/shared/overview/shop-days';
import { CURRENCIES } from '@/lib/pricing/money';
import { PRICE_KEYS } from '@/lib/pricing/price-keys';

const currency = z.enum(Object.keys(CURRENCIES) as [keyof typeof CURRENCIES, ...(keyof typeof CURRENCIES)[]]);
const minor = z.number().int();

/** Everything the counter panel shows about a ticket's money (amounts in minor units). */
export const counterSummaryJson = z.object({
  total: minor,
  paid: minor,
  refunded: minor,
  due: minor,
  credit: minor,
  ticket: z.object({
    id: z.string(),
    number: z.number().int(),
    status: z.string(),
    dueOn: z.string().nullable(),
    customerId: z.string().nullable(),
    customerName: z.string().nullable(),
    customerEmail: z.string().nullable(),
    customerPhone: z.string().nullable(),
    contactBy: z.enum(CONTACT_PREFERENCES),
  }),
  textsReady: z.boolean().optional(),
  currency,
  lines: z.array(priceLineJson),
  payments: z.array(paymentJson.extend({ takenByName: z.string().nullable() })),
  refunds: z.array(refundJson.extend({ byName: z.string().nullable() })),
  customerCredit: minor,
  link: z.object({ url: z.string(), amountMinor: minor, status: z.enum(LINK_STATUSES) }).nullable(),
});

/** A kind of work the lead added to the list (flat price); a retired one has `retiredAt`. */
export const priceKindJson = z.object({
  id: z.string(),
  name: z.string(),
  amountMinor: minor,
  rushApplies: z.boolean(),
  retiredAt: z.iso.datetime().nullable(),
});

/** The price list: the counter's settings, one entry per worked-out line, and the lead's kinds of work. */
export const priceListJson = z.object({
  currency,
  hours: z.string(),
  location: z.string(),
  autoReadyNotice: z.boolean(),
  items: z.array(z.object({ key: z.enum(PRICE_KEYS), label: z.string(), amountMinor: minor })),
  kinds: z.array(priceKindJson),
});

const fieldValue = z.union([z.string(), z.number(), z.boolean()]).nullable();

/** One change to the price list: who, when, which line, each field's old and new value. */
export const priceChangeJson = z.object({
  id: z.string(),
  at: z.string(),
  actorName: z.string().nullable(),
  action: z.string(),
  line: z.string(),
  changes: z.array(z.object({ field: z.enum(['name', 'amountMinor', 'rushApplies', 'retired']), from: fieldValue, to: fieldValue })),
});

/** Where an e-mailed receipt went. */
export const receiptSentJson = z.object({ to: z.string() });

const count = z.number().int();

/** The lead's overview for a period: per day, waiting work, takings, intake to ready. */
export const overviewJson = z.object({
  period: z.enum(PERIODS),
  timeZone: z.string(),
  currency,
  today: z.string(),
  days: z.array(
    z.object({
      day: z.string(),
      takenIn: count,
      handedOver: count,
      dueDone: count,
      dueOpen: count,
      overdue: count,
      takings: z.record(z.string(), minor),
    }),
  ),
  overdueBefore: count,
  overdueNow: count,
  waiting: z.array(z.object({ step: z.enum(GARMENT_STEPS), label: z.string(), garments: count })),
  takings: z.array(z.object({ method: z.string(), amountMinor: minor, payments: count, refundedMinor: minor })),
  intakeToReady: z.object({ garments: count, averageDays: z.number().nullable() }),
});
