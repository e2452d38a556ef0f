// A member's cheap GET beside four strangers printing calculator cut sheets, against the built
// server in production mode: phases alternate A (member alone) and B (four strangers printing
// without pause, each sheet from a new address so the per-address limit stays out of the way),
// and the member's GET /api/garments is timed in each. Run it alone (not through npm run bench):
//   node benchmarks/member-beside-strangers.mjs [distDir]      ROUNDS=4 GETS=40 THINK_MS=50
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildIfNeeded } from '../scripts/build-if-needed.mjs';

const dist = process.argv[2] ?? 'dist';
const ROUNDS = Number(process.env.ROUNDS ?? 4);
const GETS = Number(process.env.GETS ?? 40);
const THINK_MS = Number(process.env.THINK_MS ?? 50);
const PRINTERS = 4;
const PLAN = { kind: 'cuff', unit: 'in', cuffDepth: '1 1/2', available: '5' };

const sleep = (ms) => new Promise((r) => setTimeout(r, ms));
const port = await new Promise((resolve) => {
  const s = createServer().listen(0, '127.0.0.1', () => {
    const p = s.address().port;
    s.close(() => resolve(p));
  });
});
const base = `http://localhost:${port}`;

buildIfNeeded(dist);
const dataDir = mkdtempSync(join(tmpdir(), 'cuffwright-bench-strangers-'));
const server = spawn('node', [join(dist, 'server', 'entry.mjs')], {
  stdio: ['ignore', 'ignore', 'inherit'],
  env: { ...process.env, NODE_ENV: 'production', PORT: String(port), HOST: '127.0.0.1', DATA_DIR: dataDir, BETTER_AUTH_URL: base, TRUSTED_PROXY_HOPS: '1' },
});
const stop = () => {
  server.kill('SIGTERM');
  rmSync(dataDir, { recursive: true, force: true });
};
process.on('exit', stop);

for (let up = false, until = Date.now() + 180_000; !up; ) {
  if (Date.now() > until) throw new Error('the server did not answer in 3 min');
  up = await fetch(`${base}/`).then(
    (r) => r.status < 500,
    () => false,
  );
  if (!up) await sleep(500);
}

const signIn = await fetch(`${base}/api/auth/sign-in/email`, {
  method: 'POST',
  headers: { 'content-type': 'application/json', origin: base },
  body: JSON.stringify({ email: 'tailor@pinmark.test', password: 'cuffwright-demo' }),
});
if (signIn.status !== 200) throw new Error(`sign-in answered ${signIn.status}`);
const cookie = signIn.headers
  .getSetCookie()
  .map((c) => c.split(';')[0])
  .join('; ');

async function memberGet() {
  const t = performance.now();
  const r = await fetch(`${base}/api/garments`, { headers: { cookie } });
  await r.arrayBuffer();
  if (r.status !== 200) throw new Error(`GET /api/garments answered ${r.status}`);
  return performance.now() - t;
}

let address = 0;
const printed = { ok: 0, refused: 0, other: 0 };
async function printer(running) {
  while (running.on) {
    address += 1;
    const r = await fetch(`${base}/api/plan/sheet`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: base, 'x-forwarded-for': `10.${(address >> 16) & 255}.${(address >> 8) & 255}.${address & 255}` },
      body: JSON.stringify(PLAN),
    });
    await r.arrayBuffer();
    if (r.status === 200) printed.ok += 1;
    else if (r.status === 429) printed.refused += 1;
    else printed.other += 1;
  }
}

async function phase(withStrangers) {
  const running = { on: withStrangers };
  const printers = withStrangers ? Array.from({ length: PRINTERS }, () => printer(running)) : [];
  if (withStrangers) await sleep(300);
  const times = [];
  for (let i = 0; i < GETS; i++) {
    times.push(await memberGet());
    await sleep(THINK_MS);
  }
  running.on = false;
  await Promise.all(printers);
  return times;
}

// Warm both: the member's route, and the sheet renderer (worker start, fonts).
for (let i = 0; i < 10; i++) await memberGet();
await phase(true);
printed.ok = printed.refused = printed.other = 0;

const a = [];
const b = [];
const started = performance.now();
for (let round = 0; round < ROUNDS; round++) {
  a.push(...(await phase(false)));
  b.push(...(await phase(true)));
}
const seconds = (performance.now() - started) / 1000;

const stat = (xs) => {
  const s = [...xs].sort((x, y) => x - y);
  const at = (q) => s[Math.min(s.length - 1, Math.floor(q * s.length))];
  return `median ${at(0.5).toFixed(1)} ms, p95 ${at(0.95).toFixed(1)} ms (n=${s.length})`;
};
console.log(`member GET /api/garments, ${ROUNDS} rounds A B, ${GETS} GETs a phase, ${THINK_MS} ms apart (${dist}, NODE_ENV=production)`);
console.log(`  A alone:                 ${stat(a)}`);
console.log(`  B beside ${PRINTERS} strangers:   ${stat(b)}`);
console.log(`  strangers' sheets in B: ${printed.ok} printed, ${printed.refused} refused (429), ${printed.other} other, in ${seconds.toFixed(0)} s of bench`);
stop();
process.exit(0);
