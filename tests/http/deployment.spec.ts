// The built server outside the demo: it refuses a shared database without a session secret (one
// line, exit 1), and starts without the demo shop when asked (DEMO_DATA=off) or on PostgreSQL
// by default. Each case runs its own server from the same build.
import { spawn, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { createServerDatabase, dropServerDatabase } from '../db/server-database';
import { DEMO, DEMO_PASSWORD } from './client';

const entry = `${process.env.TEST_DIST_DIR || '.test-dist'}/server/entry.mjs`;
const cleanups: (() => Promise<void> | void)[] = [];
afterEach(async () => {
  // Last made, first undone: the server stops before its database is dropped.
  for (const c of cleanups.splice(0).reverse()) await c();
});

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const s = createServer();
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });
}

/** Starts the built server with `env` on a fresh data folder; answers its address and output. */
async function serve(env: Record<string, string>) {
  const port = await freePort();
  const dataDir = mkdtempSync(join(tmpdir(), 'cw-deploy-'));
  const base = `http://localhost:${port}`;
  const clean = Object.fromEntries(Object.entries(process.env).filter(([k]) => !/^(DATABASE_URL|BETTER_AUTH_SECRET|DEMO_DATA)$/.test(k)));
  const child: ChildProcess = spawn('node', [entry], {
    env: {
      ...clean,
      NODE_ENV: 'production',
      PORT: String(port),
      HOST: '127.0.0.1',
      DATA_DIR: dataDir,
      BETTER_AUTH_URL: base,
      SMTP_PORT: '9',
      NOTICE_TICK_SECONDS: '0',
      ...env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let stderr = '';
  child.stderr!.on('data', (d) => (stderr += d));
  const exited = new Promise<number | null>((r) => child.on('exit', (code) => r(code)));
  cleanups.push(async () => {
    child.kill('SIGTERM');
    await Promise.race([exited, new Promise((r) => setTimeout(r, 5000))]);
    rmSync(dataDir, { recursive: true, force: true });
  });
  return { base, exited, stderr: () => stderr };
}

async function firstAnswer(base: string, exited: Promise<number | null>): Promise<Response | 'exited'> {
  for (let i = 0; i < 240; i += 1) {
    try {
      return await fetch(`${base}/sign-up`);
    } catch {
      const done = await Promise.race([exited.then(() => true), new Promise((r) => setTimeout(() => r(false), 250))]);
      if (done) return 'exited';
    }
  }
  throw new Error('server did not answer');
}

async function demoSignIn(base: string): Promise<number> {
  const r = await fetch(`${base}/api/auth/sign-in/email`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base },
    body: JSON.stringify({ email: DEMO.lead, password: DEMO_PASSWORD }),
  });
  return r.status;
}

// A fresh embedded database takes a while to set up on a loaded machine.
describe('the built server outside the demo', { timeout: 180_000 }, () => {
  it('refuses DATABASE_URL without BETTER_AUTH_SECRET: one line, exit 1, nothing served', async () => {
    const s = await serve({ DATABASE_URL: 'postgres://shop@127.0.0.1:9/cuffwright' });
    const answer = await firstAnswer(s.base, s.exited).catch(() => 'exited' as const);
    if (answer !== 'exited') expect(answer.status).not.toBe(200);
    expect(await s.exited).toBe(1);
    const lines = s.stderr().trim().split('\n');
    expect(lines, s.stderr()).toHaveLength(1);
    expect(lines[0]).toContain('BETTER_AUTH_SECRET');
  });

  it('DEMO_DATA=off: an empty embedded database stays empty (no demo accounts), and sign-up works', async () => {
    const s = await serve({ DEMO_DATA: 'off' });
    const answer = await firstAnswer(s.base, s.exited);
    expect(answer !== 'exited' && answer.status).toBe(200);
    expect(await demoSignIn(s.base)).toBe(401);
    const signUp = await fetch(`${s.base}/api/shops`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: s.base },
      body: JSON.stringify({ shopName: 'Fresh Start Hems', name: 'First Lead', email: 'first@example.com', password: 'a-long-password' }),
    });
    expect(signUp.status).toBe(201);
  });

  it.skipIf(!process.env.TEST_DATABASE_URL)('on PostgreSQL the demo is off unless asked for', async () => {
    const name = `cw_nodemo_${Date.now().toString(36)}`;
    const url = await createServerDatabase(process.env.TEST_DATABASE_URL!, name);
    cleanups.push(() => dropServerDatabase(process.env.TEST_DATABASE_URL!, name));
    const s = await serve({ DATABASE_URL: url, BETTER_AUTH_SECRET: randomBytes(32).toString('base64url') });
    const answer = await firstAnswer(s.base, s.exited);
    expect(answer !== 'exited' && answer.status).toBe(200);
    expect(await demoSignIn(s.base)).toBe(401);
  });
});
