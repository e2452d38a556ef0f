// The queue read (GET /api/garments) against the server as `npm start` runs it, on PGlite:
// - a 1,000-garment shop (150 open, 850 collected), read open-loop at a steady 200 requests a
//   second for 10 s, several runs: requests served per second and the p99 latency, measured from
//   each request's scheduled time (so a server that falls behind pays for the queue it builds);
// - a 10,000-garment shop (300 open, 9,700 collected), read one at a time: median ms and bytes of
//   the open list, of a first history page, and of an unchanged list answered 304.
// The shops are opened through sign-up, then their garments are written with SQL into the data
// folder while no server runs (a PGlite folder has one process at a time), then the server starts again.
// Usage: node benchmarks/queue.mjs [runs=3] [seconds=10]
import { Agent, request } from 'node:http';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir, loadavg } from 'node:os';
import { join } from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { figure, percentile, stats, writeFigures } from './lib/figures.mjs';
import { startShipped } from './lib/shipped-server.mjs';

const RUNS = Number(process.argv[2] ?? 3);
const SECONDS = Number(process.argv[3] ?? 10);
const RATE = 200;
const PASSWORD = 'a-long-bench-password';
const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

/** Opens a shop through sign-up; its lead's cookie. */
async function newShop(base, name, email) {
  const r = await fetch(`${base}/api/shops`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base },
    body: JSON.stringify({ shopName: name, name: `${name} Lead`, email, password: PASSWORD }),
  });
  if (r.status !== 201) throw new Error(`sign-up answered ${r.status}: ${await r.text()}`);
}

async function signIn(base, email) {
  const r = await fetch(`${base}/api/auth/sign-in/email`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base },
    body: JSON.stringify({ email, password: PASSWORD }),
  });
  if (r.status !== 200) throw new Error(`sign-in answered ${r.status}`);
  return r.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
}

/** Writes `total` garments (two per ticket, invented customers) into the shop led by `email`; the newest `open` are not collected. */
async function seedShop(pg, email, total, open) {
  const { rows } = await pg.query(`select m.organization_id as shop, u.id as lead from "user" u join member m on m.user_id = u.id where u.email = $1`, [email]);
  const { shop, lead } = rows[0];
  const tickets = total / 2;
  await pg.query(
    `insert into customers (shop_id, name, phone) select $1, 'Bench customer ' || g, '555-' || lpad(g::text, 4, '0') from generate_series(1, $2::int) g`,
    [shop, Math.ceil(tickets / 3)],
  );
  // Ticket i is taken in i hours after the first; the last open/2 tickets are still on the bench.
  await pg.query(
    `with c as (select id, row_number() over (order by name) - 1 as k from customers where shop_id = $1)
     insert into tickets (shop_id, number, customer_id, status, due_on, created_at, updated_at)
     select $1, 1000 + i, (select id from c where k = i % (select count(*) from c)),
            case when i > $2::int - $3::int / 2 then (array['received','marked','cut','stitched','pressed','ready'])[1 + i % 6] else 'collected' end,
            current_date + (i - $2::int + 14) / 10, now() - ($2::int - i) * interval '1 hour', now() - ($2::int - i) * interval '1 hour'
     from generate_series(1, $2::int) i`,
    [shop, tickets, open],
  );
  await pg.query(
    `insert into garments (shop_id, ticket_id, description, position, status, assignee_id, due_on, created_at, updated_at)
     select t.shop_id, t.id, (array['Grey flannels','Navy chinos','Charcoal worsted','Stone cords'])[1 + (t.number + p) % 4], p, t.status,
            case when (t.number + p) % 3 = 0 then null else $2 end, t.due_on, t.created_at, t.updated_at
     from tickets t, generate_series(0, 1) p where t.shop_id = $1`,
    [shop, lead],
  );
  await pg.query('analyze');
}

const agent = new Agent({ keepAlive: true, maxSockets: 256 });

