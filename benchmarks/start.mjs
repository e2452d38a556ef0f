// npm start as users run it (scripts/start.mjs: production build, mail capture, payment fake):
// milliseconds from spawn to the first 200 on GET /, on existing data (the demo shop already there)
// and on a fresh data folder (migrations and the demo seed), and the server's resident memory
// once idle after start, on PGlite and, when PostgreSQL's binaries are here, on PostgreSQL.
// Usage: node benchmarks/start.mjs [runs]   (the PostgreSQL part runs under scripts/with-postgres.sh)
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir, loadavg } from 'node:os';
import { join } from 'node:path';
import { figure, writeFigures } from './lib/figures.mjs';
import { rssMb, startShipped } from './lib/shipped-server.mjs';

const IDLE_MS = 5_000;
const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

/** Starts, waits for the first 200, idles, reads the server's RSS, stops. */
async function oneStart(options) {
  const s = await startShipped(options);
  try {
    await sleep(IDLE_MS);
    return { firstOkMs: s.firstOkMs, rss: rssMb(s.serverPid()) };
  } finally {
    await s.stop();
  }
}

/** PostgreSQL: a first start (migrations, demo seed) then restarts on that data; idle RSS of each restart. */
async function postgresRss(url, runs) {
  const env = { DATABASE_URL: url, BETTER_AUTH_SECRET: 'bench-secret-bench-secret-bench-secret-32', DEMO_DATA: 'on' };
  await oneStart({ env });
  const rss = [];
  for (let i = 0; i < runs; i++) rss.push((await oneStart({ env })).rss);
  return rss;
}

const runs = Number(process.argv.find((a) => /^\d+$/.test(a)) ?? 5);

if (process.argv.includes('--postgres')) {
  // The child run under with-postgres.sh: one JSON line for the parent.
  console.log(`POSTGRES ${JSON.stringify(await postgresRss(process.env.TEST_DATABASE_URL, Math.min(runs, 3)))}`);
  process.exit(0);
}

const load = () => loadavg()[0].toFixed(1);
console.log(`load average before: ${load()}`);
const fresh = [];
const freshRss = [];
const dataDir = mkdtempSync(join(tmpdir(), 'cuffwright-start-'));
try {
  // Fresh folders: the first one is kept as the existing data for the runs after it.
  for (let i = 0; i < 2; i++) {
    const dir = i === 0 ? dataDir : mkdtempSync(join(tmpdir(), 'cuffwright-start-'));
    const r = await oneStart({ dataDir: dir });
    if (i > 0) rmSync(dir, { recursive: true, force: true });
    fresh.push(r.firstOkMs);
    freshRss.push(r.rss);
    console.log(`fresh data: first 200 after ${Math.round(r.firstOkMs)} ms, idle ${Math.round(r.rss)} MB`);
  }
  const existing = [];
  const existingRss = [];
  for (let i = 0; i < runs; i++) {
    const r = await oneStart({ dataDir });
    existing.push(r.firstOkMs);
    existingRss.push(r.rss);
    console.log(`existing data: first 200 after ${Math.round(r.firstOkMs)} ms, idle ${Math.round(r.rss)} MB`);
  }
  const figures = [
    figure('npm start → first 200, existing data', 'ms', existing, { max: 2000 }),
    figure('npm start → first 200, fresh data folder (seeds the demo)', 'ms', fresh),
    figure('server memory idle after start, existing data (PGlite)', 'MB', existingRss, { max: 450 }),
    figure('server memory idle after a first start that seeded (PGlite)', 'MB', freshRss),
  ];
  const pgBin = existsSync('/usr/lib/postgresql') && readdirSync('/usr/lib/postgresql').length > 0;
  if (process.env.TEST_DATABASE_URL || pgBin) {
    const args = ['benchmarks/start.mjs', '--postgres', String(runs)];
    const child = process.env.TEST_DATABASE_URL
      ? spawnSync('node', args, { encoding: 'utf8', stdio: ['ignore', 'pipe', 'inherit'] })
      : spawnSync('bash', ['scripts/with-postgres.sh', 'node', ...args], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'inherit'] });
    const line = (child.stdout ?? '').split('\n').find((l) => l.startsWith('POSTGRES '));
    if (line) {
      const rss = JSON.parse(line.slice('POSTGRES '.length));
      console.log(`PostgreSQL: idle ${rss.map(Math.round).join(', ')} MB`);
      figures.push(figure('server memory idle after start, existing data (PostgreSQL)', 'MB', rss));
    } else console.log('PostgreSQL: not measured (the server did not start under scripts/with-postgres.sh)');
  } else console.log('PostgreSQL: not measured (no server binaries; Debian: apt-get install postgresql)');
  console.log(`load average after: ${load()}`);
  writeFigures('start', figures, { loadAverage: load() });
} finally {
  rmSync(dataDir, { recursive: true, force: true });
}
