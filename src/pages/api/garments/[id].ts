// One garment: read it with its ticket and customer; change its description, due date or assignee.
import { route } from '@/lib/server/route';
import { garmentPatch } from '@/lib/shared/bench-requests';
import { getGarment, updateGarment } from '@/services/garments';
import { garmentDetailJson } from '@/lib/server/answers/bench';
import { garmentJson } from '@/db/schema/tickets';

/** The garment with its ticket and customer. */
export const GET = route(
  { summary: 'One garment with its ticket and customer.', permission: ['tickets', 'read'], responses: { 200: garmentDetailJson } },
  ({ actor, params }) => getGarment(actor, params.id!),
);

/** Changes the garment's description, due date or assignee (each change kept in its history). */
export const PATCH = route(
  {
    summary: "Changes the garment's description, due date or assignee (each change kept in its history).",
    permission: ['tickets', 'update'],
    body: garmentPatch,
    examples: [{ summary: 'A new due date', body: { dueOn: '2027-03-01' } }],
    responses: { 200: garmentJson },
  },
  ({ actor, params, body }) => updateGarment(actor, params.id!, body),
);
