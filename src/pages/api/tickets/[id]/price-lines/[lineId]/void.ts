// Voids a wrong price line with its reason: it stays on the ticket, struck through, and in the history.
import { route } from '@/lib/server/route';
import { voidLineInput } from '@/lib/shared/counter-request';
import { voidLine } from '@/services/counter/prices';
import { priceLineJson } from '@/db/schema/prices';

export const prerender = false;

/** The line, voided; refused when the total would go below zero. */
export const POST = route(
  {
    summary: 'Voids a price line with its reason (it stays, struck through); refused when the total would go below zero.',
    permission: ['prices', 'adjust'],
    body: voidLineInput,
    examples: [{ summary: 'Entered twice', body: { reason: 'Entered twice by mistake' } }],
    responses: { 200: priceLineJson },
  },
  ({ actor, params, body }) => voidLine(actor, params.id!, params.lineId!, body),
);
