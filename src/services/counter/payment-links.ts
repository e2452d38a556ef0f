// A ticket's online pay links and the payment service, which is never called inside a transaction:
// PGlite has one connection, and a transaction open across a slow answer would stop every shop.
// Each call goes between two short transactions under the ticket's lock: the first decides and
// records the intent (a link `creating` or `expiring`), the service is called with none open, the
// second records what it answered and re-checks. A link is marked expired only once the service
// confirms it can no longer be paid.
import { and, eq, inArray, isNull, or, sql } from 'drizzle-orm';
import type Stripe from 'stripe';
import type { Db } from '@/db';
import { LIVE_LINK_STATUSES, paymentLinks, type PaymentLink, type Ticket } from '@/db/schema';
import { paymentClient } from '@/lib/server/payment-service';
import { ServiceError } from '../errors';
import { withTicketLock } from '../ticket-core';

/** After this long a link still `creating` is taken as cut short (the server stopped between the
 * phases): it no longer holds up the ticket, and whatever session it made is closed. Far above
 * the SDK's timeout for making one (`PAYMENT_TIMEOUT_MS`, no retry). */
export const STALE_CREATING_SECONDS = 30;

/** The answer for a payment-service call that failed: 503 when it could not be reached, else 502. */
export function paymentServiceFailure(e: unknown, doing: string): ServiceError {
  if (e instanceof ServiceError) return e;
  const err = e as { type?: string; message?: string };
  if (err?.type === 'StripeConnectionError') {
    return new ServiceError(503, `The payment service cannot be reached to ${doing}: nothing was changed. Try again in a moment.`);
  }
  return new ServiceError(502, `The payment service would not ${doing} (${err?.message ?? 'no reason given'}): nothing was changed. Try again in a moment.`);
}

/** The idempotency key a link's session is made under, so making it again answers the same session. */
export function sessionKey(linkId: string): string {
  return `pay-link-${linkId}`;
}

async function expireAtService(client: Stripe, sessionId: string): Promise<void> {
  let refused: unknown;
  try {
    await client.checkout.sessions.expire(sessionId);
    return;
  } catch (e) {
    refused = e;
  }
  if ((refused as { type?: string }).type === 'StripeConnectionError') throw paymentServiceFailure(refused, 'close the open pay link');
  // Refused: ask what the session is now (it may have expired by itself, or just been paid).
  let session: Stripe.Checkout.Session;
  try {
    session = await client.checkout.sessions.retrieve(sessionId);
  } catch (e) {
    // The service has no such session: nobody can pay it.
    if ((e as { statusCode?: number }).statusCode === 404) return;
    throw paymentServiceFailure(e, 'close the open pay link');
  }
  if (session.status === 'expired') return;
  if (session.status === 'complete') {
    throw new ServiceError(
      409,
      'The customer has just paid the open pay link online: wait a moment for the payment to arrive, reload, and change the price after that if still needed.',
    );
  }
  throw paymentServiceFailure(refused, 'close the open pay link');
}

/** Links the customer may still pay: open, or being closed and not yet confirmed. */
export function liveLinks(tx: Db, shopId: string, ticketId: string): Promise<PaymentLink[]> {
  return tx
    .select()
    .from(paymentLinks)
    .where(and(eq(paymentLinks.shopId, shopId), eq(paymentLinks.ticketId, ticketId), inArray(paymentLinks.status, [...LIVE_LINK_STATUSES])));
}

/** Marks links `expiring` (inside the ticket's lock), before the service is asked to close them. */
export async function markExpiring(tx: Db, links: Pick<PaymentLink, 'id'>[]): Promise<void> {
  if (links.length === 0) return;
  await tx
    .update(paymentLinks)
    .set({ status: 'expiring' })
    .where(
      and(
        inArray(
          paymentLinks.id,
          links.map((l) => l.id),
        ),
        inArray(paymentLinks.status, [...LIVE_LINK_STATUSES]),
      ),
    );
}

/** Asks the service to close each link, with no transaction open, then records under the ticket's
 * lock what it confirmed (expired) and, for a link that was open for the balance as it stands
 * (`unconfirmed: 'open'`), reopens the rest; a discarded session stays `expiring` until closed.
 * Throws the first refusal (409/502/503); the links after it are not tried. */
