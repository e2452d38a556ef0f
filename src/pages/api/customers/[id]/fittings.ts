// "Same as last time": the customer's earlier fittings, offered when a garment is taken in.
import type { APIRoute } from 'astro';
import { guard, run } from '@/lib/api';
import { previousFittings } from '@/services/fitting-copy';

/** The customer's latest fittings per garment kind; for whoever takes garments in. */
export const GET: APIRoute = async ({ locals, params }) => {
  const actor = guard(locals, ['tickets', 'create']);
  if (actor instanceof Response) return actor;
  return run(() => previousFittings(actor, params.id ?? ''));
};
