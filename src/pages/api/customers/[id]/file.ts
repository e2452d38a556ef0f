// The customers screen's view of one customer: details, tickets, garments, payments, notices, history.
import type { APIRoute } from 'astro';
import { guard, run } from '@/lib/api';
import { customerFile } from '@/services/customers';

/** Everything the shop keeps about the customer. */
export const GET: APIRoute = async ({ locals, params }) => {
  const actor = guard(locals, ['customers', 'browse']);
  if (actor instanceof Response) return actor;
  return run(() => customerFile(actor, params.id ?? ''));
};
