// Money for a ticket: the counter's summary, deposits and balances taken at the counter, online
// payment links through the payment service, its webhook, and handing the trousers over.
import { and, asc, desc, eq, inArray, isNotNull } from 'drizzle-orm';
import type Stripe from 'stripe';
import type { z } from 'zod';
import { db, type Db } from '@/db';
import { customers, garments, paymentEvents, paymentLinks, payments, tickets, type Payment, type PaymentLink, type PriceLine, type Ticket } from '@/db/schema';
import type { Actor } from '@/lib/api';
import type { paymentInput } from '@/lib/counter-request';
import { paymentClient, verifyWebhook, webhookSecret } from '@/lib/payment-service';
import type { ClaimSlipData } from '@/lib/claim-slip/types';
import type { Currency } from '@/lib/pricing/money';
import { balanceOf } from '@/lib/pricing/price-lines';
import { audit } from './audit';
import { ServiceError } from './errors';
import { lockTicket, withTicketLock } from './garments';
import { expireOpenLinks, paymentServiceFailure } from './payment-links';
import { counterSettingsOf, linesOf, shopTicket, type CounterView } from './prices';

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

function isUniqueViolation(e: unknown): boolean {
  for (let err = e as { code?: string; cause?: unknown } | undefined; err; err = err.cause as typeof err) {
    if (err.code === '23505') return true;
  }
  return false;
}

/** Takes a deposit (at most the total) or the exact balance due, in cash or by card at the counter. */
export async function takePayment(actor: Actor, ticketId: string, input: z.infer<typeof paymentInput>): Promise<CounterSummary> {
  const settings = await counterSettingsOf(actor.shopId);
  try {
    await withTicketLock(actor.shopId, ticketId, async (tx, ticket) => {
      const before = await summaryOf(ticket, settings, tx);
      if (before.ticket.status === 'collected') throw new ServiceError(422, 'This ticket is already collected.');
      if (before.payments.some((p) => p.purpose === 'balance')) throw new ServiceError(409, 'The balance of this ticket is already paid.');
      if (input.purpose === 'deposit') {
        if (before.payments.some((p) => p.purpose === 'deposit')) throw new ServiceError(409, 'A deposit is already on record for this ticket.');
        if (input.amountMinor > before.total) throw new ServiceError(422, 'A deposit cannot be more than the ticket total.');
      } else if (before.due === 0) {
        throw new ServiceError(422, 'Nothing is due on this ticket.');
      } else if (input.amountMinor !== before.due) {
        throw new ServiceError(422, 'Take exactly the balance due (give change from cash).');
      }
      await tx.insert(payments).values({ ...input, shopId: actor.shopId, ticketId, currency: before.currency, takenById: actor.userId });
      // An open link asks for the old balance: paid at the counter, the customer must not pay it
      // again online; after a deposit, its amount is more than is now due.
      await expireOpenLinks(tx, ticketId);
    });
  } catch (e) {
    if (isUniqueViolation(e)) throw new ServiceError(409, `A ${input.purpose} is already on record for this ticket.`);
    throw e;
  }
  await audit(actor.shopId, actor.userId, `payment.${input.purpose}`, ticketId, { method: input.method, amountMinor: input.amountMinor });
  return counterSummary(actor, ticketId);
}

/** A payment link for the balance due; an open link for the same amount is reused, also by a
 * second click arriving while the first is still being made (both run under the ticket's lock). */
export async function createPaymentLink(actor: Actor, ticketId: string, appOrigin: string): Promise<CounterSummary> {
  const client = paymentClient();
  if (!client) throw new ServiceError(422, 'Online payment is not set up on this server (PAYMENTS_API_KEY).');
  const settings = await counterSettingsOf(actor.shopId);
  const made = await withTicketLock(actor.shopId, ticketId, async (tx, ticket) => {
    const before = await summaryOf(ticket, settings, tx);
    if (before.ticket.status === 'collected') throw new ServiceError(422, 'This ticket is already collected.');
    if (before.due === 0) throw new ServiceError(422, 'Nothing is due on this ticket.');
    if (before.link?.status === 'open' && before.link.amountMinor === before.due) return null;
    await expireOpenLinks(tx, ticketId);
    let session: Stripe.Checkout.Session;
    try {
      session = await client.checkout.sessions.create({
        mode: 'payment',
        line_items: [
          {
            quantity: 1,
            price_data: { currency: before.currency.toLowerCase(), unit_amount: before.due, product_data: { name: `${actor.shopName}: ticket T-${before.ticket.number}, balance` } },
          },
        ],
        client_reference_id: ticketId,
        metadata: { ticketId, shopId: actor.shopId },
        success_url: `${appOrigin}/paid`,
        cancel_url: `${appOrigin}/paid?cancelled=1`,
      });
    } catch (e) {
      throw paymentServiceFailure(e, 'make a pay link');
    }
    if (!session.url) throw new ServiceError(502, 'The payment service gave no link: try again in a moment.');
    await tx.insert(paymentLinks).values({ shopId: actor.shopId, ticketId, sessionId: session.id, url: session.url, amountMinor: before.due, currency: before.currency, createdById: actor.userId });
    return before.due;
  });
  if (made !== null) await audit(actor.shopId, actor.userId, 'payment.link', ticketId, { amountMinor: made });
  return counterSummary(actor, ticketId);
}

/** The outcome of a webhook call: its HTTP status and a short message. */
export interface WebhookOutcome {
  status: 200 | 400 | 409;
  message: string;
}

