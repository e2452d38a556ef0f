// Saved allowance settings: house presets (lead) and a tailor's own (sketch for the bench issue).
import { pgTable, text, timestamp, uuid, jsonb, index } from 'drizzle-orm/pg-core';
import { organization, user } from './auth';

/** Presets: named plan settings, either the shop's (ownerId null) or one tailor's. */
export const presets = pgTable(
  'presets',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id').notNull().references(() => organization.id, { onDelete: 'cascade' }),
    ownerId: text('owner_id').references(() => user.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    settings: jsonb('settings').notNull().default({}),
    createdAt: timestamp('created_at', { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [index('presets_shop_idx').on(t.shopId)],
);
