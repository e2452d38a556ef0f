// Prices the ticket from its garments' finishes and plans (taper let-out included), with or without rush.
import { route } from '@/lib/server/route';
import { autoLinesInput } from '@/lib/shared/counter-request';
import { priceFromGarments } from '@/services/counter/prices';
import { priceLineJson } from '@/db/schema/prices';
import { z } from 'zod';

export const prerender = false;

/** Replaces the worked-out lines; hand-added lines and adjustments stay. */
export const POST = route(
  {
    summary: "Prices the ticket from its garments' finishes and plans, with or without rush; hand-added lines stay.",
    permission: ['prices', 'adjust'],
    body: autoLinesInput,
    examples: [{ summary: 'No rush', body: { rush: false } }],
    responses: { 200: z.object({ lines: z.array(priceLineJson), unpriced: z.array(z.string()) }) },
  },
  ({ actor, params, body }) => priceFromGarments(actor, params.id!, body),
);
