// Saved plan settings: house presets kept by the lead (ownerId null) and each person's own.
import { sql } from 'drizzle-orm';
import { pgTable, text, timestamp, uuid, jsonb, index, boolean, uniqueIndex } from 'drizzle-orm/pg-core';
import { createSelectSchema } from 'drizzle-zod';
// Relative, not '@/': drizzle-kit reads this file without the app's path aliases.
import { presetSettings, type PresetSettings } from '../../lib/shared/preset-settings';
import { organization, user } from './auth';

/** Presets: named plan settings, either the shop's (ownerId null) or one person's. */
export const presets = pgTable(
  'presets',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id')
      .notNull()
      .references(() => organization.id, { onDelete: 'cascade' }),
    ownerId: text('owner_id').references(() => user.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    settings: jsonb('settings').$type<PresetSettings>().notNull(),
    // Only a house preset can be the default, and a shop has at most one (index below).
    isDefault: boolean('is_default').notNull().default(false),
    createdAt: timestamp('created_at', { withTimezone: true }).defaultNow().notNull(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [
    index('presets_shop_idx').on(t.shopId),
    uniqueIndex('presets_one_house_default_uidx').on(t.shopId).where(sql`${t.isDefault} and ${t.ownerId} is null`),
  ],
);

/** A preset row as read. */
export const presetRow = createSelectSchema(presets, { settings: () => presetSettings });

/** A preset row. */
export type Preset = typeof presets.$inferSelect;
