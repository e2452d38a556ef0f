// Money taken for a ticket: payments at the counter, online payment links through the payment
// service, its webhook, and the claim slip's figures.
import { randomUUID } from 'node:crypto';
import { and, asc, eq } from 'drizzle-orm';
import type Stripe from 'stripe';
import type { z } from 'zod';
import { db, type Db } from '@/db';
import { customers, garments, paymentEvents, paymentLinks, payments, type PaymentLink, type Ticket } from '@/db/schema';
import { formatMoney, isCurrency } from '@/lib/pricing/money';
import type { Actor } from '@/lib/server/api';
import type { paymentInput } from '@/lib/shared/counter-request';
import { paymentClient, verifyWebhook, webhookSecret } from '@/lib/server/payment-service';
import type { ClaimSlipData } from '@/lib/server/claim-slip/types';
import { dayOf } from '@/lib/shared/overview/shop-days';
import { shopTimeZone } from '../shop-time-zone';
import { audit } from '../audit';
import { ServiceError } from '../errors';
import { lockTicket, shopTicket, withTicketLock } from '../ticket-core';
import {
  closeAtService,
  closeCutShort,
  cutShortLinks,
  liveLinks,
  markExpiring,
  paymentServiceFailure,
  sessionKey,
  STALE_CREATING_SECONDS,
  withLinksClosed,
} from './payment-links';
import { counterSettingsOf, type CounterView } from './prices';
import { applyRefundEvent } from './refunds';
import { counterSummary, customerCreditOf, summaryOf, type CounterSummary } from './summary';
import { ticketLabel } from '@/lib/shared/ticket-number';

export { counterSummary, summaryOf, type CounterSummary };
export { assertReadyToHandOver, pickUp } from './hand-over';

function isUniqueViolation(e: unknown): boolean {
  for (let err = e as { code?: string; cause?: unknown } | undefined; err; err = err.cause as typeof err) {
    if (err.code === '23505') return true;
  }
  return false;
}

/** Locks the ticket's customer (after the ticket: always in that order) and returns their kept
 * credit, so two tickets of one customer cannot spend the same credit at once. */
export async function lockCustomerCredit(tx: Db, ticket: Ticket): Promise<number> {
  if (!ticket.customerId) return 0;
  await tx
    .select({ id: customers.id })
    .from(customers)
    .where(and(eq(customers.id, ticket.customerId), eq(customers.shopId, ticket.shopId)))
    .for('update');
  return customerCreditOf(ticket.shopId, ticket.customerId, tx);
}

/** The refusal of a payment the ticket cannot take now, else the summary it was checked against. */
async function checkPayment(tx: Db, ticket: Ticket, settings: CounterView, input: z.infer<typeof paymentInput>): Promise<CounterSummary> {
  const before = await summaryOf(ticket, settings, tx);
  if (before.ticket.status === 'collected') throw new ServiceError(422, 'This ticket is already collected.');
  if (before.due === 0) throw new ServiceError(422, 'Nothing is due on this ticket.');
  if (input.amountMinor > before.due)
    throw new ServiceError(422, `Take at most what is due (${formatMoney(before.due, before.currency)}); give change from cash.`);
  if (input.method === 'credit') {
    if (!ticket.customerId) throw new ServiceError(422, 'This ticket has no customer, so no credit kept on one.');
    const credit = await lockCustomerCredit(tx, ticket);
    if (input.amountMinor > credit) throw new ServiceError(422, `The customer has ${formatMoney(credit, before.currency)} of credit kept.`);
  }
  return before;
}

/** Takes any amount up to what is due, in cash, by card at the counter or from the customer's kept
 * credit; each payment is kept with who took it, how and when. */
