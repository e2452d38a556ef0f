// A shop's customers: who brought the trousers in and how to reach them.
import { sql, type SQL } from 'drizzle-orm';
import { pgTable, text, timestamp, uuid, index } from 'drizzle-orm/pg-core';
import { createSelectSchema } from 'drizzle-zod';
import { asJson } from '../../lib/shared/as-json';
import { CONTACT_PREFERENCES } from '../../lib/shared/contact-channels';
import { organization } from './auth';

/** Customers, each belonging to one shop. */
export const customers = pgTable(
  'customers',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id')
      .notNull()
      .references(() => organization.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    phone: text('phone'),
    email: text('email'),
    notes: text('notes'),
    /** how the customer wants notices and pay links: e-mail, text message, or both */
    contactBy: text('contact_by', { enum: CONTACT_PREFERENCES }).notNull().default('email'),
    /** the phone's digits alone, so "555 0101", "(555) 0101" and "5550101" are found alike */
    phoneDigits: text('phone_digits').generatedAlwaysAs((): SQL => sql`regexp_replace(coalesce(${customers.phone}, ''), '[^0-9]', '', 'g')`),
    /** set when the customer asked to be forgotten: personal details cleared, money records kept */
    erasedAt: timestamp('erased_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).defaultNow().notNull(),
    // Moves on every change: the queue's ETag (services/queue.ts) shows the customer's name.
    updatedAt: timestamp('updated_at', { withTimezone: true })
      .defaultNow()
      .notNull()
      .$onUpdate(() => new Date()),
  },
  // Search as you type is a prefix match (LIKE 'q%'): text_pattern_ops lets these indexes serve it
  // whatever the collation; pg_trgm is not there on PGlite.
  (t) => [
    index('customers_shop_idx').on(t.shopId),
    index('customers_shop_name_idx').using('btree', t.shopId, sql`lower(${t.name}) text_pattern_ops`),
    index('customers_shop_email_idx').using('btree', t.shopId, sql`lower(${t.email}) text_pattern_ops`),
    index('customers_shop_phone_idx').using('btree', t.shopId, sql`${t.phoneDigits} text_pattern_ops`),
  ],
);

/** A customer row as read. */
export const customerRow = createSelectSchema(customers);
/** A customer as the API sends it (dates as ISO strings). */
export const customerJson = asJson(customerRow);

/** A customer as the API returns it. */
export type Customer = typeof customers.$inferSelect;
