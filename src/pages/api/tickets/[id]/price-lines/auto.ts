// Prices the ticket from its garments' finishes and plans (taper let-out included), with or without rush.
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { autoLinesInput } from '@/lib/counter-request';
import { priceFromGarments } from '@/services/counter/prices';

export const prerender = false;

/** Replaces the worked-out lines; hand-added lines and adjustments stay. */
export const POST: APIRoute = async ({ locals, request, params }) => {
  const actor = guard(locals, ['prices', 'adjust']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, autoLinesInput);
  if (input instanceof Response) return input;
  return run(() => priceFromGarments(actor, params.id ?? '', input));
};
