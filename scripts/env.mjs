// The environment the scripts read (start, dev, durability), parsed once with zod.
import { z } from 'zod';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

/** The app's folder (the one above scripts/), whatever folder a script is started from. */
export const appDir = fileURLToPath(new URL('..', import.meta.url));

const schema = z.object({
  PORT: z.coerce.number().int().positive().default(4321),
  HOST: z.string().default('127.0.0.1'),
  // Relative to the folder started from; unset, the app's own data/ (as the server decides).
  DATA_DIR: z
    .string()
    .optional()
    .transform((d) => (d ? resolve(d) : join(appDir, 'data'))),
  DATABASE_URL: z.string().startsWith('postgres').optional(),
  // When SMTP_HOST names a real server, no capture is started and SMTP_* pass through unchanged.
  SMTP_HOST: z.string().optional(),
  SMTP_PORT: z.coerce.number().int().positive().default(1025),
  MAIL_CAPTURE_DIR: z.string().optional(),
  BETTER_AUTH_URL: z.url().optional(),
  BETTER_AUTH_SECRET: z.string().optional(),
  PAYMENTS_FAKE_PORT: z.coerce.number().int().positive().default(12111),
  // The local SMS stand-in (scripts/sms-fake.mjs), started unless SMS_ACCOUNT_SID names a real account.
  SMS_FAKE_PORT: z.coerce.number().int().positive().default(12112),
  SMS_ACCOUNT_SID: z.string().optional(),
  // The server's main-thread heap (old space, MB); the sheet workers keep their own 128 MB. See serverNodeFlags.
  SERVER_HEAP_MB: z.coerce.number().int().min(128).max(16_384).default(192),
});

/** The parsed script environment. */
export const env = schema.parse(process.env);

/** True when mail should go to the local capture (no real SMTP host configured). */
export const useCapture = !env.SMTP_HOST || env.SMTP_HOST === '127.0.0.1' || env.SMTP_HOST === 'localhost';

/** One line saying what to set when the server must not start (src/lib/server/deployment.ts has the
 * server's copy of this rule): a shared database needs a session secret from the environment. */
export function settingsProblem(e = env) {
  if (e.DATABASE_URL && (e.BETTER_AUTH_SECRET ?? '').length < 32) {
    return 'Cuffwright will not start: with DATABASE_URL set, set BETTER_AUTH_SECRET to the same random value of 32+ characters on every server (e.g. openssl rand -base64 32).';
  }
  return null;
}

/** The folder the local capture writes and the sent-messages page reads. */
export const captureDir = env.MAIL_CAPTURE_DIR || join(env.DATA_DIR, 'mail');

/**
 * Node's flags for the server process `npm start` runs. Left to V8's defaults, the main thread's
 * heap ran to 130-155 MB before its first full collection, holding the garbage of a burst of API
 * requests (500 garments made and fitted) while a batch of 500 sheets printed: the server peaked at
 * 557-634 MB, over the 600 MB goal (issue 12). Capped at 192 MB (its live set measured at most
 * 48-65 MB across `npm run bench`), V8 collects sooner: 533-550 MB (2026-12-05).
 */
export function serverNodeFlags(e = env) {
  return [`--max-old-space-size=${e.SERVER_HEAP_MB}`];
}
