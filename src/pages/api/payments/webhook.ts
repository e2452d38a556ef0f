// The payment service's webhook: no session, the signature is the proof. Forged, stale or
// replayed events change nothing.
import type { APIRoute } from 'astro';
import { problem, json } from '@/lib/api';
import { receiveWebhook } from '@/services/payments';

export const prerender = false;

/** Verifies the event against the raw body and applies it once. */
export const POST: APIRoute = async ({ request }) => {
  const payload = await request.text();
  const outcome = await receiveWebhook(payload, request.headers.get('stripe-signature'));
  return outcome.status === 200 ? json({ received: true, message: outcome.message }) : problem(outcome.status, outcome.message);
};
