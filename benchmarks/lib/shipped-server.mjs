// Starts the app the way `npm start` does (scripts/start.mjs: production build, mail capture and
// payment fake), on free ports and a throwaway data folder, for benchmarks that measure what users run.
import { spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildIfNeeded } from '../../scripts/build-if-needed.mjs';

/** A free TCP port on 127.0.0.1. */
export function freePort() {
  return new Promise((resolve, reject) => {
    const s = createServer().listen(0, '127.0.0.1', () => {
      const { port } = s.address();
      s.close(() => resolve(port));
    });
    s.on('error', reject);
  });
}

const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

/**
 * Runs `node scripts/start.mjs` with its own ports and data folder (`dataDir` to reuse one, e.g.
 * existing data). Resolves once GET / answers 200, with the base URL, the milliseconds from spawn to
 * that first 200, the server process's pid (the child of start.mjs) and stop().
 */
export async function startShipped({ dataDir, env = {}, timeoutMs = 180_000, quiet = true } = {}) {
  buildIfNeeded('dist');
  const ownDir = !dataDir;
  const dir = dataDir ?? mkdtempSync(join(tmpdir(), 'cuffwright-bench-'));
  // Every stand-in on its own free port: two benchmarks (or helpers) may run at once.
  const [port, smtp, pay, sms] = [await freePort(), await freePort(), await freePort(), await freePort()];
  const base = `http://localhost:${port}`;
  const t0 = performance.now();
  const child = spawn('node', ['scripts/start.mjs'], {
    stdio: quiet ? ['ignore', 'ignore', 'inherit'] : 'inherit',
    env: {
      ...process.env,
      PORT: String(port),
      HOST: '127.0.0.1',
      DATA_DIR: dir,
      SMTP_PORT: String(smtp),
      PAYMENTS_FAKE_PORT: String(pay),
      SMS_FAKE_PORT: String(sms),
      BETTER_AUTH_URL: base,
      ...env,
    },
  });
  let exited = null;
  child.on('exit', (code) => (exited = code));
  for (;;) {
    if (exited != null) throw new Error(`npm start exited with ${exited} before answering`);
    if (performance.now() - t0 > timeoutMs) throw new Error(`no 200 from ${base}/ in ${timeoutMs} ms`);
    const ok = await fetch(`${base}/`).then(
      async (r) => (await r.arrayBuffer(), r.status === 200),
      () => false,
    );
    if (ok) break;
    await sleep(20);
  }
  const firstOkMs = performance.now() - t0;
  const stop = async () => {
    if (exited == null) {
      child.kill('SIGTERM');
      await new Promise((r) => (exited != null ? r() : child.once('exit', r)));
    }
    if (ownDir) rmSync(dir, { recursive: true, force: true });
  };
  return { base, port, dataDir: dir, firstOkMs, child, serverPid: () => serverPid(child.pid), stop };
}

/** The pid of the node process serving dist/server/entry.mjs under the start script's pid. */
export function serverPid(startPid) {
  for (const task of readdirSync(`/proc/${startPid}/task`)) {
    const kids = readFileSync(`/proc/${startPid}/task/${task}/children`, 'utf8').trim().split(/\s+/).filter(Boolean);
    for (const k of kids) {
      const cmd = readFileSync(`/proc/${k}/cmdline`, 'utf8');
      if (cmd.includes('entry.mjs')) return Number(k);
    }
  }
  throw new Error('no server process under npm start');
}

/** Resident memory (MB) of a process, from /proc. */
export function rssMb(pid) {
  const line = readFileSync(`/proc/${pid}/status`, 'utf8')
    .split('\n')
    .find((l) => l.startsWith('VmRSS:'));
  return Number(line.split(/\s+/)[1]) / 1024;
}

/** Signs in a demo account (all share one password) and returns the Cookie header value. */
export async function signIn(base, email, password = 'cuffwright-demo') {
  const r = await fetch(`${base}/api/auth/sign-in/email`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base },
    body: JSON.stringify({ email, password }),
  });
  if (r.status !== 200) throw new Error(`sign-in of ${email} answered ${r.status}`);
  return r.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
}
