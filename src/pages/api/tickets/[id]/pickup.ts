// Hands a ready, paid ticket over to the customer: it is closed as collected.
import { route } from '@/lib/server/route';
import { pickUp } from '@/services/counter/payments';
import { counterSummaryJson } from '@/lib/server/answers/counter';

export const prerender = false;

/** Closes the ticket with its payment on record; refused while a balance is due. */
export const POST = route(
  {
    summary: 'Hands a ready ticket over: closed as collected; refused while a balance is due.',
    permission: ['tickets', 'pickup'],
    responses: { 200: counterSummaryJson },
  },
  ({ actor, params }) => pickUp(actor, params.id!),
);
