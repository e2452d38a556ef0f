// The queue read (GET /api/garments) against the server as `npm start` runs it, on PGlite:
// - a 1,000-garment shop (150 open, 850 collected), read open-loop at a steady 200 requests a
//   second for 10 s, several runs, as browsers read it (browserMix in lib/queue-load.mjs): 20 tabs
//   over 4 sign-ins, each tab's every 4th read unconditional and the others with its last ETag,
//   while a garment is moved a step (and back) once a second through the API, so every tab's next
//   read after a move is a 200 with the changed list; about a third of the answers are 200s.
//   Requests served per second (200 or 304) and the p99 latency, measured from each request's
//   scheduled time (so a server that falls behind pays for the queue it builds);
// - a 10,000-garment shop (300 open, 9,700 collected), read one at a time: median ms and bytes of
//   the open list, of a first history page, and of an unchanged list answered 304.
// The shops are opened through sign-up, then their garments are written with SQL into the data
// folder while no server runs (a PGlite folder has one process at a time), then the server starts again.
// Usage: node benchmarks/queue.mjs [runs=3] [seconds=10]
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir, loadavg } from 'node:os';
import { join } from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { figure, writeFigures } from './lib/figures.mjs';
import { agent, browserMix, newShop, oneAtATime, RATE, seedShop, signIn } from './lib/queue-load.mjs';
import { startShipped } from './lib/shipped-server.mjs';

const RUNS = Number(process.argv[2] ?? 3);
const SECONDS = Number(process.argv[3] ?? 10);
const dir = mkdtempSync(join(tmpdir(), 'cuffwright-queue-bench-'));
const small = `lead-1000-${Date.now()}@bench.test`;
const big = `lead-10000-${Date.now()}@bench.test`;
let server;
try {
  server = await startShipped({ dataDir: dir });
  await newShop(server.base, 'Thousand Hems', small);
  await newShop(server.base, 'Ten Thousand Hems', big);
  await server.stop();
  const pg = new PGlite(join(dir, 'pglite'));
  await seedShop(pg, small, 1000, 150);
  await seedShop(pg, big, 10000, 300);
  await pg.close();
  server = await startShipped({ dataDir: dir });
  const smallCookies = [];
  for (let i = 0; i < 4; i++) smallCookies.push(await signIn(server.base, small));
  const bigCookie = await signIn(server.base, big);
  const url = `${server.base}/api/garments`;
  const check = await fetch(url, { headers: { cookie: smallCookies[0] } });
  if (check.status !== 200) throw new Error(`queue read answered ${check.status}`);
  const write = moveBackAndForth(server.base, smallCookies[0], (await check.json()).find((r) => r.status === 'received').id);
  await browserMix(url, smallCookies, 2, { write }); // warm-up
  const served = [];
  const p99 = [];
  for (let r = 0; r < RUNS; r++) {
    const run = await browserMix(url, smallCookies, SECONDS, { write });
    if (run.writeFailures > 0) throw new Error(`${run.writeFailures} moves failed during the run`);
    served.push(run.served);
    p99.push(run.p99);
    console.log(
      `run ${r + 1}: ${run[200]} answered 200, ${run[304]} 304, ${run.other} other of ${run.n}; ${run.writes} moves; ${run.served.toFixed(1)}/s served, p50 ${run.p50.toFixed(1)} ms, p99 ${run.p99.toFixed(1)} ms (load ${loadavg()[0].toFixed(2)})`,
    );
  }
  const open = await oneAtATime(url, { cookie: bigCookie }, 21);
  const history = await oneAtATime(`${url}?view=history`, { cookie: bigCookie }, 21);
  const unchanged = await oneAtATime(url, { cookie: bigCookie, 'if-none-match': open.etag }, 21);
  if (unchanged.status !== 304) throw new Error(`an unchanged list answered ${unchanged.status}, not 304`);
  const load = loadavg()[0].toFixed(2);
  writeFigures(
    'queue',
    [
      figure('queue read at 200 req/s, 1,000-garment shop (browsers, a move a second): served', 'req/s', served, { min: 199 }),
      figure('queue read at 200 req/s, 1,000-garment shop (browsers, a move a second): p99', 'ms', p99, { max: 50 }),
      figure('queue read, 10,000-garment shop, one at a time (open work)', 'ms', [open.median], null, `${open.bytes} bytes`),
      figure('queue read, 10,000-garment shop: bytes of open work', 'bytes', [open.bytes]),
      figure('queue read, 10,000-garment shop: a history page of 50', 'ms', [history.median], null, `${history.bytes} bytes`),
      figure('queue read, 10,000-garment shop: unchanged list (304)', 'ms', [unchanged.median]),
    ],
    { load, runs: RUNS, seconds: SECONDS, rate: RATE },
  );
  console.log(
    `10,000-garment shop: open ${open.median.toFixed(1)} ms ${open.bytes} B; history page ${history.median.toFixed(1)} ms ${history.bytes} B; 304 ${unchanged.median.toFixed(1)} ms (load ${load})`,
  );
} finally {
  await server?.stop();
  agent.destroy();
  rmSync(dir, { recursive: true, force: true });
}

/** A write as the bench makes it: the garment moved to Chalk-marked, the next call back to Received. */
function moveBackAndForth(base, cookie, id) {
  let forward = true;
  return async () => {
    const [path, body] = forward ? ['step', { to: 'marked' }] : ['step-back', { from: 'marked' }];
    forward = !forward;
    const r = await fetch(`${base}/api/garments/${id}/${path}`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: base, cookie },
      body: JSON.stringify(body),
    });
    await r.arrayBuffer();
    return r.ok;
  };
}