export async function takePayment(actor: Actor, ticketId: string, input: z.infer<typeof paymentInput>): Promise<CounterSummary> {
  const settings = await counterSettingsOf(actor.shopId);
  // An open link asks for the old balance: paid at the counter, the customer must not pay it
  // again online; after a part payment, its amount is more than is now due. It is closed first.
  await withLinksClosed(
    actor.shopId,
    ticketId,
    (tx, ticket) => checkPayment(tx, ticket, settings, input),
    async (tx, ticket) => {
      const before = await checkPayment(tx, ticket, settings, input);
      const purpose = input.amountMinor === before.due ? 'balance' : 'deposit';
      await tx.insert(payments).values({ ...input, purpose, shopId: actor.shopId, ticketId, currency: before.currency, takenById: actor.userId });
      await audit(tx, actor.shopId, actor.userId, `payment.${purpose}`, ticketId, { method: input.method, amountMinor: input.amountMinor });
    },
  );
  return counterSummary(actor, ticketId);
}

/** What making a pay link does next, decided under the ticket's lock. */
type LinkPlan =
  | { kind: 'ready' }
  | { kind: 'wait'; linkId: string }
  | { kind: 'close'; live: PaymentLink[] }
  | { kind: 'make'; link: PaymentLink; request: Stripe.Checkout.SessionCreateParams };

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** Waits (no transaction open) until a link another request is making is made or given up. */
async function whileCreating(shopId: string, linkId: string): Promise<void> {
  for (let waited = 0; waited <= (STALE_CREATING_SECONDS + 1) * 1000; waited += 100) {
    await sleep(100);
    const [row] = await db
      .select({ status: paymentLinks.status })
      .from(paymentLinks)
      .where(and(eq(paymentLinks.id, linkId), eq(paymentLinks.shopId, shopId)));
    if (row?.status !== 'creating') return;
  }
}

/** A payment link for the balance due; an open link for the same amount is reused, also by a
 * second click arriving while the first is still being made (it waits for that one). The service
 * is called with no transaction open (see payment-links.ts); the link is saved only if the
 * balance is still what it asks for, otherwise its session is closed and one is made again. */
export async function createPaymentLink(actor: Actor, ticketId: string, appOrigin: string): Promise<CounterSummary> {
  const client = await paymentClient();
  if (!client) throw new ServiceError(422, 'Online payment is not set up on this server (PAYMENTS_API_KEY).');
  const settings = await counterSettingsOf(actor.shopId);
  for (let round = 0; round < 4; round += 1) {
    const { plan, cutShort } = await withTicketLock(actor.shopId, ticketId, async (tx, ticket): Promise<{ plan: LinkPlan; cutShort: PaymentLink[] }> => {
      const before = await summaryOf(ticket, settings, tx);
      if (before.ticket.status === 'collected') throw new ServiceError(422, 'This ticket is already collected.');
      if (before.due === 0) throw new ServiceError(422, 'Nothing is due on this ticket.');
      const cutShort = await cutShortLinks(tx, actor.shopId, ticketId);
      const creating = await tx
        .select()
        .from(paymentLinks)
        .where(and(eq(paymentLinks.shopId, actor.shopId), eq(paymentLinks.ticketId, ticketId), eq(paymentLinks.status, 'creating')));
      const making = creating.find((l) => !cutShort.some((c) => c.id === l.id));
      const live = await liveLinks(tx, actor.shopId, ticketId);
      if (live.some((l) => l.status === 'open' && l.amountMinor === before.due)) return { plan: { kind: 'ready' }, cutShort };
      if (making) return { plan: { kind: 'wait', linkId: making.id }, cutShort };
      if (live.length > 0) {
        await markExpiring(tx, live);
        return { plan: { kind: 'close', live }, cutShort };
      }
      const id = randomUUID();
      const request: Stripe.Checkout.SessionCreateParams = {
        mode: 'payment',
        line_items: [
          {
            quantity: 1,
            price_data: {
              currency: before.currency.toLowerCase(),
              unit_amount: before.due,
              product_data: { name: `${actor.shopName}: ticket ${ticketLabel(before.ticket.number, actor.shopName)}, balance` },
            },
          },
        ],
        client_reference_id: ticketId,
        metadata: { ticketId, shopId: actor.shopId, linkId: id },
        // The service fills in the session's id: /paid shows what that session proves, nothing more.
        success_url: `${appOrigin}/paid?session_id={CHECKOUT_SESSION_ID}`,
        cancel_url: `${appOrigin}/paid?cancelled=1`,
      };
      const [link] = await tx
        .insert(paymentLinks)
        .values({
          id,
          shopId: actor.shopId,
          ticketId,
          status: 'creating',
          amountMinor: before.due,
          currency: before.currency,
          createdById: actor.userId,
          request: request as Record<string, unknown>,
        })
        .returning();
      return { plan: { kind: 'make', link: link!, request }, cutShort };
    });
    if (cutShort.length > 0) await closeCutShort(actor.shopId, ticketId, cutShort);
    if (plan.kind === 'ready') return counterSummary(actor, ticketId);
    if (plan.kind === 'wait') {
      await whileCreating(actor.shopId, plan.linkId);
      continue;
    }
    if (plan.kind === 'close') {
      await closeAtService(actor.shopId, ticketId, plan.live, 'open');
      continue;
    }
    const made = await makeAtService(client, plan.link, plan.request, settings);
    if (made) return counterSummary(actor, ticketId);
  }
  throw new ServiceError(409, 'The balance kept changing while the pay link was made: reload and try again.');
}

