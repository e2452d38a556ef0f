// npm run dev: the local mail capture, payment and SMS fakes, plus Astro's dev server (started directly: killing
// `npx astro dev` leaves astro running).
import { spawn } from 'node:child_process';
import { env, useCapture, captureDir } from './env.mjs';
import { startMailCapture } from './mail-capture.mjs';
import { startLocalPayments } from './payments-fake.mjs';
import { startLocalSms } from './sms-fake.mjs';
import { listenOrExplain } from './port-taken.mjs';

const devEnv = { ...process.env, BETTER_AUTH_URL: env.BETTER_AUTH_URL || `http://localhost:${env.PORT}` };
if (useCapture) {
  const { port } = await listenOrExplain(startMailCapture({ dir: captureDir, port: env.SMTP_PORT }), {
    port: env.SMTP_PORT,
    what: 'mail capture',
    setting: 'SMTP_PORT',
  });
  Object.assign(devEnv, { SMTP_HOST: '127.0.0.1', SMTP_PORT: String(port), MAIL_CAPTURE_DIR: captureDir });
  console.log(`Mail capture on smtp://127.0.0.1:${port}: a shop's lead reads what the shop sent at /sent-messages`);
}
if (!process.env.PAYMENTS_API_KEY) {
  const payments = await listenOrExplain(startLocalPayments({ appUrl: `http://127.0.0.1:${env.PORT}`, port: env.PAYMENTS_FAKE_PORT }), {
    port: env.PAYMENTS_FAKE_PORT,
    what: 'local payment fake',
    setting: 'PAYMENTS_FAKE_PORT',
  });
  Object.assign(devEnv, payments.env);
  console.log(`Local payment service (no real money) on ${payments.base}`);
}
if (!env.SMS_ACCOUNT_SID) {
  const sms = await listenOrExplain(startLocalSms({ port: env.SMS_FAKE_PORT }), {
    port: env.SMS_FAKE_PORT,
    what: 'local SMS service',
    setting: 'SMS_FAKE_PORT',
  });
  Object.assign(devEnv, sms.env);
  console.log(`Local SMS service (no text leaves the machine) on ${sms.base}: what it was asked to send at ${sms.base}/`);
}
const dev = spawn('node_modules/.bin/astro', ['dev', '--port', String(env.PORT), ...process.argv.slice(2)], { stdio: 'inherit', env: devEnv });
for (const sig of ['SIGINT', 'SIGTERM']) process.on(sig, () => dev.kill(sig));
dev.on('exit', (code) => process.exit(code ?? 0));
