// The payment service's webhook: no session, the signature is the proof. Forged, stale or
// replayed events change nothing.
import { json, problem } from '@/lib/server/api';
import { BodyRefused, JSON_BODY_LIMIT, readLimited } from '@/lib/server/body';
import { route } from '@/lib/server/route';
import { receiveWebhook } from '@/services/counter/payments';
import { webhookReceivedJson } from '@/lib/server/answers/site';

export const prerender = false;

/** Verifies the event against the raw body and applies it once. */
export const POST = route(
  {
    summary: "The payment service's events (Stripe-Signature over the raw body); forged, stale or replayed events change nothing.",
    description: 'Called by the payment service, not by clients: no example, since only a body signed with the webhook secret is accepted.',
    permission: 'public',
    rawBody: { type: 'application/json' },
    responses: { 200: webhookReceivedJson },
  },
  async ({ request }) => {
    let payload: string;
    try {
      payload = new TextDecoder().decode(await readLimited(request, JSON_BODY_LIMIT));
    } catch (e) {
      if (e instanceof BodyRefused) return problem(e.status, e.message);
      throw e;
    }
    const outcome = await receiveWebhook(payload, request.headers.get('stripe-signature'));
    return outcome.status === 200 ? json({ received: true, message: outcome.message }) : problem(outcome.status, outcome.message);
  },
);
