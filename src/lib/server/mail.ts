// Outgoing e-mail over SMTP with nodemailer. Locally the host is the capture service started by
// npm start / dev / the tests; a real SMTP host is only a matter of SMTP_* variables.
// nodemailer is loaded at the first message, not at start-up.
import type { Transporter } from 'nodemailer';
import { MAIL_FROM, SMTP_HOST, SMTP_PASS, SMTP_PORT, SMTP_SECURE, SMTP_USER } from 'astro:env/server';
import { recordSentMail, type MailOrigin } from './sent-mail-record';

let transport: Promise<Transporter> | null = null;

/** The SMTP transport, made once at the first message. */
async function makeTransport(): Promise<Transporter> {
  const nodemailer = (await import('nodemailer')).default;
  return nodemailer.createTransport({
    host: SMTP_HOST,
    port: SMTP_PORT,
    secure: SMTP_SECURE,
    auth: SMTP_USER ? { user: SMTP_USER, pass: SMTP_PASS ?? '' } : undefined,
    // Bounded well inside a notice's send lease (services/notices.ts): a send either ends or fails
    // before another server may take it over.
    connectionTimeout: 30_000,
    greetingTimeout: 20_000,
    socketTimeout: 60_000,
  });
}

/** A message to send. */
export interface Mail {
  to: string;
  subject: string;
  text: string;
  /** files sent with it (a receipt's PDF) */
  attachments?: { filename: string; content: Buffer; contentType: string }[];
}

/** Sends one message and records which shop (if any) caused it; throws when the SMTP host refuses it. */
export async function sendMail(mail: Mail, origin: MailOrigin): Promise<void> {
  const info = await (await (transport ??= makeTransport())).sendMail({ from: MAIL_FROM, ...mail });
  try {
    await recordSentMail(origin, { to: mail.to, subject: mail.subject, messageId: info.messageId });
  } catch (e) {
    // The message is out: failing here would make a notice retry and send it twice. Unrecorded,
    // it is only missing from the shop's list, never shown to another shop.
    console.error('sent mail not recorded:', e);
  }
}