/** One GET; resolves with status, bytes and the ms it took. */
function get(url, headers) {
  return new Promise((resolve) => {
    const t0 = performance.now();
    const req = request(url, { agent, headers }, (res) => {
      let bytes = 0;
      res.on('data', (c) => (bytes += c.length));
      res.on('end', () => resolve({ status: res.statusCode, bytes, ms: performance.now() - t0, etag: res.headers.etag, next: res.headers['x-next-cursor'] }));
    });
    // A kept-alive socket the server closed while idle: counted as not served, never thrown.
    req.on('error', (error) => resolve({ status: 0, bytes: 0, ms: performance.now() - t0, error }));
    req.end();
  });
}

/** RATE requests a second for `seconds`, each sent at its time whether or not earlier ones came back. */
async function steady(url, cookie, seconds) {
  const n = RATE * seconds;
  const latencies = [];
  let ok = 0;
  let lastEnd = 0;
  const t0 = performance.now() + 50;
  const pending = [];
  for (let i = 0; i < n; i++) {
    const due = t0 + (i * 1000) / RATE;
    const wait = due - performance.now();
    if (wait > 1) await sleep(wait);
    pending.push(
      get(url, { cookie }).then((r) => {
        const end = performance.now();
        latencies.push(end - due);
        if (r.status === 200) ok += 1;
        lastEnd = Math.max(lastEnd, end);
      }),
    );
  }
  await Promise.all(pending);
  return { served: ok / ((lastEnd - t0) / 1000), p99: percentile(latencies, 99), p50: percentile(latencies, 50), ok, n };
}

async function oneAtATime(url, headers, times) {
  const ms = [];
  let last;
  for (let i = 0; i < times; i++) {
    last = await get(url, headers);
    if (last.status === 0) last = await get(url, headers);
    if (i > 0) ms.push(last.ms);
  }
  return { ...stats(ms), bytes: last.bytes, status: last.status, etag: last.etag, next: last.next };
}

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
  const [smallCookie, bigCookie] = [await signIn(server.base, small), await signIn(server.base, big)];
  const url = `${server.base}/api/garments`;
  const check = await get(url, { cookie: smallCookie });
  if (check.status !== 200) throw new Error(`queue read answered ${check.status}`);
  await steady(url, smallCookie, 2); // warm-up
  const served = [];
  const p99 = [];
  for (let r = 0; r < RUNS; r++) {
    const run = await steady(url, smallCookie, SECONDS);
    served.push(run.served);
    p99.push(run.p99);
    console.log(`run ${r + 1}: ${run.ok}/${run.n} answered 200, ${run.served.toFixed(1)}/s served, p50 ${run.p50.toFixed(1)} ms, p99 ${run.p99.toFixed(1)} ms (load ${loadavg()[0].toFixed(2)})`);
  }
  const open = await oneAtATime(url, { cookie: bigCookie }, 21);
  const history = await oneAtATime(`${url}?view=history`, { cookie: bigCookie }, 21);
  const unchanged = await oneAtATime(url, { cookie: bigCookie, 'if-none-match': open.etag }, 21);
  if (unchanged.status !== 304) throw new Error(`an unchanged list answered ${unchanged.status}, not 304`);
  const load = loadavg()[0].toFixed(2);
  writeFigures(
    'queue',
    [
      figure('queue read at 200 req/s, 1,000-garment shop: served', 'req/s', served, { min: 199 }),
      figure('queue read at 200 req/s, 1,000-garment shop: p99', 'ms', p99, { max: 50 }),
      figure('queue read, 10,000-garment shop, one at a time (open work)', 'ms', [open.median], null, `${open.bytes} bytes`),
      figure('queue read, 10,000-garment shop: bytes of open work', 'bytes', [open.bytes]),
      figure('queue read, 10,000-garment shop: a history page of 50', 'ms', [history.median], null, `${history.bytes} bytes`),
      figure('queue read, 10,000-garment shop: unchanged list (304)', 'ms', [unchanged.median]),
    ],
    { load, runs: RUNS, seconds: SECONDS, rate: RATE },
  );
  console.log(`10,000-garment shop: open ${open.median.toFixed(1)} ms ${open.bytes} B; history page ${history.median.toFixed(1)} ms ${history.bytes} B; 304 ${unchanged.median.toFixed(1)} ms (load ${load})`);
} finally {
  await server?.stop();
  agent.destroy();
  rmSync(dir, { recursive: true, force: true });
}
