// Moves a garment one bench step on: the apprentice's one tap; pickup is the counter's.
import { demand, route } from '@/lib/server/route';
import { stepRequest } from '@/lib/shared/bench-requests';
import { moveGarment } from '@/services/garments';
import { garmentJson } from '@/db/schema/tickets';

/** Moves the garment to the next step. */
export const POST = route(
  {
    summary: 'Moves the garment to its next step (to collected: the pickup permission).',
    permission: [
      ['tickets', 'advance'],
      ['tickets', 'pickup'],
    ],
    body: stepRequest,
    examples: [{ summary: 'Marked to cut', body: { to: 'cut' } }],
    responses: { 200: garmentJson },
  },
  ({ actor, params, body }) => {
    demand(actor, ['tickets', body.to === 'collected' ? 'pickup' : 'advance']);
    return moveGarment(actor, params.id!, body.to);
  },
);
