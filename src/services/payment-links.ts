// Closing a ticket's open online payment links, when what they ask for is no longer what is due.
// A link is marked expired only once the payment service confirms it can no longer be paid.
import { and, eq } from 'drizzle-orm';
import type Stripe from 'stripe';
import type { Db } from '@/db';
import { paymentLinks } from '@/db/schema';
import { paymentClient } from '@/lib/payment-service';
import { ServiceError } from './errors';

/** The answer for a payment-service call that failed: 503 when it could not be reached, else 502. */
export function paymentServiceFailure(e: unknown, doing: string): ServiceError {
  const err = e as { type?: string; message?: string };
  if (err?.type === 'StripeConnectionError') {
    return new ServiceError(503, `The payment service cannot be reached to ${doing}: nothing was changed. Try again in a moment.`);
  }
  return new ServiceError(502, `The payment service would not ${doing} (${err?.message ?? 'no reason given'}): nothing was changed. Try again in a moment.`);
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
    throw new ServiceError(409, 'The customer has just paid the open pay link online: wait a moment for the payment to arrive, reload, and change the price after that if still needed.');
  }
  throw paymentServiceFailure(refused, 'close the open pay link');
}

/** Expires the ticket's open links at the payment service, then marks them expired; call it inside
 * the ticket's lock (`withTicketLock`) with its transaction, before the change that makes them
 * stale, so a refusal rolls the change back. Throws 409/502/503 and marks nothing when the service
 * does not confirm. */
export async function expireOpenLinks(tx: Db, ticketId: string): Promise<void> {
  const open = await tx.select().from(paymentLinks).where(and(eq(paymentLinks.ticketId, ticketId), eq(paymentLinks.status, 'open')));
  if (open.length === 0) return;
  const client = paymentClient();
  for (const link of open) {
    // Without a key this server cannot reach the service at all; the link was made under a setting
    // no longer in place, and is closed here so the balance is not settled at the old amount.
    if (client) await expireAtService(client, link.sessionId);
    await tx.update(paymentLinks).set({ status: 'expired' }).where(eq(paymentLinks.id, link.id));
  }
}
