// npm start: refuse unsafe settings, start the local mail capture (unless SMTP_HOST names a real
// host) and the payment fake (unless PAYMENTS_API_KEY is set), build if needed, then serve the
// built app on http://localhost:4321. Problems are told in one line naming the setting to change.
import { spawn } from 'node:child_process';
import { buildIfNeeded } from './build-if-needed.mjs';
import { env, useCapture, captureDir, settingsProblem } from './env.mjs';
import { startMailCapture } from './mail-capture.mjs';
import { startLocalPayments } from './payments-fake.mjs';
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
  BETTER_AUTH_URL: env.BETTER_AUTH_URL || `http://localhost:${env.PORT}`,
};
// The stand-ins start before the build, so a taken port is told at once.
if (useCapture) {
  const { port } = await listenOrExplain(startMailCapture({ dir: captureDir, port: env.SMTP_PORT }), { port: env.SMTP_PORT, what: 'mail capture', setting: 'SMTP_PORT' });
  Object.assign(serverEnv, { SMTP_HOST: '127.0.0.1', SMTP_PORT: String(port), MAIL_CAPTURE_DIR: captureDir });
  console.log(`Mail capture on smtp://127.0.0.1:${port}: a shop's lead reads what the shop sent at /sent-messages`);
}
// Without a real payment service configured, payment links go to the local fake.
if (!process.env.PAYMENTS_API_KEY) {
  const payments = await listenOrExplain(startLocalPayments({ appUrl: `http://127.0.0.1:${env.PORT}`, port: env.PAYMENTS_FAKE_PORT }), {
    port: env.PAYMENTS_FAKE_PORT,
    what: 'local payment fake',
    setting: 'PAYMENTS_FAKE_PORT',
  });
  Object.assign(serverEnv, payments.env);
  console.log(`Local payment service (no real money) on ${payments.base}`);
}
buildIfNeeded('dist');
console.log(`Cuffwright on http://localhost:${env.PORT}`);
const server = spawn('node', ['dist/server/entry.mjs'], { stdio: 'inherit', env: serverEnv });
for (const sig of ['SIGINT', 'SIGTERM']) process.on(sig, () => server.kill(sig));
server.on('exit', (code) => process.exit(code ?? 0));
