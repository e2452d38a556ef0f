// What the queue list of a shop stands at: one number per shop that moves, in the same transaction,
// with every write to a row the list shows. Database triggers (drizzle/0018_list-versions.sql) move
// it, not the services, so no write path (a script, raw SQL, a new service) can forget to.
import { bigint, pgTable, text } from 'drizzle-orm/pg-core';
import { organization } from './auth';

/** A shop's queue-list version (services/queue.ts): an unchanged number means an unchanged list. */
export const shopListVersions = pgTable('shop_list_versions', {
  shopId: text('shop_id')
    .primaryKey()
    .references(() => organization.id, { onDelete: 'cascade' }),
  /** microseconds since the epoch of the last change, or one more than before: never repeats, even across a restored database */
  version: bigint('version', { mode: 'bigint' }).notNull(),
});
