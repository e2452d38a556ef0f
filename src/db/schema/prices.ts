// A shop's counter: its price list, the price lines on each ticket, and its counter settings
// (currency, opening hours, whether the ready notice goes out by itself).
import { boolean, index, integer, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { createSelectSchema } from 'drizzle-zod';
import { PRICE_KEYS } from '../../lib/pricing/price-keys';
import { organization, user } from './auth';
import { garments, tickets } from './tickets';

/** The shop's price list: one amount per priced piece of work, in integer minor units. */
export const priceItems = pgTable(
  'price_items',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id').notNull().references(() => organization.id, { onDelete: 'cascade' }),
    key: text('key', { enum: PRICE_KEYS }).notNull(),
    label: text('label').notNull(),
    amountMinor: integer('amount_minor').notNull(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [uniqueIndex('price_items_shop_key_uidx').on(t.shopId, t.key)],
);

/** Counter settings of a shop; a shop without a row uses the defaults. */
export const counterSettings = pgTable('counter_settings', {
  shopId: text('shop_id').primaryKey().references(() => organization.id, { onDelete: 'cascade' }),
  currency: text('currency').notNull().default('EUR'),
  hours: text('hours').notNull().default(''),
  location: text('location').notNull().default(''),
  autoReadyNotice: boolean('auto_ready_notice').notNull().default(false),
  /** tickets that became ready before this moment never get an automatic notice */
  autoReadySince: timestamp('auto_ready_since', { withTimezone: true }),
  updatedAt: timestamp('updated_at', { withTimezone: true }).defaultNow().notNull(),
});

/** How a line came onto a ticket: worked out from the garments, picked from the list, adjusted, or
 * "no charge" (0.00 with its reason: work handed over without a price, said so on purpose). */
export const LINE_SOURCES = ['auto', 'list', 'adjust', 'no-charge'] as const;

/** The priced lines of a ticket; its total is the sum of those not voided. A wrong line is voided
 * with a reason, never deleted: it stays on the ticket, struck through. */
export const priceLines = pgTable(
  'price_lines',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id').notNull().references(() => organization.id, { onDelete: 'cascade' }),
    ticketId: uuid('ticket_id').notNull().references(() => tickets.id, { onDelete: 'cascade' }),
    garmentId: uuid('garment_id').references(() => garments.id, { onDelete: 'set null' }),
    key: text('key', { enum: PRICE_KEYS }),
    source: text('source', { enum: LINE_SOURCES }).notNull(),
    label: text('label').notNull(),
    amountMinor: integer('amount_minor').notNull(),
    /** required for an adjustment: why the counter changed the price */
    reason: text('reason'),
    createdById: text('created_by_id').references(() => user.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).defaultNow().notNull(),
    voidedAt: timestamp('voided_at', { withTimezone: true }),
    voidedById: text('voided_by_id').references(() => user.id, { onDelete: 'set null' }),
    voidReason: text('void_reason'),
  },
  (t) => [index('price_lines_ticket_idx').on(t.shopId, t.ticketId)],
);

/** A price line as the API returns it. */
export const priceLineRow = createSelectSchema(priceLines);
/** A price line. */
export type PriceLine = typeof priceLines.$inferSelect;
/** A shop's counter settings. */
export type CounterSettings = typeof counterSettings.$inferSelect;
