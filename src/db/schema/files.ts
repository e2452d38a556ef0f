// Stored files such as fitting photos: the bytes live in the storage (src/lib/server/storage), keyed by
// `path`; the sanitised original name is kept only to show.
import { pgTable, text, timestamp, uuid, integer, index } from 'drizzle-orm/pg-core';
import { createSelectSchema } from 'drizzle-zod';
import { organization, user } from './auth';
import { garments, tickets } from './tickets';

/** What a stored file is for. */
export const FILE_KINDS = ['fitting-photo'] as const;

/** Files attached to a shop's tickets and garments. */
export const files = pgTable(
  'files',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id')
      .notNull()
      .references(() => organization.id, { onDelete: 'cascade' }),
    ticketId: uuid('ticket_id').references(() => tickets.id, { onDelete: 'cascade' }),
    garmentId: uuid('garment_id').references(() => garments.id, { onDelete: 'cascade' }),
    kind: text('kind', { enum: FILE_KINDS }).notNull(),
    path: text('path').notNull(),
    mimeType: text('mime_type').notNull(),
    bytes: integer('bytes').notNull(),
    originalName: text('original_name'),
    // A smaller WebP for the thumbnail strip; null when the image could not be decoded here (HEIC).
    thumbPath: text('thumb_path'),
    uploadedById: text('uploaded_by_id').references(() => user.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [index('files_shop_idx').on(t.shopId), index('files_garment_idx').on(t.garmentId)],
);

/** A file row as read. */
export const fileRow = createSelectSchema(files);

/** A stored file row. */
export type StoredFile = typeof files.$inferSelect;
