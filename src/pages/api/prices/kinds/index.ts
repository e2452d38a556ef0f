// The lead's kinds of work on the price list: a new one ("Replace zip"), with a flat price.
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { priceKindInput } from '@/lib/counter-request';
import { addKind } from '@/services/counter/price-kinds';

export const prerender = false;

/** Adds a kind of work; 409 when a kind on the list already has that name. */
export const POST: APIRoute = async ({ locals, request }) => {
  const actor = guard(locals, ['prices', 'update']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, priceKindInput);
  if (input instanceof Response) return input;
  return run(() => addKind(actor, input), 201);
};
