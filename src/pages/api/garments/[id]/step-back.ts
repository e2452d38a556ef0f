// Steps a garment back one step after a wrong tap; a collected garment only by the lead.
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { stepBackRequest } from '@/lib/bench-requests';
import { stepBackGarment } from '@/services/garment-step-back';

/** Moves the garment back from the step it was seen at to the one before. */
export const POST: APIRoute = async ({ locals, request, params }) => {
  const actor = guard(locals, ['tickets', 'advance']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, stepBackRequest);
  if (input instanceof Response) return input;
  return run(() => stepBackGarment(actor, params.id ?? '', input.from));
};
