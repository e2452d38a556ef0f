// What a claim slip shows: plain data, so the slip renders without a database.
import type { Currency } from '@/lib/pricing/money';

/** One claim slip: the customer's receipt for the trousers left at the counter. */
export interface ClaimSlipData {
  shopName: string;
  location: string;
  hours: string;
  ticketNumber: number;
  customerName: string | null;
  /** YYYY-MM-DD, printed in the shop's date style ("Tue 1 Dec") */
  receivedOn: string;
  /** YYYY-MM-DD, printed in the shop's date style; null when no date is set */
  dueOn: string | null;
  garments: string[];
  lines: { label: string; amountMinor: number }[];
  currency: Currency;
  total: number;
  paid: number;
  due: number;
}

/** How many of each to print: slips (1–3) and tear-off tags per garment (0–3). */
export interface SlipCopies {
  slips: number;
  tags: number;
}

/** One slip and one tag per garment, unless the counter asks for more. */
export const DEFAULT_COPIES: SlipCopies = { slips: 1, tags: 1 };
