// Adds a garment to a ticket (a second pair brought in at the counter, or found at the bench).
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { garmentInput } from '@/lib/bench-requests';
import { addGarment } from '@/services/garments';

/** Adds one garment to the ticket. */
export const POST: APIRoute = async ({ locals, request, params }) => {
  const actor = guard(locals, ['tickets', 'create']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, garmentInput);
  if (input instanceof Response) return input;
  return run(() => addGarment(actor, params.id ?? '', input), 201);
};
