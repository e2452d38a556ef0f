// Shared by the queue benchmarks (benchmarks/queue.mjs, benchmarks/queue-servers.mjs): a shop
// opened through sign-up, its garments written with SQL, and open-loop GETs at a steady rate.
import { Agent, request } from 'node:http';
import { percentile, stats } from './figures.mjs';

export const RATE = 200;
export const PASSWORD = 'a-long-bench-password';
export const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

/** Opens a shop through sign-up; its lead's cookie. */
export async function newShop(base, name, email) {
  const r = await fetch(`${base}/api/shops`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base },
    body: JSON.stringify({ shopName: name, name: `${name} Lead`, email, password: PASSWORD }),
  });
  if (r.status !== 201) throw new Error(`sign-up answered ${r.status}: ${await r.text()}`);
}

export async function signIn(base, email) {
  const r = await fetch(`${base}/api/auth/sign-in/email`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base },
    body: JSON.stringify({ email, password: PASSWORD }),
  });
  if (r.status !== 200) throw new Error(`sign-in answered ${r.status}`);
  return r.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
}

/** Writes `total` garments (two per ticket, invented customers) into the shop led by `email`; the newest `open` are not collected. */
export async function seedShop(pg, email, total, open) {
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

export const agent = new Agent({ keepAlive: true, maxSockets: 256 });

/** One GET; resolves with status, bytes and the ms it took. */
export function get(url, headers) {
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

/** `rate` requests a second for `seconds` (to the urls in turn), each sent at its time whether or not earlier ones came back. */
export async function steady(url, cookie, seconds, rate = RATE) {
  const n = rate * seconds;
  const urls = Array.isArray(url) ? url : [url];
  const latencies = [];
  let ok = 0;
  let lastEnd = 0;
  const t0 = performance.now() + 50;
  const pending = [];
  for (let i = 0; i < n; i++) {
    const due = t0 + (i * 1000) / rate;
    const wait = due - performance.now();
    if (wait > 1) await sleep(wait);
    pending.push(
      get(urls[i % urls.length], { cookie }).then((r) => {
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

export async function oneAtATime(url, headers, times) {
  const ms = [];
  let last;
  for (let i = 0; i < times; i++) {
    last = await get(url, headers);
    if (last.status === 0) last = await get(url, headers);
    if (i > 0) ms.push(last.ms);
  }
  return { ...stats(ms), bytes: last.bytes, status: last.status, etag: last.etag, next: last.next };
}

/**
 * The queue as browsers read it, at `rate` requests a second for `seconds`: `clients` tabs (over
 * the given session cookies in turn) read in turn, each keeping the ETag of its last 200. One
 * request in `fresh` of each tab is unconditional (a first visit, a cleared cache, another device),
 * the others send If-None-Match as the browser's cache does when the page polls, refocuses or
 * reopens. Meanwhile `write()` runs `writesPerSecond` times a second (a garment moved at the bench),
 * so conditional requests after each write get the changed list (200), not only 304s. Latency is
 * from each read's scheduled time; writes are not counted. Served: 200s and 304s per second.
 */
export async function browserMix(url, cookies, seconds, { clients = 20, fresh = 4, write, writesPerSecond = 1, rate = RATE } = {}) {
  const n = rate * seconds;
  const etags = new Array(clients).fill(undefined);
  const latencies = [];
  const counts = { 200: 0, 304: 0, other: 0, writes: 0, writeFailures: 0 };
  let lastEnd = 0;
  const t0 = performance.now() + 50;
  const pending = [];
  let writing = Promise.resolve();
  let nextWrite = t0 + 1000 / writesPerSecond / 2;
  for (let i = 0; i < n; i++) {
    const due = t0 + (i * 1000) / rate;
    const wait = due - performance.now();
    if (wait > 1) await sleep(wait);
    if (write && performance.now() >= nextWrite) {
      nextWrite += 1000 / writesPerSecond;
      // One write at a time, as one person at the bench taps.
      writing = writing.then(() =>
        write().then(
          (ok) => (ok ? (counts.writes += 1) : (counts.writeFailures += 1)),
          () => (counts.writeFailures += 1),
        ),
      );
    }
    const c = i % clients;
    const round = Math.floor(i / clients);
    const headers = { cookie: cookies[c % cookies.length] };
    if (etags[c] && round % fresh !== 0) headers['if-none-match'] = etags[c];
    pending.push(
      get(url, headers).then((r) => {
        const end = performance.now();
        latencies.push(end - due);
        if (r.status === 200) {
          counts[200] += 1;
          etags[c] = r.etag;
        } else if (r.status === 304) counts[304] += 1;
        else counts.other += 1;
        lastEnd = Math.max(lastEnd, end);
      }),
    );
  }
  await Promise.all(pending);
  await writing;
  return {
    served: (counts[200] + counts[304]) / ((lastEnd - t0) / 1000),
    p99: percentile(latencies, 99),
    p50: percentile(latencies, 50),
    n,
    ...counts,
  };
}
