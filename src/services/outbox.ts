// The development outbox: messages the local SMTP capture saved as JSON under MAIL_CAPTURE_DIR.
import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';

/** One captured message. */
export interface CapturedMail {
  id: string;
  at: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
}

/** The newest captured messages addressed to any of the given people (newest first). */
export async function listCapturedMail(dir: string, recipients: string[], limit = 50): Promise<CapturedMail[]> {
  let names: string[];
  try {
    names = (await readdir(dir)).filter((n) => n.endsWith('.json'));
  } catch {
    return [];
  }
  const wanted = new Set(recipients.map((r) => r.toLowerCase()));
  const mails: CapturedMail[] = [];
  for (const name of names.sort().reverse()) {
    const mail = JSON.parse(await readFile(join(dir, name), 'utf8')) as CapturedMail;
    if (mail.to.some((t) => wanted.has(t.toLowerCase()))) mails.push(mail);
    if (mails.length >= limit) break;
  }
  return mails;
}
