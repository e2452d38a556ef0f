// Which shop caused each message the SMTP host accepted, written by the mailer (mail.ts) right after
// the send; services/sent-mail.ts lists them per shop. Here, not in services, because lib never
// imports services (DEVELOPERS.md "Layers").
import { db } from '@/db';
import { sentMail, type SentMailKind } from '@/db/schema';

/** Who caused a message: a shop (its list shows it) or nobody (account mail: password reset). */
export interface MailOrigin {
  shopId: string | null;
  kind: SentMailKind;
}

/** Records a message the SMTP host (or, for a text, the SMS service with its words) accepted. */
export async function recordSentMail(
  origin: MailOrigin,
  mail: { to: string; subject: string; messageId: string; channel?: 'email' | 'sms'; body?: string },
): Promise<void> {
  await db.insert(sentMail).values({
    shopId: origin.shopId,
    kind: origin.kind,
    to: mail.to,
    subject: mail.subject,
    messageId: mail.messageId,
    channel: mail.channel ?? 'email',
    body: mail.body ?? null,
  });
}
