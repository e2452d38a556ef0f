// A shop's customers: who brought the trousers in and how to reach them.
import { pgTable, text, timestamp, uuid, index } from 'drizzle-orm/pg-core';
import { createInsertSchema, createSelectSchema } from 'drizzle-zod';
import { z } from 'zod';
import { text as safeText } from '../../lib/text';
import { organization } from './auth';

/** Customers, each belonging to one shop. */
export const customers = pgTable(
  'customers',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id').notNull().references(() => organization.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    phone: text('phone'),
    email: text('email'),
    notes: text('notes'),
    createdAt: timestamp('created_at', { withTimezone: true }).defaultNow().notNull(),
    // Moves on every change: the queue's ETag (services/queue.ts) shows the customer's name.
    updatedAt: timestamp('updated_at', { withTimezone: true }).defaultNow().notNull().$onUpdate(() => new Date()),
  },
  (t) => [index('customers_shop_idx').on(t.shopId)],
);

/** A customer row as read. */
export const customerRow = createSelectSchema(customers);

/** What a member types to add a customer (the shop comes from the session). */
export const customerInput = createInsertSchema(customers, {
  // text(): drizzle-zod's own strings let a NUL or a lone surrogate through to PostgreSQL.
  name: () => safeText().trim().min(1, 'Give the customer a name').max(120),
  phone: () => safeText().trim().max(40),
  email: () => z.email('Enter an e-mail address like name@example.com').max(200),
  notes: () => safeText().max(2000),
})
  .pick({ name: true, phone: true, email: true, notes: true })
  .partial({ phone: true, email: true, notes: true });

/** A customer as the API returns it. */
export type Customer = typeof customers.$inferSelect;
