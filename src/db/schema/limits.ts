// Rate-limit counters shared by every server process: one row per key (what is limited, and for
// whom: an account, a client address, both), so several processes on one database count together.
import { index, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';

/** Counters of the limits (src/services/rate-limits.ts); rows past expires_at are swept. */
export const rateLimits = pgTable(
  'rate_limits',
  {
    /** e.g. "signin:acct:<email>", "sheet:addr:<address>" */
    key: text('key').primaryKey(),
    count: integer('count').notNull().default(0),
    windowStart: timestamp('window_start', { withTimezone: true }).notNull(),
    lastAt: timestamp('last_at', { withTimezone: true }).notNull(),
    /** after this the row means nothing and the sweep deletes it */
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
  },
  (t) => [index('rate_limits_expires_idx').on(t.expiresAt)],
);
