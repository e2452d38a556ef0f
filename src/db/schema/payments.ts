// Money taken for a ticket: at most one deposit and one balance payment each (so a paid balance
// cannot be paid again), the online payment links, and the webhook events already processed.
import { index, integer, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { createSelectSchema } from 'drizzle-zod';
import { organization, user } from './auth';
import { tickets } from './tickets';

/** What a payment is for. */
export const PAYMENT_PURPOSES = ['deposit', 'balance'] as const;
/** How it was paid: at the counter, or online through a payment link. */
export const PAYMENT_METHODS = ['cash', 'card', 'online'] as const;

/** Payments received, one per ticket and purpose. */
export const payments = pgTable(
  'payments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id').notNull().references(() => organization.id, { onDelete: 'cascade' }),
    ticketId: uuid('ticket_id').notNull().references(() => tickets.id, { onDelete: 'cascade' }),
    purpose: text('purpose', { enum: PAYMENT_PURPOSES }).notNull(),
    method: text('method', { enum: PAYMENT_METHODS }).notNull(),
    amountMinor: integer('amount_minor').notNull(),
    currency: text('currency').notNull(),
    /** the payment service's session id for an online payment */
    reference: text('reference').unique(),
    takenById: text('taken_by_id').references(() => user.id, { onDelete: 'set null' }),
    at: timestamp('at', { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [uniqueIndex('payments_ticket_purpose_uidx').on(t.ticketId, t.purpose)],
);

/** Where an online payment link stands: `creating` while the service is asked for it (no session
 * yet), `expiring` while the service is asked to close it (still payable until it confirms),
 * `failed` when it was never made (or made and closed again at once). */
export const LINK_STATUSES = ['creating', 'open', 'expiring', 'paid', 'expired', 'failed'] as const;
/** The statuses of a link the customer may have been given and could still pay. */
export const LIVE_LINK_STATUSES = ['open', 'expiring'] as const;

/** Payment links made with the payment service for a ticket's balance; the service is called
 * between two short transactions, never inside one (see `src/services/counter/payment-links.ts`). */
export const paymentLinks = pgTable(
  'payment_links',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id').notNull().references(() => organization.id, { onDelete: 'cascade' }),
    ticketId: uuid('ticket_id').notNull().references(() => tickets.id, { onDelete: 'cascade' }),
    /** null until the service has made the session */
    sessionId: text('session_id').unique(),
    url: text('url'),
    amountMinor: integer('amount_minor').notNull(),
    currency: text('currency').notNull(),
    status: text('status', { enum: LINK_STATUSES }).notNull().default('open'),
    createdById: text('created_by_id').references(() => user.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).defaultNow().notNull(),
    /** the exact session request, so a creation cut short can be replayed under its idempotency key and closed */
    request: jsonb('request').$type<Record<string, unknown>>(),
  },
  (t) => [index('payment_links_ticket_idx').on(t.shopId, t.ticketId)],
);

/** Webhook events already acted on: the id is unique, so a replay is refused. */
export const paymentEvents = pgTable('payment_events', {
  id: text('id').primaryKey(),
  type: text('type').notNull(),
  receivedAt: timestamp('received_at', { withTimezone: true }).defaultNow().notNull(),
});

/** A payment as the API returns it. */
export const paymentRow = createSelectSchema(payments);
/** A payment. */
export type Payment = typeof payments.$inferSelect;
/** A payment link. */
export type PaymentLink = typeof paymentLinks.$inferSelect;
