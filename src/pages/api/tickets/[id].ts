// One ticket: read it with its customer and garments, or move it (all its garments at its step) on.
import { demand, route } from '@/lib/server/route';
import { ticketJson, ticketStatusInput } from '@/db/schema/tickets';
import { getTicket, moveTicket } from '@/services/tickets';
import { ticketDetailJson } from '@/lib/server/answers/bench';

/** The ticket with its customer and the garments the role may see. */
export const GET = route(
  { summary: 'One ticket with its customer and the garments the role may see.', permission: ['tickets', 'read'], responses: { 200: ticketDetailJson } },
  ({ actor, params }) => getTicket(actor, params.id!),
);

/** Moves the ticket to its next step. */
export const PATCH = route(
  {
    summary: 'Moves the ticket (every garment at its step) to the next step (to collected: the pickup permission).',
    permission: [
      ['tickets', 'advance'],
      ['tickets', 'pickup'],
    ],
    body: ticketStatusInput,
    examples: [{ summary: 'Received to marked', body: { status: 'marked' } }],
    responses: { 200: ticketJson },
  },
  ({ actor, params, body }) => {
    demand(actor, ['tickets', body.status === 'collected' ? 'pickup' : 'advance']);
    return moveTicket(actor, params.id!, body.status);
  },
);
