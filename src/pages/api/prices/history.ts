// The price list's history for the lead: who changed which line, when, old → new.
import type { APIRoute } from 'astro';
import { guard, run } from '@/lib/api';
import { priceHistory } from '@/services/counter/price-kinds';

export const prerender = false;

/** The newest 200 changes; the lead's, as the list is (who changed prices is not the counter's page). */
export const GET: APIRoute = async ({ locals }) => {
  const actor = guard(locals, ['prices', 'update']);
  if (actor instanceof Response) return actor;
  return run(() => priceHistory(actor));
};
