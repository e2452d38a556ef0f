// The shop's customers: search (or list) and add.
import { z } from 'zod';
import { route } from '@/lib/server/route';
import { customerQuery, newCustomer } from '@/lib/shared/customer-request';
import { createCustomer, listCustomers, searchCustomers } from '@/services/customers';
import { customerJson } from '@/db/schema/customers';
import { customerHitJson } from '@/lib/server/answers/people';

/** With ?q=: the shop's customers found by name, phone, e-mail or ticket number; without: every one. */
export const GET = route(
  {
    summary: "The shop's customers; with q, those found by name, phone, e-mail or ticket number.",
    permission: ['customers', 'read'],
    query: z.object({ q: customerQuery.optional() }),
    examples: [{ summary: 'Every customer' }, { summary: 'Found by a phone number', query: { q: '555' } }],
    responses: { 200: z.union([z.array(customerJson), z.array(customerHitJson)]) },
  },
  ({ actor, query }) => (query.q === undefined ? listCustomers(actor) : searchCustomers(actor, query.q)),
);

/** Adds a customer (the same schema as intake's new customer: a blank e-mail is none). */
export const POST = route(
  {
    summary: 'Adds a customer (a blank e-mail is none).',
    permission: ['customers', 'create'],
    body: newCustomer,
    status: 201,
    examples: [{ summary: 'A walk-in with a phone number', body: { name: 'Rowan Example', phone: '555 0100' } }],
    responses: { 201: customerJson },
  },
  ({ actor, body }) => createCustomer(actor, body),
);
