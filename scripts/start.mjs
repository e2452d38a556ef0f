// npm start: refuse unsafe settings, start the local mail capture (unless SMTP_HOST names a real
// host), the payment fake (unless PAYMENTS_API_KEY is set) and the SMS fake (unless SMS_ACCOUNT_SID is set), build if needed, then serve the
// built app on http://localhost:4321. Problems are told in one line naming the setting to change.
import { spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { createServer } from 'node:net';
import { buildIfNeeded } from './build-if-needed.mjs';
import { join } from 'node:path';
import { appDir, env, useCapture, captureDir, serverNodeFlags, settingsProblem } from './env.mjs';
import { listenOrExplain } from './port-taken.mjs';

const problem = settingsProblem();
if (problem) {
  console.error(problem);
  process.exit(1);
}
const serverEnv = {
  ...process.env,
  // React's production build and the same mode the bench measures (STACK.md pitfall 17).
  NODE_ENV: 'production',
  PORT: String(env.PORT),
  HOST: env.HOST,
  DATA_DIR: env.DATA_DIR,
  BETTER_AUTH_URL: env.BETTER_AUTH_URL || `http://localhost:${env.PORT}`,
};

/** Resolves when the port can be listened on (and frees it again); rejects as listen() would. */
function portFree(port) {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(port, '127.0.0.1', () => probe.close(() => resolve()));
  });
}

const mail = { port: env.SMTP_PORT, what: 'mail capture', setting: 'SMTP_PORT' };
const pay = { port: env.PAYMENTS_FAKE_PORT, what: 'local payment fake', setting: 'PAYMENTS_FAKE_PORT' };
const fakePayments = !process.env.PAYMENTS_API_KEY;
const sms = { port: env.SMS_FAKE_PORT, what: 'local SMS service', setting: 'SMS_FAKE_PORT' };
const fakeSms = !env.SMS_ACCOUNT_SID;
// Ports are checked before the build, so a taken one is told at once; the stand-ins themselves
// start beside the server (their modules cost half a second the server need not wait for).
if (useCapture) await listenOrExplain(portFree(mail.port), mail);
if (fakePayments) await listenOrExplain(portFree(pay.port), pay);
if (fakeSms) await listenOrExplain(portFree(sms.port), sms);
if (useCapture) Object.assign(serverEnv, { SMTP_HOST: '127.0.0.1', SMTP_PORT: String(mail.port), MAIL_CAPTURE_DIR: captureDir });
// Without a real payment service configured, payment links go to the local fake.
const payments = { apiKey: `sk_test_local_${randomBytes(12).toString('hex')}`, webhookSecret: `whsec_${randomBytes(24).toString('hex')}` };
if (fakePayments) {
  Object.assign(serverEnv, {
    PAYMENTS_API_KEY: payments.apiKey,
    PAYMENTS_API_BASE: `http://127.0.0.1:${pay.port}`,
    PAYMENTS_WEBHOOK_SECRET: payments.webhookSecret,
  });
}
// Without a real SMS account configured, texts go to the local fake (fresh account id and token).
const smsAccount = { accountSid: `AC${randomBytes(16).toString('hex')}`, authToken: randomBytes(16).toString('hex') };
if (fakeSms) {
  Object.assign(serverEnv, {
    SMS_ACCOUNT_SID: smsAccount.accountSid,
    SMS_AUTH_TOKEN: smsAccount.authToken,
    SMS_FROM: '+15005550006',
    SMS_API_BASE: `http://127.0.0.1:${sms.port}`,
  });
}
process.chdir(appDir);
buildIfNeeded('dist');
console.log(`Cuffwright on http://localhost:${env.PORT}`);
const server = spawn(process.execPath, [...serverNodeFlags(), join(appDir, 'dist/server/entry.mjs')], { stdio: 'inherit', env: serverEnv });
for (const sig of ['SIGINT', 'SIGTERM']) process.on(sig, () => server.kill(sig));
// A stand-in that cannot start after all (its port taken since the check) stops the server too.
process.on('exit', () => server.kill());
server.on('exit', (code) => process.exit(code ?? 0));

if (useCapture) {
  const { startMailCapture } = await import('./mail-capture.mjs');
  await listenOrExplain(startMailCapture({ dir: captureDir, port: mail.port }), mail);
  console.log(`Mail capture on smtp://127.0.0.1:${mail.port}: a shop's lead reads what the shop sent at /sent-messages`);
}
if (fakePayments) {
  const { startPaymentsFake } = await import('./payments-fake.mjs');
  const webhookUrl = new URL('/api/payments/webhook', `http://127.0.0.1:${env.PORT}`).toString();
  const { base } = await listenOrExplain(startPaymentsFake({ port: pay.port, ...payments, webhookUrl }), pay);
  console.log(`Local payment service (no real money) on ${base}`);
}
if (fakeSms) {
  const { startSmsFake } = await import('./sms-fake.mjs');
  const { base } = await listenOrExplain(startSmsFake({ port: sms.port, ...smsAccount }), sms);
  console.log(`Local SMS service (no text leaves the machine) on ${base}: what it was asked to send at ${base}/`);
}
