// Adds a garment to a ticket (a second pair brought in at the counter, or found at the bench).
import { route } from '@/lib/server/route';
import { garmentInput } from '@/lib/shared/bench-requests';
import { addGarment } from '@/services/garments';
import { garmentJson } from '@/db/schema/tickets';

/** Adds one garment to the ticket. */
export const POST = route(
  {
    summary: 'Adds one garment to the ticket.',
    permission: ['tickets', 'create'],
    body: garmentInput,
    status: 201,
    examples: [{ summary: 'A second pair', body: { description: 'Grey flannel trousers' } }],
    responses: { 201: garmentJson },
  },
  ({ actor, params, body }) => addGarment(actor, params.id!, body),
);
