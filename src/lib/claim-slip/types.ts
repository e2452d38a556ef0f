// What a claim slip shows: plain data, so the slip renders without a database.
import type { Currency } from '@/lib/pricing/money';

/** One claim slip: the customer's receipt for the trousers left at the counter. */
export interface ClaimSlipData {
  shopName: string;
  location: string;
  hours: string;
  ticketNumber: number;
  customerName: string | null;
  receivedOn: string;
  dueOn: string | null;
  garments: string[];
  lines: { label: string; amountMinor: number }[];
  currency: Currency;
  total: number;
  paid: number;
  due: number;
}