/** Makes the link's session (no transaction open), then saves it under the ticket's lock if the
 * balance due is still its amount; true when saved. A session that is not saved is closed again. */
async function makeAtService(client: Stripe, link: PaymentLink, request: Stripe.Checkout.SessionCreateParams, settings: CounterView): Promise<boolean> {
  const { shopId, ticketId } = link;
  let session: Stripe.Checkout.Session;
  try {
    session = await client.checkout.sessions.create(request, { idempotencyKey: sessionKey(link.id), maxNetworkRetries: 0 });
  } catch (e) {
    const unreached = (e as { type?: string }).type === 'StripeConnectionError';
    // Unreached (or timed out), the service may still have made it: the link is marked failed and its
    // session closed later by replaying the request. A refusal made nothing: the row goes.
    await withTicketLock(shopId, ticketId, (tx) =>
      unreached
        ? tx
            .update(paymentLinks)
            .set({ status: 'failed' })
            .where(and(eq(paymentLinks.id, link.id), eq(paymentLinks.status, 'creating')))
        : tx.delete(paymentLinks).where(and(eq(paymentLinks.id, link.id), eq(paymentLinks.status, 'creating'))),
    );
    throw paymentServiceFailure(e, 'make a pay link');
  }
  let saved: 'open' | 'stale' | 'no-url';
  try {
    saved = await withTicketLock(shopId, ticketId, async (tx, ticket) => {
      const [row] = await tx.select().from(paymentLinks).where(eq(paymentLinks.id, link.id));
      const current = await summaryOf(ticket, settings, tx);
      if (!session.url) {
        await tx.update(paymentLinks).set({ status: 'expiring', sessionId: session.id }).where(eq(paymentLinks.id, link.id));
        return 'no-url';
      }
      if (row?.status === 'creating' && current.ticket.status !== 'collected' && current.due === link.amountMinor) {
        await tx.update(paymentLinks).set({ status: 'open', sessionId: session.id, url: session.url }).where(eq(paymentLinks.id, link.id));
        await audit(tx, shopId, link.createdById, 'payment.link', ticketId, { amountMinor: link.amountMinor });
        return 'open';
      }
      // The balance changed while the service made it (or the link was given up as cut short):
      // nobody has seen this session, and it is closed below like any other.
      await tx.update(paymentLinks).set({ status: 'expiring', sessionId: session.id }).where(eq(paymentLinks.id, link.id));
      return 'stale';
    });
  } catch (e) {
    // Saving failed: nobody has the link, so its session is closed rather than left payable. If
    // that fails too, the link (failed, no session on record) is closed later by replaying it.
    const closed = await closeQuietly(client, session.id);
    try {
      await withTicketLock(shopId, ticketId, (tx) =>
        tx
          .update(paymentLinks)
          .set({ status: 'failed', sessionId: closed ? session.id : null })
          .where(and(eq(paymentLinks.id, link.id), eq(paymentLinks.status, 'creating'))),
      );
    } catch {
      // The database that refused the save may refuse this too: the link goes stale and is replayed.
    }
    throw e;
  }
  if (saved === 'open') return true;
  await closeAtService(shopId, ticketId, [{ id: link.id, sessionId: session.id }], 'expiring');
  if (saved === 'no-url') throw new ServiceError(502, 'The payment service gave no link: try again in a moment.');
  return false;
}

