// Settling a credit owed to the customer (money paid beyond the ticket's total): cash back, a
// refund on the counter's card terminal, kept as credit on the customer, or a refund of an online
// payment through the payment service. The service is called with no transaction open, between two
// short ones under the ticket's lock (like pay links): the refund is recorded `pending` first, so
// the credit cannot be given back twice meanwhile, then what the service answered is written; its
// signed webhook (`refund.updated`) confirms a refund still pending, or fails it (the credit returns).
import { and, eq, inArray, isNull } from 'drizzle-orm';
import type Stripe from 'stripe';
import type { z } from 'zod';
import type { Db } from '@/db';
import { COUNTED_REFUND_STATUSES, payments, refunds, type Payment, type Refund } from '@/db/schema';
import type { Actor } from '@/lib/server/api';
import type { refundInput } from '@/lib/shared/counter-request';
import { paymentClient, paymentsConfigured } from '@/lib/server/payment-service';
import { formatMoney } from '@/lib/pricing/money';
import { sumMinor } from '@/lib/pricing/price-lines';
import { audit } from '../audit';
import { ServiceError } from '../errors';
import { isUuid, lockTicket, withTicketLock } from '../ticket-core';
import { paymentServiceFailure } from './payment-links';
import { counterSettingsOf } from './prices';
import { counterSummary, summaryOf, type CounterSummary } from './summary';

type RefundRequest = z.infer<typeof refundInput>;

/** The idempotency key a refund is asked for under, so asking again never refunds twice. */
export function refundKey(refundId: string): string {
  return `refund-${refundId}`;
}

/** What is left to refund of each online payment of the ticket, newest first. */
async function refundable(tx: Db, shopId: string, ticketId: string): Promise<{ payment: Payment; left: number }[]> {
  const online = await tx
    .select()
    .from(payments)
    .where(and(eq(payments.shopId, shopId), eq(payments.ticketId, ticketId), eq(payments.method, 'online')));
  const given = await tx
    .select()
    .from(refunds)
    .where(and(eq(refunds.ticketId, ticketId), eq(refunds.method, 'online'), inArray(refunds.status, [...COUNTED_REFUND_STATUSES])));
  return online
    .map((payment) => ({ payment, left: payment.amountMinor - sumMinor(given.filter((r) => r.paymentId === payment.id)) }))
    .filter((p) => p.left > 0 && p.payment.reference)
    .sort((x, y) => y.payment.at.getTime() - x.payment.at.getTime());
}

/** Records (under the ticket's lock) a refund of at most the ticket's credit; an online one is
 * `pending` against an online payment with enough left to refund. */
async function recordRefund(actor: Actor, ticketId: string, input: RefundRequest): Promise<{ refund: Refund; payment: Payment | null }> {
  const settings = await counterSettingsOf(actor.shopId);
  return withTicketLock(actor.shopId, ticketId, async (tx, ticket) => {
    const before = await summaryOf(ticket, settings, tx);
    if (before.credit === 0) throw new ServiceError(422, 'Nothing is owed back to the customer on this ticket.');
    if (input.amountMinor > before.credit) throw new ServiceError(422, `Give back at most the credit owed (${formatMoney(before.credit, before.currency)}).`);
    if (input.method === 'credit' && !ticket.customerId)
      throw new ServiceError(422, 'This ticket has no customer to keep the credit for: give it back instead.');
    let payment: Payment | null = null;
    if (input.method === 'online') {
      payment = (await refundable(tx, actor.shopId, ticketId)).find((p) => p.left >= input.amountMinor)?.payment ?? null;
      if (!payment) throw new ServiceError(422, 'No online payment on this ticket has that much left to refund: give it back in cash or keep it as credit.');
      if (!paymentsConfigured()) throw new ServiceError(422, 'Online payment is not set up on this server (PAYMENTS_API_KEY).');
    }
    const [refund] = await tx
      .insert(refunds)
      .values({
        shopId: actor.shopId,
        ticketId,
        customerId: input.method === 'credit' ? ticket.customerId : null,
        method: input.method,
        status: input.method === 'online' ? 'pending' : 'done',
        amountMinor: input.amountMinor,
        currency: before.currency,
        paymentId: payment?.id ?? null,
        reason: input.reason || null,
        byId: actor.userId,
      })
      .returning();
    await audit(tx, actor.shopId, actor.userId, `refund.${input.method}`, ticketId, {
      refund: refund!.id,
      amountMinor: input.amountMinor,
      reason: input.reason ?? null,
    });
    return { refund: refund!, payment };
  });
}

