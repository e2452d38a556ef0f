// Moves a garment one bench step on: the apprentice's one tap; pickup is the counter's.
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { stepRequest } from '@/lib/bench-requests';
import { moveGarment } from '@/services/garments';

/** Moves the garment to the next step. */
export const POST: APIRoute = async ({ locals, request, params }) => {
  const input = await readBody(request.clone(), stepRequest);
  const permission = input instanceof Response || input.to !== 'collected' ? 'advance' : 'pickup';
  const actor = guard(locals, ['tickets', permission]);
  if (actor instanceof Response) return actor;
  if (input instanceof Response) return input;
  return run(() => moveGarment(actor, params.id ?? '', input.to));
};
