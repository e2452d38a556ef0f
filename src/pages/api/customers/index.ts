// The shop's customers: list and add.
import type { APIRoute } from 'astro';
import { guard, readBody, run } from '@/lib/api';
import { customerInput } from '@/db/schema/customers';
import { createCustomer, listCustomers } from '@/services/customers';

/** Every customer of the shop. */
export const GET: APIRoute = async ({ locals }) => {
  const actor = guard(locals, ['customers', 'read']);
  if (actor instanceof Response) return actor;
  return run(() => listCustomers(actor));
};

/** Adds a customer. */
export const POST: APIRoute = async ({ locals, request }) => {
  const actor = guard(locals, ['customers', 'create']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, customerInput);
  if (input instanceof Response) return input;
  return run(() => createCustomer(actor, input), 201);
};
