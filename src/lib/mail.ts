// Outgoing e-mail over SMTP with nodemailer. Locally the host is the capture service started by
// npm start / dev / the tests; a real SMTP host is only a matter of SMTP_* variables.
import nodemailer from 'nodemailer';
import { MAIL_FROM, SMTP_HOST, SMTP_PASS, SMTP_PORT, SMTP_SECURE, SMTP_USER } from 'astro:env/server';

const transport = nodemailer.createTransport({
  host: SMTP_HOST,
  port: SMTP_PORT,
  secure: SMTP_SECURE,
  auth: SMTP_USER ? { user: SMTP_USER, pass: SMTP_PASS ?? '' } : undefined,
});

/** A message to send. */
export interface Mail {
  to: string;
  subject: string;
  text: string;
}

/** Sends one message; throws when the SMTP host refuses it. */
export async function sendMail(mail: Mail): Promise<void> {
  await transport.sendMail({ from: MAIL_FROM, ...mail });
}
