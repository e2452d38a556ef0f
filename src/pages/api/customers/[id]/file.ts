// The customers screen's view of one customer: details, tickets, garments, payments, notices, history.
import { route } from '@/lib/server/route';
import { customerFile } from '@/services/customers';

/** Everything the shop keeps about the customer. */
export const GET = route(
  { summary: 'Everything the shop keeps about one customer: details, tickets, garments, payments, notices, history.', permission: ['customers', 'browse'] },
  ({ actor, params }) => customerFile(actor, params.id!),
);
