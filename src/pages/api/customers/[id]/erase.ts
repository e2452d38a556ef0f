// Forgetting a customer on their request: personal details erased, money records kept.
import { route } from '@/lib/server/route';
import { eraseCustomer } from '@/services/customers';
import { customerDetailsJson } from '@/lib/server/answers/people';

/** Erases the customer's name, contact details, notes and garment photos (the lead only). */
export const POST = route(
  {
    summary: "Erases the customer's name, contact details, notes and garment photos; money records stay.",
    permission: ['customers', 'erase'],
    responses: { 200: customerDetailsJson },
  },
  ({ actor, params }) => eraseCustomer(actor, params.id!),
);
