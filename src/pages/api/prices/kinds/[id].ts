// One kind of work on the price list: renamed, re-priced, rush or not, retired or brought back.
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { priceKindPatch } from '@/lib/counter-request';
import { changeKind } from '@/services/counter/price-kinds';

export const prerender = false;

/** Changes the kind; another shop's kind is 404, like one that does not exist. Tickets keep their lines. */
export const PATCH: APIRoute = async ({ locals, request, params }) => {
  const actor = guard(locals, ['prices', 'update']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, priceKindPatch);
  if (input instanceof Response) return input;
  return run(() => changeKind(actor, params.id ?? '', input));
};
