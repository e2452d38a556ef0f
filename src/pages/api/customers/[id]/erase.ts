// Forgetting a customer on their request: personal details erased, money records kept.
import type { APIRoute } from 'astro';
import { guard, run } from '@/lib/api';
import { eraseCustomer } from '@/services/customers';

/** Erases the customer's name, contact details, notes and garment photos (the lead only). */
export const POST: APIRoute = async ({ locals, params }) => {
  const actor = guard(locals, ['customers', 'erase']);
  if (actor instanceof Response) return actor;
  return run(() => eraseCustomer(actor, params.id ?? ''));
};
