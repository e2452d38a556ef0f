// npm start and the local stand-ins refuse in one line, naming the setting to change: a taken
// port (mail capture, payment fake), or a shared database without a session secret.
import { spawn } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { createServer, type Server } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

let holder: Server;
let taken = 0;

beforeAll(async () => {
  holder = createServer();
  await new Promise<void>((r) => holder.listen(0, '127.0.0.1', () => r()));
  taken = (holder.address() as { port: number }).port;
});
afterAll(() => new Promise<void>((r) => holder.close(() => r())));

/** Runs a script with a clean environment plus `env`; resolves with its exit code and output. */
function run(script: string, env: Record<string, string>): Promise<{ code: number | null; stderr: string; stdout: string }> {
  const base = Object.fromEntries(
    Object.entries(process.env).filter(([k]) => !/^(DATABASE_URL|BETTER_AUTH_SECRET|PAYMENTS_|SMTP_|DEMO_DATA|MAIL_CAPTURE_DIR|PORT$)/.test(k)),
  );
  const child = spawn('node', [script], { env: { ...base, DATA_DIR: mkdtempSync(join(tmpdir(), 'cw-start-')), ...env }, stdio: ['ignore', 'pipe', 'pipe'] });
  let stdout = '';
  let stderr = '';
  child.stdout.on('data', (d) => (stdout += d));
  child.stderr.on('data', (d) => (stderr += d));
  // A script that does not refuse would go on to build and serve: stop it.
  const timer = setTimeout(() => child.kill('SIGKILL'), 20_000);
  return new Promise((resolve) =>
    child.on('exit', (code) => {
      clearTimeout(timer);
      resolve({ code, stdout, stderr });
    }),
  );
}

function expectOneLine(stderr: string, ...words: string[]) {
  const lines = stderr.trim().split('\n');
  expect(lines, stderr).toHaveLength(1);
  expect(stderr).not.toMatch(/^\s+at /m);
  for (const w of words) expect(stderr).toContain(w);
}

describe('a taken port', () => {
  it('mail capture: one line naming the port and SMTP_PORT', async () => {
    const r = await run('scripts/mail-capture.mjs', { SMTP_PORT: String(taken) });
    expect(r.code).toBe(1);
    expectOneLine(r.stderr, String(taken), 'SMTP_PORT');
  });

  it('payment fake: one line naming the port and PAYMENTS_FAKE_PORT', async () => {
    const r = await run('scripts/payments-fake.mjs', { PAYMENTS_FAKE_PORT: String(taken) });
    expect(r.code).toBe(1);
    expectOneLine(r.stderr, String(taken), 'PAYMENTS_FAKE_PORT');
  });

  it('npm start, mail capture port taken: one line naming SMTP_PORT', async () => {
    const r = await run('scripts/start.mjs', { SMTP_PORT: String(taken) });
    expect(r.code).toBe(1);
    expectOneLine(r.stderr, String(taken), 'SMTP_PORT');
  });

  it('npm start, payment fake port taken: one line naming PAYMENTS_FAKE_PORT', async () => {
    const r = await run('scripts/start.mjs', { SMTP_HOST: 'mail.example.org', PAYMENTS_FAKE_PORT: String(taken) });
    expect(r.code).toBe(1);
    expectOneLine(r.stderr, String(taken), 'PAYMENTS_FAKE_PORT');
  });
});

describe('a shared database', () => {
  it('npm start refuses DATABASE_URL without BETTER_AUTH_SECRET, in one line', async () => {
    const r = await run('scripts/start.mjs', {
      DATABASE_URL: 'postgres://shop@127.0.0.1:9/cuffwright',
      SMTP_HOST: 'mail.example.org',
      PAYMENTS_API_KEY: 'sk_test_unused',
    });
    expect(r.code).toBe(1);
    expectOneLine(r.stderr, 'BETTER_AUTH_SECRET');
  });
});
