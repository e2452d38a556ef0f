// Queue reads on PostgreSQL: one app server against two on the same database, each started as
// `npm start` runs it (DATABASE_URL and a shared secret set). A 1,000-garment shop is read at a
// steady 200 requests a second, all to one server, then spread over both, alternated A B A B;
// served per second, p50 and p99 from each request's scheduled time. On 2 cores two servers share
// the same cores with PostgreSQL and the load generator, so little gain is expected here.
// Runs inside scripts/with-postgres.sh (npm run bench does that): TEST_DATABASE_URL is the server.
import { randomBytes, randomUUID } from 'node:crypto';
import { loadavg } from 'node:os';
import pg from 'pg';
import { figure, writeFigures } from './lib/figures.mjs';
import { agent, get, newShop, seedShop, signIn, steady } from './lib/queue-load.mjs';
import { startShipped } from './lib/shipped-server.mjs';

const RUNS = Number(process.argv[2] ?? 3);
const SECONDS = Number(process.argv[3] ?? 10);
const admin = process.env.TEST_DATABASE_URL;
if (!admin) {
  console.log('queue-servers: no PostgreSQL (run through scripts/with-postgres.sh); skipped.');
  process.exit(0);
}
const name = `cw_bench_${randomUUID().replace(/-/g, '').slice(0, 10)}`;
const adminClient = new pg.Client({ connectionString: admin });
await adminClient.connect();
await adminClient.query(`create database ${name}`);
const url = new URL(admin);
url.pathname = `/${name}`;
const env = { DATABASE_URL: url.toString(), BETTER_AUTH_SECRET: randomBytes(32).toString('base64url'), DEMO_DATA: 'off' };
const email = `lead-pg-${Date.now()}@bench.test`;
const servers = [];
try {
  servers.push(await startShipped({ env }));
  servers.push(await startShipped({ env }));
  await newShop(servers[0].base, 'Thousand Hems', email);
  const db = new pg.Client({ connectionString: env.DATABASE_URL });
  await db.connect();
  await seedShop(db, email, 1000, 150);
  await db.end();
  const cookie = await signIn(servers[0].base, email);
  const one = [`${servers[0].base}/api/garments`];
  const two = servers.map((s) => `${s.base}/api/garments`);
  for (const u of two) if ((await get(u, { cookie })).status !== 200) throw new Error(`queue read on ${u} failed`);
  await steady(two, cookie, 2); // warm both
  const res = { one: { served: [], p50: [], p99: [] }, two: { served: [], p50: [], p99: [] } };
  for (let r = 0; r < RUNS; r++) {
    for (const [label, urls] of [
      ['one', one],
      ['two', two],
    ]) {
      const run = await steady(urls, cookie, SECONDS);
      res[label].served.push(run.served);
      res[label].p50.push(run.p50);
      res[label].p99.push(run.p99);
      console.log(
        `run ${r + 1}, ${label === 'one' ? 'one server' : 'two servers'}: ${run.ok}/${run.n} answered 200, ${run.served.toFixed(1)}/s, p50 ${run.p50.toFixed(1)} ms, p99 ${run.p99.toFixed(1)} ms (load ${loadavg()[0].toFixed(2)})`,
      );
    }
  }
  writeFigures(
    'queue-servers',
    ['one', 'two'].flatMap((label) => [
      figure(`PostgreSQL, ${label} server${label === 'two' ? 's' : ''}, 200 req/s: served`, 'req/s', res[label].served),
      figure(`PostgreSQL, ${label} server${label === 'two' ? 's' : ''}, 200 req/s: p50`, 'ms', res[label].p50),
      figure(`PostgreSQL, ${label} server${label === 'two' ? 's' : ''}, 200 req/s: p99`, 'ms', res[label].p99),
    ]),
    { load: loadavg()[0].toFixed(2), runs: RUNS, seconds: SECONDS },
  );
} finally {
  for (const s of servers) await s.stop();
  agent.destroy();
  await adminClient.query(`drop database if exists ${name} with (force)`).catch(() => {});
  await adminClient.end();
}
