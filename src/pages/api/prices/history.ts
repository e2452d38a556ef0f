// The price list's history for the lead: who changed which line, when, old → new.
import { route } from '@/lib/server/route';
import { priceHistory } from '@/services/counter/price-kinds';
import { priceChangeJson } from '@/lib/server/answers/counter';
import { z } from 'zod';

export const prerender = false;

/** The newest 200 changes; the lead's, as the list is (who changed prices is not the counter's page). */
export const GET = route(
  {
    summary: "The price list's newest 200 changes: who changed which line, when, old → new.",
    permission: ['prices', 'update'],
    responses: { 200: z.array(priceChangeJson) },
  },
  ({ actor }) => priceHistory(actor),
);
