// What the counter's routes answer. The services build these shapes (with Date values); islands
// read them through JSON, as `AsJson<…>` (dates as strings). Here, beside the counter's request
// schemas, so islands need no import from services or the database (DEVELOPERS.md "Layers").
import type { ContactPreference } from './contact-channels';
import type { Notice, Payment, PaymentLink, PriceLine, Refund } from '@/db/schema';
import type { AsJson } from './as-json';
import type { Currency } from '../pricing/money';
import type { PRICE_KEYS } from '../pricing/price-keys';
import type { Balance } from '../pricing/price-lines';

/** The shop's counter settings as the counter shows them. */
export interface CounterView {
  currency: Currency;
  hours: string;
  location: string;
  autoReadyNotice: boolean;
}

/** A kind of work the lead added to the list (flat price); retired ones are kept, `retiredAt` set. */
export interface PriceKindView {
  id: string;
  name: string;
  amountMinor: number;
  rushApplies: boolean;
  retiredAt: Date | null;
}

/** The price list page's data: settings, one entry per worked-out line, and the lead's kinds of work. */
export interface PriceListView extends CounterView {
  items: { key: (typeof PRICE_KEYS)[number]; label: string; amountMinor: number }[];
  /** live kinds first, then retired ones, each in the order they were added */
  kinds: PriceKindView[];
}

/** One change to the price list: who, when, which line, and each field's old and new value. */
export interface PriceChange {
  id: string;
  at: string;
  actorName: string | null;
  /** price-kind.added, price-kind.changed or price-item.changed */
  action: string;
  /** the line's name as it was after the change */
  line: string;
  changes: { field: 'name' | 'amountMinor' | 'rushApplies' | 'retired'; from: string | number | boolean | null; to: string | number | boolean | null }[];
}

/** Everything the counter panel shows about a ticket's money. */
export interface CounterSummary extends Balance {
  ticket: {
    id: string;
    number: number;
    status: string;
    dueOn: string | null;
    customerId: string | null;
    customerName: string | null;
    customerEmail: string | null;
    customerPhone: string | null;
    contactBy: ContactPreference;
  };
  /** true when the SMS service is configured (without it, notices go by e-mail); told by the
   * counter screen's own read, GET /api/tickets/[id]/payments, not by every money answer */
  textsReady?: boolean;
  currency: Currency;
  /** every line, voided ones included (`voidedAt`, `voidReason`); the total counts the others */
  lines: PriceLine[];
  payments: (Payment & { takenByName: string | null })[];
  refunds: (Refund & { byName: string | null })[];
  /** credit kept on the customer from earlier tickets (and this one), not yet spent */
  customerCredit: number;
  link: { url: string; amountMinor: number; status: PaymentLink['status'] } | null;
}

/** The counter summary as an island receives it (dates as strings). */
export type CounterSummaryJson = AsJson<CounterSummary>;

/** A notice to the customer as an island receives it (dates as strings). */
export type NoticeJson = AsJson<Notice>;
