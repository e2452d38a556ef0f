// Forgetting a customer on their request: personal details erased, money records kept.
import { route } from '@/lib/server/route';
import { eraseCustomer } from '@/services/customers';

/** Erases the customer's name, contact details, notes and garment photos (the lead only). */
export const POST = route(
  { summary: "Erases the customer's name, contact details, notes and garment photos; money records stay.", permission: ['customers', 'erase'] },
  ({ actor, params }) => eraseCustomer(actor, params.id!),
);
