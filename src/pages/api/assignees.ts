// The people of the shop a garment can be given to, for the pickers on the bench screens.
import type { APIRoute } from 'astro';
import { guard, run } from '@/lib/api';
import { staffOf } from '@/services/garments';

/** The shop's people by name, with their roles. */
export const GET: APIRoute = async ({ locals }) => {
  const actor = guard(locals, ['tickets', 'read']);
  if (actor instanceof Response) return actor;
  return run(() => staffOf(actor));
};
