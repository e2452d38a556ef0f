// Money taken for a ticket and given back: any number of payments up to what is due, refunds of
// a credit (money paid beyond the total), the online payment links, and the webhook events
// already processed.
import { index, integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { createSelectSchema } from 'drizzle-zod';
import { asJson } from '../../lib/shared/as-json';
import { organization, user } from './auth';
import { customers } from './customers';
import { tickets } from './tickets';

/** What a payment was when taken: `deposit` left money due, `balance` settled what was due. */
export const PAYMENT_PURPOSES = ['deposit', 'balance'] as const;
/** How it was paid: at the counter, online through a payment link, or from the customer's kept credit. */
export const PAYMENT_METHODS = ['cash', 'card', 'online', 'credit'] as const;

/** Payments received: several per ticket, each with who took it, how and when. */
export const payments = pgTable(
  'payments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id')
      .notNull()
      .references(() => organization.id, { onDelete: 'cascade' }),
    ticketId: uuid('ticket_id')
      .notNull()
      .references(() => tickets.id, { onDelete: 'cascade' }),
    purpose: text('purpose', { enum: PAYMENT_PURPOSES }).notNull(),
    method: text('method', { enum: PAYMENT_METHODS }).notNull(),
    amountMinor: integer('amount_minor').notNull(),
    currency: text('currency').notNull(),
    /** the payment service's session id for an online payment */
    reference: text('reference').unique(),
    takenById: text('taken_by_id').references(() => user.id, { onDelete: 'set null' }),
    at: timestamp('at', { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [index('payments_ticket_idx').on(t.shopId, t.ticketId)],
);

/** How a credit owed to the customer was settled: cash back, a card refund at the counter's
 * terminal, a refund of an online payment through the payment service, or kept as credit on the
 * customer for a later ticket. */
export const REFUND_METHODS = ['cash', 'card', 'online', 'credit'] as const;
/** A refund through the payment service is `pending` until the service confirms it (its answer or
 * its signed webhook); one it refuses is `failed` and gives the credit back. Others are `done` at once. */
export const REFUND_STATUSES = ['pending', 'done', 'failed'] as const;
/** The statuses of a refund that counts against the credit (money given back, or promised). */
export const COUNTED_REFUND_STATUSES = ['pending', 'done'] as const;

/** Money given back to the customer (or kept as their credit) out of a ticket's credit. */
export const refunds = pgTable(
  'refunds',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id')
      .notNull()
      .references(() => organization.id, { onDelete: 'cascade' }),
    ticketId: uuid('ticket_id')
      .notNull()
      .references(() => tickets.id, { onDelete: 'cascade' }),
    /** the customer a kept credit belongs to */
    customerId: uuid('customer_id').references(() => customers.id, { onDelete: 'set null' }),
    method: text('method', { enum: REFUND_METHODS }).notNull(),
    status: text('status', { enum: REFUND_STATUSES }).notNull(),
    amountMinor: integer('amount_minor').notNull(),
    currency: text('currency').notNull(),
    /** the online payment refunded through the service */
    paymentId: uuid('payment_id').references(() => payments.id, { onDelete: 'set null' }),
    /** the payment service's refund id */
    reference: text('reference').unique(),
    reason: text('reason'),
    failure: text('failure'),
    byId: text('by_id').references(() => user.id, { onDelete: 'set null' }),
    at: timestamp('at', { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [index('refunds_ticket_idx').on(t.shopId, t.ticketId), index('refunds_customer_idx').on(t.customerId)],
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
    shopId: text('shop_id')
      .notNull()
      .references(() => organization.id, { onDelete: 'cascade' }),
    ticketId: uuid('ticket_id')
      .notNull()
      .references(() => tickets.id, { onDelete: 'cascade' }),
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
/** A payment as the API sends it (dates as ISO strings). */
export const paymentJson = asJson(paymentRow);
/** A refund as the API sends it (dates as ISO strings). */
export const refundJson = asJson(createSelectSchema(refunds));
/** A payment. */
export type Payment = typeof payments.$inferSelect;
/** A refund (or credit kept on the customer). */
export type Refund = typeof refunds.$inferSelect;
/** A payment link. */
export type PaymentLink = typeof paymentLinks.$inferSelect;
