// One customer: read, or change their name, phone, e-mail or notes.
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { customerPatch } from '@/lib/customer-request';
import { getCustomer, updateCustomer } from '@/services/customers';

/** The customer, when they are the shop's. */
export const GET: APIRoute = async ({ locals, params }) => {
  const actor = guard(locals, ['customers', 'read']);
  if (actor instanceof Response) return actor;
  return run(() => getCustomer(actor, params.id ?? ''));
};

/** Changes the customer's details (old and new values kept in the audit). */
export const PATCH: APIRoute = async ({ locals, request, params }) => {
  const actor = guard(locals, ['customers', 'update']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, customerPatch);
  if (input instanceof Response) return input;
  return run(() => updateCustomer(actor, params.id ?? '', input));
};
