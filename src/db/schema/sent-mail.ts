// Every message the app handed to the SMTP host, with the shop that caused it: a shop's list of
// sent messages is read from here (never by matching addresses a shop typed in, which anyone can).
import { index, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { CHANNELS } from '../../lib/shared/contact-channels';
import { organization } from './auth';

/** What a message was: shop mail (invitation, ready notice, receipt) or account mail (password reset). */
export const SENT_MAIL_KINDS = ['invitation', 'ready-notice', 'pay-link', 'receipt', 'password-reset'] as const;
/** A kind of sent message. */
export type SentMailKind = (typeof SENT_MAIL_KINDS)[number];

/** Messages accepted by the SMTP host. */
export const sentMail = pgTable(
  'sent_mail',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    /** the shop whose action sent it; null for account mail, which belongs to no shop's list */
    shopId: text('shop_id').references(() => organization.id, { onDelete: 'cascade' }),
    kind: text('kind', { enum: SENT_MAIL_KINDS }).notNull(),
    /** e-mail, or a text message handed to the SMS service */
    channel: text('channel', { enum: CHANNELS }).notNull().default('email'),
    to: text('to').notNull(),
    subject: text('subject').notNull(),
    /** the Message-ID header the SMTP host received (the local capture keeps it with the message), or the SMS service's message id */
    messageId: text('message_id').notNull(),
    /** a text message's words (no capture holds them); null for e-mail, read from the capture */
    body: text('body'),
    sentAt: timestamp('sent_at', { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [index('sent_mail_shop_idx').on(t.shopId, t.sentAt)],
);

/** A sent message as recorded. */
export type SentMail = typeof sentMail.$inferSelect;
