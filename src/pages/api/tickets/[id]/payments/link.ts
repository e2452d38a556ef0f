// An online payment link for the balance due, made through the payment service.
import type { APIRoute } from 'astro';
import { guard, run } from '@/lib/api';
import { createPaymentLink } from '@/services/counter/payments';

export const prerender = false;

/** Makes (or reuses) the link; the summary carries its address. */
export const POST: APIRoute = async ({ locals, params, url }) => {
  const actor = guard(locals, ['payments', 'take']);
  if (actor instanceof Response) return actor;
  return run(() => createPaymentLink(actor, params.id ?? '', url.origin), 201);
};
