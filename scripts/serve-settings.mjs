// The settings `npm run serve` (production) needs, checked before the server starts: every
// problem is told on its own line, naming the setting and what to put in it.
import { z } from 'zod';

const url = (what) => z.url({ error: `must be a URL (${what})` });
const schema = z.object({
  BETTER_AUTH_URL: url('the address people use to reach this server, e.g. https://shop.example.com').refine(
    (u) => /^https?:\/\//.test(u),
    'must start with http:// or https://',
  ),
  PORT: z.coerce.number({ error: 'must be a port number' }).int().min(1).max(65535).default(4321),
  HOST: z.string().min(1).default('0.0.0.0'),
  DATABASE_URL: z.string().startsWith('postgres', 'must be a postgres:// URL (unset: the embedded database in DATA_DIR)').optional(),
  BETTER_AUTH_SECRET: z.string().optional(),
  SMTP_HOST: z
    .string({ error: 'is required: the mail server that sends invitations, resets and notices' })
    .min(1, 'is required: the mail server that sends invitations, resets and notices'),
  STORAGE: z.enum(['disk', 's3'], { error: "must be 'disk' or 's3'" }).default('disk'),
  S3_BUCKET: z.string().optional(),
  S3_ACCESS_KEY_ID: z.string().optional(),
  S3_SECRET_ACCESS_KEY: z.string().optional(),
  PAYMENTS_API_KEY: z.string().optional(),
  PAYMENTS_WEBHOOK_SECRET: z.string().optional(),
  PAYMENTS_API_BASE: z.string().optional(),
  SMS_ACCOUNT_SID: z.string().optional(),
  SMS_AUTH_TOKEN: z.string().optional(),
  SMS_FROM: z.string().optional(),
  SMS_API_BASE: z.string().optional(),
});

/** Rules across settings, checked on the raw environment whatever the single settings say. */
function crossProblems(e) {
  const out = [];
  const add = (path, message) => out.push(`${path}: ${message}`);
  if (e.DATABASE_URL && (e.BETTER_AUTH_SECRET ?? '').length < 32)
    add('BETTER_AUTH_SECRET', 'is required with DATABASE_URL: the same random value of 32+ characters on every server (openssl rand -base64 32)');
  if (['127.0.0.1', 'localhost'].includes(e.SMTP_HOST ?? ''))
    add('SMTP_HOST', 'names this machine: the local mail capture is for npm start only; give the real mail server');
  if (e.STORAGE === 's3' && !e.S3_BUCKET) add('S3_BUCKET', 'is required with STORAGE=s3: the bucket photos are kept in');
  if (Boolean(e.S3_ACCESS_KEY_ID) !== Boolean(e.S3_SECRET_ACCESS_KEY)) add('S3_SECRET_ACCESS_KEY', 'and S3_ACCESS_KEY_ID go together: set both, or neither');
  if (e.PAYMENTS_API_KEY && !e.PAYMENTS_WEBHOOK_SECRET)
    add('PAYMENTS_WEBHOOK_SECRET', 'is required with PAYMENTS_API_KEY: the signing secret of the payment webhook');
  if (e.PAYMENTS_API_BASE) add('PAYMENTS_API_BASE', 'points payments at a local fake: unset it in production');
  // Texts are optional (without them notices go by e-mail, and the counter is told why); half set up is a mistake.
  const sms = ['SMS_ACCOUNT_SID', 'SMS_AUTH_TOKEN', 'SMS_FROM'].filter((k) => e[k]);
  if (sms.length > 0 && sms.length < 3)
    add(
      ['SMS_ACCOUNT_SID', 'SMS_AUTH_TOKEN', 'SMS_FROM'].find((k) => !e[k]),
      'goes with the other SMS settings: set SMS_ACCOUNT_SID, SMS_AUTH_TOKEN and SMS_FROM together, or none',
    );
  if (e.SMS_API_BASE) add('SMS_API_BASE', 'points text messages at a local fake: unset it in production');
  if (e.DATABASE_URL && e.STORAGE !== 's3') add('STORAGE', "should be 's3' with DATABASE_URL: photos on one server's disk are missing on the others");
  return out;
}

/** The problems with `env` as lines ("SETTING: what is wrong"), empty when it will serve. */
export function serveProblems(env = process.env) {
  const r = schema.safeParse(env);
  const single = r.success ? [] : r.error.issues.map((i) => `${i.path.join('.') || 'settings'}: ${i.message}`);
  return [...single, ...crossProblems(env)];
}
