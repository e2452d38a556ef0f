// Messages to customers about their tickets (the ready notice), each with its delivery state so
// a failed send stays visible and is retried.
import { index, integer, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { createSelectSchema } from 'drizzle-zod';
import { asJson } from '../../lib/shared/as-json';
import { CHANNELS } from '../../lib/shared/contact-channels';
import { organization, user } from './auth';
import { tickets } from './tickets';

/** Kinds of notice: the ready notice (one per ticket, then any re-sends of it, numbered by
 * `sequence`) and the pay link sent from the counter (numbered the same way). */
export const NOTICE_KINDS = ['ready', 'pay-link'] as const;
/** What the SMS service last reported of a text (its status callback); null before any report. */
export const DELIVERY_REPORTS = ['delivered', 'undelivered', 'failed'] as const;
/** Delivery states: waiting, delivered to the mail server, or failed (retried until it gives up). */
export const NOTICE_STATUSES = ['queued', 'sent', 'failed'] as const;

/** Notices to customers. */
export const notices = pgTable(
  'notices',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id')
      .notNull()
      .references(() => organization.id, { onDelete: 'cascade' }),
    ticketId: uuid('ticket_id')
      .notNull()
      .references(() => tickets.id, { onDelete: 'cascade' }),
    kind: text('kind', { enum: NOTICE_KINDS }).notNull(),
    /** 1 for the first notice of its kind, 2 for the first re-send, and so on: each send keeps its own delivery state */
    sequence: integer('sequence').notNull().default(1),
    /** e-mail or text message (SMS); one row per channel of a send */
    channel: text('channel', { enum: CHANNELS }).notNull().default('email'),
    /** the e-mail address, or the phone number of a text */
    to: text('to').notNull(),
    subject: text('subject').notNull(),
    body: text('body').notNull(),
    status: text('status', { enum: NOTICE_STATUSES }).notNull().default('queued'),
    attempts: integer('attempts').notNull().default(0),
    lastError: text('last_error'),
    nextAttemptAt: timestamp('next_attempt_at', { withTimezone: true }),
    sentAt: timestamp('sent_at', { withTimezone: true }),
    /** why this went otherwise than the customer prefers (texts not set up, no phone number) */
    note: text('note'),
    /** the SMS service's id of the text: its status callback names it */
    providerId: text('provider_id'),
    /** the last delivery report of a text, from the service's signed status callback */
    delivery: text('delivery', { enum: DELIVERY_REPORTS }),
    deliveryError: text('delivery_error'),
    deliveryAt: timestamp('delivery_at', { withTimezone: true }),
    /** null when the shop's setting sent it by itself */
    createdById: text('created_by_id').references(() => user.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [
    uniqueIndex('notices_ticket_kind_channel_seq_uidx').on(t.ticketId, t.kind, t.channel, t.sequence),
    index('notices_provider_idx').on(t.providerId),
    index('notices_due_idx').on(t.status, t.nextAttemptAt),
  ],
);

/** A notice as the API returns it. */
export const noticeRow = createSelectSchema(notices);
/** A notice as the API sends it (dates as ISO strings). */
export const noticeJson = asJson(noticeRow);
/** A notice. */
export type Notice = typeof notices.$inferSelect;
