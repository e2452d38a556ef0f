// What the counter shows of a ticket's money: its lines, payments, balance and latest pay link,
// read under the ticket's lock when the caller holds it.
import { and, asc, desc, eq, isNotNull } from 'drizzle-orm';
import { db, type Db } from '@/db';
import { customers, paymentLinks, payments, type Payment, type PaymentLink, type PriceLine, type Ticket } from '@/db/schema';
import type { Actor } from '@/lib/api';
import type { Currency } from '@/lib/pricing/money';
import { balanceOf } from '@/lib/pricing/price-lines';
import { shopTicket } from '../ticket-core';
import { counterSettingsOf, linesOf, type CounterView } from './prices';

/** Everything the counter panel shows about a ticket's money. */
export interface CounterSummary {
  ticket: { id: string; number: number; status: string; dueOn: string | null; customerName: string | null; customerEmail: string | null };
  currency: Currency;
  lines: PriceLine[];
  total: number;
  paid: number;
  due: number;
  payments: Payment[];
  link: { url: string; amountMinor: number; status: PaymentLink['status'] } | null;
}

/** The ticket's lines, payments, balance and open payment link. */
export async function counterSummary(actor: Pick<Actor, 'shopId'>, ticketId: string): Promise<CounterSummary> {
  const ticket = await shopTicket(actor, ticketId);
  return summaryOf(ticket, await counterSettingsOf(actor.shopId));
}

/** The summary of a ticket already read for the shop, with the shop's settings already read
 * (through `q`: the transaction holding the ticket's lock, when there is one). */
export async function summaryOf(ticket: Ticket, { currency }: Pick<CounterView, 'currency'>, q: Db = db): Promise<CounterSummary> {
  const { shopId, id: ticketId } = ticket;
  const [customer] = ticket.customerId ? await q.select().from(customers).where(eq(customers.id, ticket.customerId)) : [];
  const lines = await linesOf(shopId, ticketId, q);
  const paidRows = await q.select().from(payments).where(and(eq(payments.shopId, shopId), eq(payments.ticketId, ticketId))).orderBy(asc(payments.at));
  // The latest link the service has made (one still being asked for has no address yet).
  const [link] = await q
    .select()
    .from(paymentLinks)
    .where(and(eq(paymentLinks.shopId, shopId), eq(paymentLinks.ticketId, ticketId), isNotNull(paymentLinks.url)))
    .orderBy(desc(paymentLinks.createdAt))
    .limit(1);
  return {
    ticket: { id: ticket.id, number: ticket.number, status: ticket.status, dueOn: ticket.dueOn, customerName: customer?.name ?? null, customerEmail: customer?.email ?? null },
    currency,
    lines,
    ...balanceOf(lines, paidRows),
    payments: paidRows,
    link: link?.url ? { url: link.url, amountMinor: link.amountMinor, status: link.status } : null,
  };
}