/** Settles some or all of the credit owed on a ticket, as the counter chose; answers the summary. */
export async function settleCredit(actor: Actor, ticketId: string, input: RefundRequest): Promise<CounterSummary> {
  const { refund, payment } = await recordRefund(actor, ticketId, input);
  if (refund.method === 'online') await refundAtService(actor, refund, payment!);
  return counterSummary(actor, ticketId);
}

/** Asks the service for the refund (no transaction open), then writes what it answered. */
async function refundAtService(actor: Actor, refund: Refund, payment: Payment): Promise<void> {
  const client = (await paymentClient())!;
  let answer: Stripe.Refund;
  try {
    const session = await client.checkout.sessions.retrieve(payment.reference!);
    const intent = typeof session.payment_intent === 'string' ? session.payment_intent : session.payment_intent?.id;
    if (!intent) throw new ServiceError(502, 'The payment service shows no payment to refund for this online payment.');
    answer = await client.refunds.create(
      { payment_intent: intent, amount: refund.amountMinor, metadata: { refundId: refund.id, ticketId: refund.ticketId, shopId: refund.shopId } },
      { idempotencyKey: refundKey(refund.id) },
    );
  } catch (e) {
    // Refused or unreached: recorded as failed, so the credit is owed again. Should the service
    // have made it after all, its webhook (matched by the refund's id in its metadata) marks it done.
    const failure = paymentServiceFailure(e, 'refund the online payment');
    await withTicketLock(refund.shopId, refund.ticketId, async (tx) => {
      await tx
        .update(refunds)
        .set({ status: 'failed', failure: failure.message })
        .where(and(eq(refunds.id, refund.id), eq(refunds.status, 'pending')));
      await audit(tx, actor.shopId, actor.userId, 'refund.failed', refund.ticketId, { refund: refund.id, failure: failure.message });
    });
    throw failure;
  }
  await withTicketLock(refund.shopId, refund.ticketId, (tx) => writeServiceRefund(tx, refund.id, answer));
}

/** Writes the service's word on a refund: its id, and done or failed once it says so (a webhook
 * may have come first: a refund already done stays done unless the service now says it failed). */
async function writeServiceRefund(tx: Db, refundId: string, answer: Pick<Stripe.Refund, 'id' | 'status' | 'failure_reason'>): Promise<Refund | null> {
  await tx
    .update(refunds)
    .set({ reference: answer.id })
    .where(and(eq(refunds.id, refundId), isNull(refunds.reference)));
  const status = answer.status === 'succeeded' ? 'done' : answer.status === 'failed' || answer.status === 'canceled' ? 'failed' : null;
  if (!status) {
    const [row] = await tx.select().from(refunds).where(eq(refunds.id, refundId));
    return row ?? null;
  }
  const [row] = await tx
    .update(refunds)
    .set({
      status,
      failure: status === 'failed' ? `The payment service says ${answer.status}${answer.failure_reason ? ` (${answer.failure_reason})` : ''}.` : null,
    })
    .where(eq(refunds.id, refundId))
    .returning();
  return row ?? null;
}

/** Applies a verified `refund.*` webhook event inside its transaction; answers what it did. */
export async function applyRefundEvent(tx: Db, object: Stripe.Refund): Promise<string> {
  const byReference = await tx.select().from(refunds).where(eq(refunds.reference, object.id));
  const ownId = object.metadata?.refundId;
  const byOwnId = byReference.length === 0 && ownId && isUuid(ownId) ? await tx.select().from(refunds).where(eq(refunds.id, ownId)) : [];
  const known = byReference[0] ?? byOwnId[0];
  if (known?.method !== 'online') return 'Unknown refund.';
  // Under the ticket's lock, like every other write to its money.
  await lockTicket(tx, known.shopId, known.ticketId);
  const row = await writeServiceRefund(tx, known.id, object);
  await audit(tx, known.shopId, null, 'refund.confirmed', known.ticketId, { refund: known.id, status: row?.status ?? null });
  return `Refund ${row?.status ?? 'unchanged'}.`;
}
