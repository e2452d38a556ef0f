// The environment the scripts read (start, dev, durability), parsed once with zod.
import { z } from 'zod';
import { join } from 'node:path';

const schema = z.object({
  PORT: z.coerce.number().int().positive().default(4321),
  HOST: z.string().default('127.0.0.1'),
  DATA_DIR: z.string().default('./data'),
  DATABASE_URL: z.string().startsWith('postgres').optional(),
  // When SMTP_HOST names a real server, no capture is started and SMTP_* pass through unchanged.
  SMTP_HOST: z.string().optional(),
  SMTP_PORT: z.coerce.number().int().positive().default(1025),
  MAIL_CAPTURE_DIR: z.string().optional(),
  BETTER_AUTH_URL: z.url().optional(),
});

/** The parsed script environment. */
export const env = schema.parse(process.env);

/** True when mail should go to the local capture (no real SMTP host configured). */
export const useCapture = !env.SMTP_HOST || env.SMTP_HOST === '127.0.0.1' || env.SMTP_HOST === 'localhost';

/** The folder the local capture writes and the sent-messages page reads. */
export const captureDir = env.MAIL_CAPTURE_DIR || join(env.DATA_DIR, 'mail');