export async function closeAtService(
  shopId: string,
  ticketId: string,
  links: Pick<PaymentLink, 'id' | 'sessionId'>[],
  unconfirmed: 'open' | 'expiring',
): Promise<void> {
  const client = await paymentClient();
  const closed: string[] = [];
  let refusal: unknown = null;
  for (const link of links) {
    try {
      // Without a key this server cannot reach the service at all; the link was made under a setting
      // no longer in place, and is closed here so the balance is not settled at the old amount.
      if (client && link.sessionId) await expireAtService(client, link.sessionId);
      closed.push(link.id);
    } catch (e) {
      refusal = e;
      break;
    }
  }
  const rest = links.map((l) => l.id).filter((id) => !closed.includes(id));
  await withTicketLock(shopId, ticketId, async (tx) => {
    // A webhook may have recorded a payment meanwhile: a paid link stays paid.
    if (closed.length > 0)
      await tx
        .update(paymentLinks)
        .set({ status: 'expired' })
        .where(and(inArray(paymentLinks.id, closed), inArray(paymentLinks.status, [...LIVE_LINK_STATUSES])));
    if (rest.length > 0 && unconfirmed === 'open')
      await tx
        .update(paymentLinks)
        .set({ status: 'open' })
        .where(and(inArray(paymentLinks.id, rest), eq(paymentLinks.status, 'expiring')));
  });
  if (refusal) throw paymentServiceFailure(refusal, 'close the open pay link');
}

const ROUNDS = 3;

/** Runs `change` under the ticket's lock once no link is left that could still be paid at the old
 * balance: the ticket's live links are closed at the service first, with no transaction open.
 * `check` refuses early (under the lock) so a change that would be refused closes nothing; `change`
 * must check again, as it runs in a later transaction. When the service does not confirm, throws
 * 409/502/503 and the change is not made. */
export async function withLinksClosed<T>(
  shopId: string,
  ticketId: string,
  check: (tx: Db, ticket: Ticket) => Promise<unknown>,
  change: (tx: Db, ticket: Ticket) => Promise<T>,
): Promise<T> {
  for (let round = 0; round < ROUNDS; round += 1) {
    const step = await withTicketLock(shopId, ticketId, async (tx, ticket) => {
      const live = await liveLinks(tx, shopId, ticketId);
      if (live.length === 0) return { done: true as const, value: await change(tx, ticket) };
      await check(tx, ticket);
      await markExpiring(tx, live);
      return { done: false as const, live };
    });
    if (step.done) return step.value;
    await closeAtService(shopId, ticketId, step.live, 'open');
    // A link made meanwhile is found in the next round's transaction and closed as well.
  }
  throw new ServiceError(409, 'The pay link changed while this was saved: reload and try again.');
}

/** Links whose making was cut short and whose session (if the service made one) may still be
 * open: `creating` for too long, or `failed` without an answer; read under the ticket's lock. */
export async function cutShortLinks(tx: Db, shopId: string, ticketId: string): Promise<PaymentLink[]> {
  const stale = sql`${paymentLinks.createdAt} < now() - make_interval(secs => ${STALE_CREATING_SECONDS})`;
  return tx
    .select()
    .from(paymentLinks)
    .where(
      and(
        eq(paymentLinks.shopId, shopId),
        eq(paymentLinks.ticketId, ticketId),
        isNull(paymentLinks.sessionId),
        or(and(eq(paymentLinks.status, 'creating'), stale), eq(paymentLinks.status, 'failed')),
      ),
    );
}

/** Closes the sessions of links cut short: the same request under the same idempotency key answers
 * the session the service made (or makes one), which is then expired; the link is marked failed
 * with it. Best effort, with no transaction open: one that cannot be closed now is tried next time. */
export async function closeCutShort(shopId: string, ticketId: string, links: PaymentLink[]): Promise<void> {
  const client = await paymentClient();
  for (const link of links) {
    try {
      let sessionId: string | null = null;
      if (client && link.request) {
        const session = await client.checkout.sessions.create(link.request as Stripe.Checkout.SessionCreateParams, {
          idempotencyKey: sessionKey(link.id),
          maxNetworkRetries: 0,
        });
        await expireAtService(client, session.id);
        sessionId = session.id;
      }
      await withTicketLock(shopId, ticketId, (tx) =>
        tx
          .update(paymentLinks)
          .set({ status: 'failed', sessionId })
          .where(and(eq(paymentLinks.id, link.id), inArray(paymentLinks.status, ['creating', 'failed']), isNull(paymentLinks.sessionId))),
      );
    } catch (e) {
      console.warn(`[payments] pay link ${link.id} cut short: its session is not closed yet (${(e as Error).message})`);
    }
  }
}
