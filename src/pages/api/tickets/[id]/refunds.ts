// Settles the credit owed to the customer on a ticket: cash back, card terminal, kept as credit,
// or a refund of an online payment through the payment service.
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { refundInput } from '@/lib/counter-request';
import { settleCredit } from '@/services/counter/refunds';

export const prerender = false;

/** Records the refund (an online one is confirmed by the service); answers the ticket's money. */
export const POST: APIRoute = async ({ locals, request, params }) => {
  const actor = guard(locals, ['payments', 'take']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, refundInput);
  if (input instanceof Response) return input;
  return run(() => settleCredit(actor, params.id ?? '', input), 201);
};
