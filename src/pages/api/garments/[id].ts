// One garment: read it with its ticket and customer; change its description, due date or assignee.
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { garmentPatch } from '@/lib/bench-requests';
import { getGarment, updateGarment } from '@/services/garments';

/** The garment with its ticket and customer. */
export const GET: APIRoute = async ({ locals, params }) => {
  const actor = guard(locals, ['tickets', 'read']);
  if (actor instanceof Response) return actor;
  return run(() => getGarment(actor, params.id ?? ''));
};

/** Changes the garment's description, due date or assignee (each change kept in its history). */
export const PATCH: APIRoute = async ({ locals, request, params }) => {
  const actor = guard(locals, ['tickets', 'update']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, garmentPatch);
  if (input instanceof Response) return input;
  return run(() => updateGarment(actor, params.id ?? '', input));
};
