// The shop's tickets: the list as the role sees it, and intake with the garments brought in.
import { route, demand } from '@/lib/server/route';
import { intakeRequest, pricesAtIntake } from '@/lib/shared/bench-requests';
import { createTicket, listTickets } from '@/services/tickets';
import { ticketListItemJson } from '@/lib/server/answers/bench';
import { ticketJson } from '@/db/schema/tickets';
import { z } from 'zod';

/** Tickets visible to the role (an apprentice sees assigned-to-them and unassigned), newest number first. */
export const GET = route(
  {
    summary: 'The tickets the role may see (an apprentice: theirs and unassigned), newest number first.',
    permission: ['tickets', 'read'],
    responses: { 200: z.array(ticketListItemJson) },
  },
  ({ actor }) => listTickets(actor),
);

/** Opens a ticket: an existing customer or a new one, and its garments, priced at intake when asked (the counter and the lead). */
export const POST = route(
  {
    summary:
      'Opens a ticket for an existing customer (customerId) or a new one (customer: also customers.create), with its garments; priced at intake when asked (also prices.adjust).',
    permission: ['tickets', 'create'],
    body: intakeRequest,
    status: 201,
    examples: [
      {
        summary: 'A walk-in with one pair',
        body: { customer: { name: 'Robin Example', phone: '555 0123' }, dueOn: '2027-03-01', garments: [{ description: 'Navy wool trousers' }] },
      },
    ],
    responses: { 201: ticketJson },
  },
  ({ actor, body }) => {
    if (body.customer) demand(actor, ['customers', 'create'], 'add customers');
    if (pricesAtIntake(body)) demand(actor, ['prices', 'adjust'], 'price work at intake');
    return createTicket(actor, body);
  },
);
