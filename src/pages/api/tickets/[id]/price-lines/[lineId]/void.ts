// Voids a wrong price line with its reason: it stays on the ticket, struck through, and in the history.
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { voidLineInput } from '@/lib/counter-request';
import { voidLine } from '@/services/counter/prices';

export const prerender = false;

/** The line, voided; refused when the total would go below zero. */
export const POST: APIRoute = async ({ locals, request, params }) => {
  const actor = guard(locals, ['prices', 'adjust']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, voidLineInput);
  if (input instanceof Response) return input;
  return run(() => voidLine(actor, params.id ?? '', params.lineId ?? '', input));
};
