// The shop's customers: search (or list) and add.
import type { APIRoute } from 'astro';
import { guard, problem, readBody, run } from '@/lib/api';
import { customerQuery, newCustomer } from '@/lib/customer-request';
import { createCustomer, listCustomers, searchCustomers } from '@/services/customers';

/** With ?q=: the shop's customers found by name, phone, e-mail or ticket number; without: every one. */
export const GET: APIRoute = async ({ locals, url }) => {
  const actor = guard(locals, ['customers', 'read']);
  if (actor instanceof Response) return actor;
  const typed = url.searchParams.get('q');
  if (typed === null) return run(() => listCustomers(actor));
  const q = customerQuery.safeParse(typed);
  if (!q.success) return problem(422, 'Some fields need attention.', { q: q.error.issues[0]!.message });
  return run(() => searchCustomers(actor, q.data));
};

/** Adds a customer (the same schema as intake's new customer: a blank e-mail is none). */
export const POST: APIRoute = async ({ locals, request }) => {
  const actor = guard(locals, ['customers', 'create']);
  if (actor instanceof Response) return actor;
  const input = await readBody(request, newCustomer);
  if (input instanceof Response) return input;
  return run(() => createCustomer(actor, input), 201);
};
