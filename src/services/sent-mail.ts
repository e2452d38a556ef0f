// A shop's sent messages: recorded with the shop that caused each one when it is handed to the
// SMTP host, listed only to that shop. Where mail goes to the local capture (MAIL_CAPTURE_DIR),
// each message's text is read back from the capture by its Message-ID.
import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { desc, eq } from 'drizzle-orm';
import { db } from '@/db';
import { sentMail, type SentMailKind } from '@/db/schema';

// Recording lives beside the mailer (lib/server/mail.ts sends, then records; lib never imports services).
export { recordSentMail, type MailOrigin } from '@/lib/server/sent-mail-record';

/** One message in a shop's list. */
export interface SentMessage {
  id: string;
  at: string;
  kind: SentMailKind;
  /** e-mail, or a text message */
  channel: 'email' | 'sms';
  to: string;
  subject: string;
  /** the text as the capture saved it; null when the capture no longer holds it */
  text: string | null;
}

// The capture saves one JSON file per message, named so that newest sorts last.
async function capturedTexts(dir: string, wanted: Set<string>): Promise<Map<string, string>> {
  const found = new Map<string, string>();
  let names: string[];
  try {
    names = (await readdir(dir)).filter((n) => n.endsWith('.json'));
  } catch {
    return found;
  }
  for (const name of names.sort().reverse()) {
    if (found.size === wanted.size) break;
    try {
      const mail = JSON.parse(await readFile(join(dir, name), 'utf8')) as { messageId?: string; text?: string };
      if (mail.messageId && wanted.has(mail.messageId)) found.set(mail.messageId, mail.text ?? '');
    } catch {
      /* a file another process is still writing: skipped */
    }
  }
  return found;
}

/** The newest messages this shop sent (newest first), with their text from the local capture. */
export async function listSentMail(shopId: string, captureDir: string, limit = 50): Promise<SentMessage[]> {
  const rows = await db.select().from(sentMail).where(eq(sentMail.shopId, shopId)).orderBy(desc(sentMail.sentAt)).limit(limit);
  const texts = await capturedTexts(captureDir, new Set(rows.filter((r) => r.channel === 'email').map((r) => r.messageId)));
  // A text's words are kept on its row: the mail capture never saw it.
  return rows.map((r) => ({
    id: r.id,
    at: r.sentAt.toISOString(),
    kind: r.kind,
    channel: r.channel,
    to: r.to,
    subject: r.subject,
    text: r.channel === 'sms' ? r.body : (texts.get(r.messageId) ?? null),
  }));
}
