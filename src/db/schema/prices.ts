// A shop's counter: its price list, the price lines on each ticket, and its counter settings
// (currency, opening hours, whether the ready notice goes out by itself).
import { sql } from 'drizzle-orm';
import { boolean, foreignKey, index, integer, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { createSelectSchema } from 'drizzle-zod';
import { asJson } from '../../lib/shared/as-json';
import { PRICE_KEYS } from '../../lib/pricing/price-keys';
import { organization, user } from './auth';
import { garments, tickets } from './tickets';

/** The shop's price list: one amount per priced piece of work, in integer minor units. */
export const priceItems = pgTable(
  'price_items',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id')
      .notNull()
      .references(() => organization.id, { onDelete: 'cascade' }),
    key: text('key', { enum: PRICE_KEYS }).notNull(),
    label: text('label').notNull(),
    amountMinor: integer('amount_minor').notNull(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [uniqueIndex('price_items_shop_key_uidx').on(t.shopId, t.key)],
);

/** Kinds of work the lead adds to the list beside the six worked-out lines ("Replace zip"): a flat
 * price each. Never deleted: a retired kind leaves the list, and the tickets that carry it keep their
 * lines (each line holds its own label and amount). Changes are audit events (`price-kind.*`). */
export const priceKinds = pgTable(
  'price_kinds',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id')
      .notNull()
      .references(() => organization.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    amountMinor: integer('amount_minor').notNull(),
    /** a ticket with this work pays the rush surcharge when rushed (see RUSH_RULE) */
    rushApplies: boolean('rush_applies').notNull().default(true),
    retiredAt: timestamp('retired_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).defaultNow().notNull(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).defaultNow().notNull(),
  },
  // One live kind per name in a shop: two "Replace zip" lines at the counter would be a guess.
  (t) => [
    index('price_kinds_shop_idx').on(t.shopId, t.createdAt),
    uniqueIndex('price_kinds_shop_id_uidx').on(t.shopId, t.id),
    uniqueIndex('price_kinds_live_name_uidx').on(t.shopId, sql`lower(${t.name})`).where(sql`retired_at is null`),
  ],
);

/** Counter settings of a shop; a shop without a row uses the defaults. */
export const counterSettings = pgTable('counter_settings', {
  shopId: text('shop_id')
    .primaryKey()
    .references(() => organization.id, { onDelete: 'cascade' }),
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
    shopId: text('shop_id')
      .notNull()
      .references(() => organization.id, { onDelete: 'cascade' }),
    ticketId: uuid('ticket_id')
      .notNull()
      .references(() => tickets.id, { onDelete: 'cascade' }),
    garmentId: uuid('garment_id').references(() => garments.id, { onDelete: 'set null' }),
    key: text('key', { enum: PRICE_KEYS }),
    /** the lead's kind of work this line was priced from (its label and amount copied when added) */
    kindId: uuid('kind_id'),
    /** for a kind's line: whether rush applied to that kind when the line was added (RUSH_RULE) */
    rushApplies: boolean('rush_applies'),
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
  (t) => [
    index('price_lines_ticket_idx').on(t.shopId, t.ticketId),
    // The kind must be the line's own shop's: the database refuses another shop's kind id too.
    foreignKey({ name: 'price_lines_shop_kind_fk', columns: [t.shopId, t.kindId], foreignColumns: [priceKinds.shopId, priceKinds.id] }),
  ],
);

/** A price line as the API returns it. */
export const priceLineRow = createSelectSchema(priceLines);
/** A price line as the API sends it (dates as ISO strings). */
export const priceLineJson = asJson(priceLineRow);
/** A price line. */
export type PriceLine = typeof priceLines.$inferSelect;
/** A kind of work on a shop's price list. */
export type PriceKind = typeof priceKinds.$inferSelect;
/** A shop's counter settings. */
export type CounterSettings = typeof counterSettings.$inferSelect;