/** Verifies and applies a payment-service webhook; a forged, stale or replayed one changes nothing. */
export async function receiveWebhook(payload: string, signature: string | null): Promise<WebhookOutcome> {
  const secret = webhookSecret();
  if (!secret) return { status: 400, message: 'Webhooks are not set up on this server.' };
  if (!signature) return { status: 400, message: 'Missing signature.' };
  let event: Stripe.Event;
  try {
    event = verifyWebhook(payload, signature, secret);
  } catch {
    return { status: 400, message: 'Signature does not verify.' };
  }
  try {
    return await db.transaction(async (tx) => {
      const [fresh] = await tx.insert(paymentEvents).values({ id: event.id, type: event.type }).onConflictDoNothing().returning();
      if (!fresh) return { status: 409 as const, message: 'Event already processed.' };
      if (event.type !== 'checkout.session.completed') return { status: 200 as const, message: 'Ignored.' };
      const session = event.data.object;
      if (session.payment_status !== 'paid') return { status: 200 as const, message: 'Not paid yet.' };
      const [known] = await tx.select().from(paymentLinks).where(eq(paymentLinks.sessionId, session.id));
      if (!known) return { status: 200 as const, message: 'Unknown session.' };
      // Under the ticket's lock, like every other write to its money; the link is read again
      // inside it, as a price change may have just expired it.
      await lockTicket(tx, known.shopId, known.ticketId);
      const [link] = await tx.select().from(paymentLinks).where(eq(paymentLinks.id, known.id));
      if (!link) return { status: 200 as const, message: 'Unknown session.' };
      if (link.status !== 'open') throw new WebhookRefusal('This payment link is no longer open.');
      const [existing] = await tx.select({ id: payments.id }).from(payments).where(and(eq(payments.ticketId, link.ticketId), eq(payments.purpose, 'balance')));
      if (existing) throw new WebhookRefusal('The balance of this ticket is already paid.');
      await tx.insert(payments).values({
        shopId: link.shopId,
        ticketId: link.ticketId,
        purpose: 'balance',
        method: 'online',
        amountMinor: session.amount_total ?? link.amountMinor,
        currency: link.currency,
        reference: session.id,
      });
      await tx.update(paymentLinks).set({ status: 'paid' }).where(eq(paymentLinks.id, link.id));
      return { status: 200 as const, message: 'Payment recorded.' };
    });
  } catch (e) {
    if (e instanceof WebhookRefusal) return { status: 409, message: e.message };
    if (isUniqueViolation(e)) return { status: 409, message: 'Already recorded.' };
    throw e;
  }
}

class WebhookRefusal extends Error {}

/** The refusal when the ticket cannot be handed over (not ready, or money due), else null. */
function handOverRefusal(summary: CounterSummary): ServiceError | null {
  if (summary.ticket.status !== 'ready') return new ServiceError(422, `Only a ready ticket can be handed over (this one is ${summary.ticket.status}).`);
  if (summary.due > 0) return new ServiceError(422, 'Take the balance before handing the trousers over.');
  return null;
}

/** Throws 422 unless the ticket is ready and nothing is due: the check any path to "collected"
 * needs, made inside the ticket's lock (`withTicketLock`, its transaction and locked row) so it
 * still holds when the move commits. */
export async function assertReadyToHandOver(tx: Db, ticket: Ticket): Promise<CounterSummary> {
  const summary = await summaryOf(ticket, await counterSettingsOf(ticket.shopId, tx), tx);
  const refusal = handOverRefusal(summary);
  if (refusal) throw refusal;
  return summary;
}

/** Hands a ready, fully paid ticket over: every garment and the ticket become collected. */
export async function pickUp(actor: Actor, ticketId: string): Promise<CounterSummary> {
  // Checked and written under the ticket's lock: a price line or payment arriving meanwhile waits,
  // and one that came first is in the balance checked here.
  const before = await withTicketLock(actor.shopId, ticketId, async (tx, ticket) => {
    const summary = await assertReadyToHandOver(tx, ticket);
    await tx.update(tickets).set({ status: 'collected', updatedAt: new Date() }).where(and(eq(tickets.id, ticketId), eq(tickets.shopId, actor.shopId)));
    await tx.update(garments).set({ status: 'collected', updatedAt: new Date() }).where(and(eq(garments.ticketId, ticketId), eq(garments.shopId, actor.shopId), inArray(garments.status, ['ready'])));
    return summary;
  });
  await audit(actor.shopId, actor.userId, 'ticket.collected', ticketId, { paid: before.paid });
  return counterSummary(actor, ticketId);
}

/** The claim slip's data for a ticket of the actor's shop. */
export async function claimSlipData(actor: Actor, ticketId: string): Promise<ClaimSlipData> {
  const ticket = await shopTicket(actor, ticketId);
  const settings = await counterSettingsOf(actor.shopId);
  const summary = await summaryOf(ticket, settings);
  const items = await db.select({ description: garments.description, kind: garments.kind }).from(garments).where(and(eq(garments.ticketId, ticketId), eq(garments.shopId, actor.shopId))).orderBy(asc(garments.position));
  return {
    shopName: actor.shopName,
    location: settings.location,
    hours: settings.hours,
    ticketNumber: summary.ticket.number,
    customerName: summary.ticket.customerName,
    receivedOn: ticket.createdAt.toISOString().slice(0, 10),
    dueOn: ticket.dueOn,
    garments: items.map((g) => g.description?.trim() || g.kind),
    lines: summary.lines.map((l) => ({ label: l.reason ? `${l.label} (${l.reason})` : l.label, amountMinor: l.amountMinor })),
    currency: summary.currency,
    total: summary.total,
    paid: summary.paid,
    due: summary.due,
  };
}
