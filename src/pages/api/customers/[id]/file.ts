// The customers screen's view of one customer: details, tickets, garments, payments, notices, history.
import { route } from '@/lib/server/route';
import { customerFile } from '@/services/customers';
import { customerFileJson } from '@/lib/server/answers/people';

/** Everything the shop keeps about the customer. */
export const GET = route(
  {
    summary: 'Everything the shop keeps about one customer: details, tickets, garments, payments, notices, history.',
    permission: ['customers', 'browse'],
    responses: { 200: customerFileJson },
  },
  ({ actor, params }) => customerFile(actor, params.id!),
);
