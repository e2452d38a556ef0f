// A shop's jobs: a ticket per visit, the garments on it and their fitting measurements.
import { pgTable, text, timestamp, uuid, index, integer, jsonb, date } from 'drizzle-orm/pg-core';
import { createInsertSchema, createSelectSchema } from 'drizzle-zod';
import { z } from 'zod';
import { organization, user } from './auth';
import { customers } from './customers';

/** Where a job stands, intake to pickup; the middle four are the bench steps. */
export const TICKET_STATUSES = ['intake', 'queued', 'cutting', 'sewing', 'pressing', 'ready', 'collected'] as const;
/** A ticket status. */
export type TicketStatus = (typeof TICKET_STATUSES)[number];

/** Tickets: one per customer visit, carried from intake to pickup. */
export const tickets = pgTable(
  'tickets',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id').notNull().references(() => organization.id, { onDelete: 'cascade' }),
    customerId: uuid('customer_id').references(() => customers.id, { onDelete: 'set null' }),
    status: text('status', { enum: TICKET_STATUSES }).notNull().default('intake'),
    assigneeId: text('assignee_id').references(() => user.id, { onDelete: 'set null' }),
    dueOn: date('due_on'),
    note: text('note'),
    createdById: text('created_by_id').references(() => user.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).defaultNow().notNull(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [index('tickets_shop_status_idx').on(t.shopId, t.status)],
);

/** Garments on a ticket (sketch: the bench issue fills in the details). */
export const garments = pgTable('garments', {
  id: uuid('id').primaryKey().defaultRandom(),
  shopId: text('shop_id').notNull().references(() => organization.id, { onDelete: 'cascade' }),
  ticketId: uuid('ticket_id').notNull().references(() => tickets.id, { onDelete: 'cascade' }),
  kind: text('kind').notNull().default('trousers'),
  finish: text('finish'),
  description: text('description'),
  position: integer('position').notNull().default(0),
});

/** Fitting measurements taken on a garment (sketch: the plan inputs, as the engine reads them). */
export const measurements = pgTable('measurements', {
  id: uuid('id').primaryKey().defaultRandom(),
  shopId: text('shop_id').notNull().references(() => organization.id, { onDelete: 'cascade' }),
  garmentId: uuid('garment_id').notNull().references(() => garments.id, { onDelete: 'cascade' }),
  unit: text('unit').notNull().default('in'),
  values: jsonb('values').notNull().default({}),
  takenById: text('taken_by_id').references(() => user.id, { onDelete: 'set null' }),
  takenAt: timestamp('taken_at', { withTimezone: true }).defaultNow().notNull(),
});

/** A ticket row as read. */
export const ticketRow = createSelectSchema(tickets);

/** What intake types to open a ticket. */
export const ticketInput = createInsertSchema(tickets, {
  note: (s) => s.max(2000),
  dueOn: () => z.iso.date('Use a date like 2026-03-14'),
}).pick({ customerId: true, note: true, dueOn: true });

/** A move of a ticket to another status. */
export const ticketStatusInput = ticketRow.pick({ status: true });

/** A ticket as the API returns it. */
export type Ticket = typeof tickets.$inferSelect;
