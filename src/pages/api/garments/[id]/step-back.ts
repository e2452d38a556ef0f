// Steps a garment back one step after a wrong tap; a collected garment only by the lead.
import { route } from '@/lib/server/route';
import { stepBackRequest } from '@/lib/shared/bench-requests';
import { stepBackGarment } from '@/services/garment-step-back';
import { garmentJson } from '@/db/schema/tickets';

/** Moves the garment back from the step it was seen at to the one before. */
export const POST = route(
  {
    summary: 'Moves the garment back one step, from the step it was seen at (a collected one only by the lead).',
    permission: ['tickets', 'advance'],
    body: stepBackRequest,
    examples: [{ summary: 'Back from marked to received', body: { from: 'marked' } }],
    responses: { 200: garmentJson },
  },
  ({ actor, params, body }) => stepBackGarment(actor, params.id!, body.from),
);
