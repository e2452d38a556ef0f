// Durability: writers open tickets through the API while the server is killed with SIGKILL at a
// random moment; after a restart every write the server acknowledged (201) must be there.
// Usage: node scripts/durability.mjs [rounds=5]   (DATABASE_URL=postgres://… to test a server;
// with it, SERVERS=2 runs two app servers on that database, writers on both, one killed per round)
// Only talks to the servers it starts on 127.0.0.1; every loop is bounded.
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { randomBytes } from 'node:crypto';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildIfNeeded } from './build-if-needed.mjs';

const rounds = Number(process.argv[2] ?? 5);
const WRITERS = 4;
const outDir = process.env.TEST_DIST_DIR || '.test-dist-durability';
buildIfNeeded(outDir);

const SERVERS = process.env.DATABASE_URL ? Number(process.env.SERVERS ?? 1) : 1;
const freePort = () =>
  new Promise((resolve) => {
    const s = createServer();
    s.listen(0, '127.0.0.1', () => {
      const p = s.address().port;
      s.close(() => resolve(p));
    });
  });
const ports = [];
for (let i = 0; i < SERVERS; i += 1) ports.push(await freePort());
const bases = ports.map((p) => `http://localhost:${p}`);
const dataDir = mkdtempSync(join(tmpdir(), 'cuffwright-durability-'));
const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

// The writers sign in as a demo account (asked for: off by default on PostgreSQL, which also needs
// a session secret from the environment, the same across restarts).
const secret = process.env.BETTER_AUTH_SECRET || randomBytes(32).toString('base64url');

function startServer(i) {
  return spawn('node', [`${outDir}/server/entry.mjs`], {
    env: {
      ...process.env,
      // As npm start runs it (React's production build).
      NODE_ENV: 'production',
      PORT: String(ports[i]),
      HOST: '127.0.0.1',
      DATA_DIR: join(dataDir, String(i)),
      BETTER_AUTH_URL: bases[i],
      SMTP_PORT: '9',
      DEMO_DATA: 'on',
      BETTER_AUTH_SECRET: secret,
    },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
}

async function waitUp(i, ms = 60_000) {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    try {
      if ((await fetch(`${bases[i]}/`)).status === 200) return;
    } catch {
      /* not up yet */
    }
    await sleep(200);
  }
  throw new Error('server did not come up');
}

async function signIn() {
  const base = bases[0];
  const r = await fetch(`${base}/api/auth/sign-in/email`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base },
    body: JSON.stringify({ email: 'counter@pinmark.test', password: 'cuffwright-demo' }),
  });
  if (r.status !== 200) throw new Error(`sign-in answered ${r.status}`);
  return r.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
}

async function writer(cookie, round, w, acked, stop) {
  // With two servers, writers take turns: half write to each.
  const base = bases[w % bases.length];
  for (let i = 0; !stop.now && i < 100_000; i += 1) {
    const note = `durability r${round} w${w} #${i}`;
    try {
      const r = await fetch(`${base}/api/tickets`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', origin: base, cookie },
        body: JSON.stringify({ note }),
      });
      if (r.status === 201) acked.push({ id: (await r.json()).id, note });
    } catch {
      return; // the server is gone: this write was never acknowledged
    }
  }
}

const servers = bases.map((_, i) => startServer(i));
// Together, as a group's servers start: migrations and the seed run once, under the start lock.
await Promise.all(bases.map((_, i) => waitUp(i, 120_000)));
const cookie = await signIn();
const results = [];
let allAcked = [];
try {
  for (let round = 1; round <= rounds; round += 1) {
    const acked = [];
    const stop = { now: false };
    const writers = Array.from({ length: WRITERS }, (_, w) => writer(cookie, round, w, acked, stop));
    await sleep(1000 + Math.random() * 2000);
    const victim = Math.floor(Math.random() * servers.length);
    servers[victim].kill('SIGKILL');
    await new Promise((r) => servers[victim].once('exit', r));
    stop.now = true;
    await Promise.all(writers);
    allAcked = allAcked.concat(acked);
    servers[victim] = startServer(victim);
    await waitUp(victim);
    // Read back through the other server when there is one, the restarted one otherwise.
    const reader = bases[(victim + 1) % bases.length];
    const r = await fetch(`${reader}/api/tickets`, { headers: { cookie } });
    if (r.status !== 200) throw new Error(`listing after restart answered ${r.status}`);
    const present = new Map((await r.json()).map((t) => [t.id, t.note]));
    const missing = allAcked.filter((a) => present.get(a.id) !== a.note);
    results.push({ round, acked: acked.length, checked: allAcked.length, missing: missing.length });
    console.log(
      `round ${round}: ${acked.length} writes acknowledged before SIGKILL of server ${victim + 1}/${servers.length}; after restart ${allAcked.length - missing.length}/${allAcked.length} acknowledged writes present`,
    );
  }
} finally {
  for (const server of servers) server.kill('SIGTERM');
  await sleep(500);
  rmSync(dataDir, { recursive: true, force: true });
}
const lost = results.reduce((n, r) => n + r.missing, 0);
console.log(`${rounds} rounds, ${allAcked.length} acknowledged writes, ${lost} lost.`);
process.exit(lost === 0 ? 0 : 1);
