// The fitting of a garment fitted once, not per leg (a skirt or dress; later sleeves): one row per
// garment, each length as typed and in exact mm, like measurements.values.
import { jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { organization, user } from './auth';
import { garments } from './tickets';

/** One whole-garment fitting per garment (garments.kind says which kind's fields it holds). */
export const kindFittings = pgTable(
  'kind_fittings',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id')
      .notNull()
      .references(() => organization.id, { onDelete: 'cascade' }),
    garmentId: uuid('garment_id')
      .notNull()
      .references(() => garments.id, { onDelete: 'cascade' }),
    /** the kind the fields belong to, as saved (a garment's kind is fixed at intake) */
    kind: text('kind').notNull(),
    unit: text('unit', { enum: ['in', 'cm', 'mm'] })
      .notNull()
      .default('in'),
    /** { field: { text, mm } } for each length given */
    values: jsonb('values').notNull().default({}),
    /** { field: text } for each choice and plain number given (the flare's way, a circle's fraction) */
    choices: jsonb('choices').notNull().default({}),
    takenById: text('taken_by_id').references(() => user.id, { onDelete: 'set null' }),
    takenAt: timestamp('taken_at', { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [uniqueIndex('kind_fittings_garment_uidx').on(t.garmentId)],
);

/** A whole-garment fitting as stored. */
export type KindFittingRow = typeof kindFittings.$inferSelect;
