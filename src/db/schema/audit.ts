// Who did what in a shop: one row per change worth answering for later.
import { pgTable, text, timestamp, uuid, jsonb, index } from 'drizzle-orm/pg-core';
import { organization, user } from './auth';

/** Audit events of a shop. */
export const auditEvents = pgTable(
  'audit_events',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: text('shop_id')
      .notNull()
      .references(() => organization.id, { onDelete: 'cascade' }),
    actorId: text('actor_id').references(() => user.id, { onDelete: 'set null' }),
    action: text('action').notNull(),
    subject: text('subject'),
    detail: jsonb('detail').notNull().default({}),
    at: timestamp('at', { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [index('audit_events_shop_idx').on(t.shopId, t.at), index('audit_events_subject_idx').on(t.shopId, t.subject)],
);
