// Hands a ready, paid ticket over to the customer: it is closed as collected.
import type { APIRoute } from 'astro';
import { guard, run } from '@/lib/api';
import { pickUp } from '@/services/counter/payments';

export const prerender = false;

/** Closes the ticket with its payment on record; refused while a balance is due. */
export const POST: APIRoute = async ({ locals, params }) => {
  const actor = guard(locals, ['tickets', 'pickup']);
  if (actor instanceof Response) return actor;
  return run(() => pickUp(actor, params.id ?? ''));
};
