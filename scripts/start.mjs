// npm start: build if needed, start the local mail capture (unless SMTP_HOST names a real host),
// then serve the built app on http://localhost:4321.
import { spawn } from 'node:child_process';
import { buildIfNeeded } from './build-if-needed.mjs';
import { env, useCapture, captureDir } from './env.mjs';
import { startMailCapture } from './mail-capture.mjs';
import { startLocalPayments } from './payments-fake.mjs';

buildIfNeeded('dist');
const serverEnv = {
  ...process.env,
  PORT: String(env.PORT),
  HOST: env.HOST,
  BETTER_AUTH_URL: env.BETTER_AUTH_URL || `http://localhost:${env.PORT}`,
};
if (useCapture) {
  const { port } = await startMailCapture({ dir: captureDir, port: env.SMTP_PORT });
  Object.assign(serverEnv, { SMTP_HOST: '127.0.0.1', SMTP_PORT: String(port), MAIL_CAPTURE_DIR: captureDir });
  console.log(`Mail capture on smtp://127.0.0.1:${port}: a shop's lead reads what the shop sent at /sent-messages`);
}
// Without a real payment service configured, payment links go to the local fake.
if (!process.env.PAYMENTS_API_KEY) {
  const payments = await startLocalPayments({ appUrl: `http://127.0.0.1:${env.PORT}`, port: Number(process.env.PAYMENTS_FAKE_PORT || 12111) });
  Object.assign(serverEnv, payments.env);
  console.log(`Local payment service (no real money) on ${payments.base}`);
}
console.log(`Cuffwright on http://localhost:${env.PORT}`);
const server = spawn('node', ['dist/server/entry.mjs'], { stdio: 'inherit', env: serverEnv });
for (const sig of ['SIGINT', 'SIGTERM']) process.on(sig, () => server.kill(sig));
server.on('exit', (code) => process.exit(code ?? 0));
