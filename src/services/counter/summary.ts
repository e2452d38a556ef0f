// What the counter shows of a ticket's money: its lines (voided ones too, struck through), the
// payments and refunds with who took them, the balance or the credit owed, and the latest pay
// link; read under the ticket's lock when the caller holds it.
import { and, asc, desc, eq, inArray, isNotNull, sql } from 'drizzle-orm';
import { db, type Db } from '@/db';
import { COUNTED_REFUND_STATUSES, customers, paymentLinks, payments, refunds, tickets, user, type Ticket } from '@/db/schema';
import type { Actor } from '@/lib/server/api';
import { balanceOf } from '@/lib/pricing/price-lines';
import { shopTicket } from '../ticket-core';
import { counterSettingsOf, linesOf, type CounterView } from './prices';
import type { CounterSummary } from '@/lib/shared/counter-views';

// The shape lives in lib (islands read it too); exported here for the services' importers.
export type { CounterSummary };

/** The ticket's lines, payments, balance and open payment link. */
export async function counterSummary(actor: Pick<Actor, 'shopId'>, ticketId: string): Promise<CounterSummary> {
  const ticket = await shopTicket(actor, ticketId);
  return summaryOf(ticket, await counterSettingsOf(actor.shopId));
}

/** The credit kept on a customer of the shop: kept-as-credit refunds less payments made from it. */
export async function customerCreditOf(shopId: string, customerId: string | null, q: Db = db): Promise<number> {
  if (!customerId) return 0;
  const [kept] = await q
    .select({ n: sql<number>`coalesce(sum(${refunds.amountMinor}), 0)::int` })
    .from(refunds)
    .where(
      and(eq(refunds.shopId, shopId), eq(refunds.customerId, customerId), eq(refunds.method, 'credit'), inArray(refunds.status, [...COUNTED_REFUND_STATUSES])),
    );
  const [spent] = await q
    .select({ n: sql<number>`coalesce(sum(${payments.amountMinor}), 0)::int` })
    .from(payments)
    .innerJoin(tickets, eq(tickets.id, payments.ticketId))
    .where(and(eq(payments.shopId, shopId), eq(payments.method, 'credit'), eq(tickets.customerId, customerId)));
  return Number(kept?.n ?? 0) - Number(spent?.n ?? 0);
}

/** The summary of a ticket already read for the shop, with the shop's settings already read
 * (through `q`: the transaction holding the ticket's lock, when there is one). */
export async function summaryOf(ticket: Ticket, { currency }: Pick<CounterView, 'currency'>, q: Db = db): Promise<CounterSummary> {
  const { shopId, id: ticketId } = ticket;
  const [customer] = ticket.customerId ? await q.select().from(customers).where(eq(customers.id, ticket.customerId)) : [];
  const lines = await linesOf(shopId, ticketId, q);
  const paidRows = await q
    .select({ p: payments, takenByName: user.name })
    .from(payments)
    .leftJoin(user, eq(user.id, payments.takenById))
    .where(and(eq(payments.shopId, shopId), eq(payments.ticketId, ticketId)))
    .orderBy(asc(payments.at), asc(payments.id));
  const refundRows = await q
    .select({ r: refunds, byName: user.name })
    .from(refunds)
    .leftJoin(user, eq(user.id, refunds.byId))
    .where(and(eq(refunds.shopId, shopId), eq(refunds.ticketId, ticketId)))
    .orderBy(asc(refunds.at), asc(refunds.id));
  // The latest link the service has made (one still being asked for has no address yet).
  const [link] = await q
    .select()
    .from(paymentLinks)
    .where(and(eq(paymentLinks.shopId, shopId), eq(paymentLinks.ticketId, ticketId), isNotNull(paymentLinks.url)))
    .orderBy(desc(paymentLinks.createdAt))
    .limit(1);
  const paid = paidRows.map((r) => ({ ...r.p, takenByName: r.takenByName }));
  const given = refundRows.map((r) => ({ ...r.r, byName: r.byName }));
  return {
    ticket: {
      id: ticket.id,
      number: ticket.number,
      status: ticket.status,
      dueOn: ticket.dueOn,
      customerId: ticket.customerId,
      customerName: customer?.name ?? null,
      customerEmail: customer?.email ?? null,
      customerPhone: customer?.phone ?? null,
      contactBy: customer?.contactBy ?? 'email',
    },
    currency,
    lines,
    ...balanceOf(lines, paid, given),
    payments: paid,
    refunds: given,
    customerCredit: await customerCreditOf(shopId, ticket.customerId, q),
    link: link?.url ? { url: link.url, amountMinor: link.amountMinor, status: link.status } : null,
  };
}
