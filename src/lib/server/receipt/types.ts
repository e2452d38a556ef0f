// What a payment receipt shows: plain data, so the receipt renders without a database.
import type { Currency } from '@/lib/pricing/money';

/** One money movement on a receipt: a payment or a refund, already in words. */
export interface ReceiptEntry {
  how: string;
  at: string;
  amountMinor: number;
}

/** A receipt for one payment on a ticket, with the ticket's account as it stood when printed. */
export interface ReceiptData {
  shopName: string;
  location: string;
  hours: string;
  ticketNumber: string;
  customerName: string | null;
  printedAt: string;
  /** the payment this receipt is for */
  payment: ReceiptEntry & { takenBy: string | null };
  /** live lines only: voided lines are not counted and not shown */
  lines: { label: string; amountMinor: number }[];
  currency: Currency;
  total: number;
  payments: ReceiptEntry[];
  refunds: ReceiptEntry[];
  paid: number;
  refunded: number;
  due: number;
  credit: number;
}
