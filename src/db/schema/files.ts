// Stored files such as fitting photos and cut sheets (sketch: the bytes live under DATA_DIR).
import { pgTable, text, timestamp, uuid, integer, index } from 'drizzle-orm/pg-core';
import { organization, user } from './auth';
import { tickets } from './tickets';

/** Files attached to a shop's tickets. */
export const files = pgTable(
  'files',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id').notNull().references(() => organization.id, { onDelete: 'cascade' }),
    ticketId: uuid('ticket_id').references(() => tickets.id, { onDelete: 'cascade' }),
    kind: text('kind').notNull(),
    path: text('path').notNull(),
    mimeType: text('mime_type').notNull(),
    bytes: integer('bytes').notNull(),
    uploadedById: text('uploaded_by_id').references(() => user.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [index('files_shop_idx').on(t.shopId)],
);
