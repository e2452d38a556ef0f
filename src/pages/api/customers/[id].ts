// One customer: read, or change their name, phone, e-mail or notes.
import { route } from '@/lib/server/route';
import { customerPatch } from '@/lib/shared/customer-request';
import { getCustomer, updateCustomer } from '@/services/customers';
import { customerJson } from '@/db/schema/customers';

/** The customer, when they are the shop's. */
export const GET = route({ summary: 'One customer of the shop.', permission: ['customers', 'read'], responses: { 200: customerJson } }, ({ actor, params }) =>
  getCustomer(actor, params.id!),
);

/** Changes the customer's details (old and new values kept in the audit). */
export const PATCH = route(
  {
    summary: "Changes the customer's name, phone, e-mail or notes (old and new values kept in the history).",
    permission: ['customers', 'update'],
    body: customerPatch,
    examples: [{ summary: 'A note for next time', body: { notes: 'Prefers a deep cuff.' } }],
    responses: { 200: customerJson },
  },
  ({ actor, params, body }) => updateCustomer(actor, params.id!, body),
);