async function closeQuietly(client: Stripe, sessionId: string): Promise<boolean> {
  try {
    await client.checkout.sessions.expire(sessionId);
    return true;
  } catch (e) {
    console.warn(`[payments] session ${sessionId} was made but not saved, and could not be closed yet: ${(e as Error).message}`);
    return false;
  }
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
    event = await verifyWebhook(payload, signature, secret);
  } catch {
    return { status: 400, message: 'Signature does not verify.' };
  }
  try {
    return await db.transaction(async (tx) => {
      const [fresh] = await tx.insert(paymentEvents).values({ id: event.id, type: event.type }).onConflictDoNothing().returning();
      if (!fresh) return { status: 409 as const, message: 'Event already processed.' };
      if (event.type === 'refund.created' || event.type === 'refund.updated')
        return { status: 200 as const, message: await applyRefundEvent(tx, event.data.object) };
      if (event.type !== 'checkout.session.completed') return { status: 200 as const, message: 'Ignored.' };
      const session = event.data.object;
      if (session.payment_status !== 'paid') return { status: 200 as const, message: 'Not paid yet.' };
      const [known] = await tx.select().from(paymentLinks).where(eq(paymentLinks.sessionId, session.id));
      if (!known) return { status: 200 as const, message: 'Unknown session.' };
      // Under the ticket's lock, like every other write to its money; the link is read again
      // inside it, as a price change may have just expired it.
      const ticket = await lockTicket(tx, known.shopId, known.ticketId);
      const [link] = await tx.select().from(paymentLinks).where(eq(paymentLinks.id, known.id));
      if (!link) return { status: 200 as const, message: 'Unknown session.' };
      // Being closed, it could still be paid until the service confirmed: the money was taken.
      if (link.status !== 'open' && link.status !== 'expiring') throw new WebhookRefusal('This payment link is no longer open.');
      // The service took the money: it is recorded even if the balance changed since (a payment at
      // the counter racing the customer online); anything beyond the total shows as a credit owed.
      const amountMinor = session.amount_total ?? link.amountMinor;
      const before = await summaryOf(ticket, { currency: isCurrency(link.currency) ? link.currency : 'EUR' }, tx);
      await tx.insert(payments).values({
        shopId: link.shopId,
        ticketId: link.ticketId,
        purpose: amountMinor >= before.due ? 'balance' : 'deposit',
        method: 'online',
        amountMinor,
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

/** The claim slip's data for a ticket of the actor's shop. */
export async function claimSlipData(actor: Actor, ticketId: string): Promise<ClaimSlipData> {
  const ticket = await shopTicket(actor, ticketId);
  const settings = await counterSettingsOf(actor.shopId);
  const summary = await summaryOf(ticket, settings);
  const items = await db
    .select({ description: garments.description, kind: garments.kind })
    .from(garments)
    .where(and(eq(garments.ticketId, ticketId), eq(garments.shopId, actor.shopId)))
    .orderBy(asc(garments.position));
  return {
    shopName: actor.shopName,
    location: settings.location,
    hours: settings.hours,
    ticketNumber: summary.ticket.number,
    customerName: summary.ticket.customerName,
    // The shop's calendar day (shop_settings.time_zone), not the server's.
    receivedOn: dayOf(ticket.createdAt, (await shopTimeZone(actor.shopId)).timeZone),
    dueOn: ticket.dueOn,
    garments: items.map((g) => g.description?.trim() || g.kind),
    lines: summary.lines.filter((l) => !l.voidedAt).map((l) => ({ label: l.reason ? `${l.label} (${l.reason})` : l.label, amountMinor: l.amountMinor })),
    currency: summary.currency,
    total: summary.total,
    paid: summary.paid,
    due: summary.due,
  };
}
