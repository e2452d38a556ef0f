// Reads the mail the test server's local capture saved (inject('mailDir')).
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { inject } from 'vitest';

/** A captured message as scripts/mail-capture.mjs saves it. */
export interface Captured {
  to: string[];
  subject: string;
  text: string;
  attachments?: { filename: string; contentType: string; size: number }[];
}

/** Waits for the newest message to `to` and returns it. */
export async function waitForMail(to: string, ms = 10_000): Promise<Captured> {
  return waitForMailWith(to, () => true, ms);
}

/** Waits for the newest message to `to` that passes `test` and returns it. */
export async function waitForMailWith(to: string, test: (mail: Captured) => boolean, ms = 10_000): Promise<Captured> {
  const dir = inject('mailDir');
  const until = Date.now() + ms;
  while (Date.now() < until) {
    let names: string[] = [];
    try {
      names = readdirSync(dir)
        .filter((n) => n.endsWith('.json'))
        .sort()
        .reverse();
    } catch {
      /* no mail yet */
    }
    for (const name of names) {
      const mail = JSON.parse(readFileSync(join(dir, name), 'utf8')) as Captured;
      if (mail.to.includes(to) && test(mail)) return mail;
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail to ${to} within ${ms} ms`);
}

/** The first link in a message. */
export function firstLink(mail: Captured): string {
  const link = mail.text.match(/https?:\/\/\S+/)?.[0];
  if (!link) throw new Error(`no link in "${mail.subject}"`);
  return link;
}
