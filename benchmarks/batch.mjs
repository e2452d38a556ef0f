// The morning batch of cut sheets against the server as `npm start` runs it (production build, on a
// throwaway data folder with the demo shop): a shop's queue is first given 500 fitted garments
// through the API (invented customers and figures; one in ten a tapered pair taken in with cuffs
// whose sheet is too full for Letter and spills onto a second page), then:
//   - GET /api/queue/sheets for 100 of them, first request to last byte (goal ≤ 4 s);
//   - the same for all 500 (no goal), with the server's peak resident memory sampled from /proc
//     every 25 ms while it prints (goal ≤ 600 MB; the process's threads, sheet workers included);
//   - another member's cheap GET (one garment) timed alone (A) and while batches of 100 print (B),
//     phases alternated A B A B; reported without a goal.
//   node benchmarks/batch.mjs        RUNS=5 BIG_RUNS=3 ROUNDS=3 GETS=30
import { figure, percentile, writeFigures } from './lib/figures.mjs';
import { rssMb, signIn, startShipped } from './lib/shipped-server.mjs';

const RUNS = Number(process.env.RUNS ?? 5);
const BIG_RUNS = Number(process.env.BIG_RUNS ?? 3);
const ROUNDS = Number(process.env.ROUNDS ?? 3);
const GETS = Number(process.env.GETS ?? 30);
const SMALL = 100;
const BIG = 500;
const PER_TICKET = 20;

const sleep = (ms) => new Promise((r) => setTimeout(r, ms));
const server = await startShipped();
process.on('exit', () => void server.stop());
const pid = server.serverPid();
const { base } = server;
const lead = await signIn(base, 'lead@pinmark.test');
const counter = await signIn(base, 'counter@pinmark.test');
const tailor = await signIn(base, 'tailor@pinmark.test');

async function api(method, path, cookie, body) {
  const r = await fetch(`${base}${path}`, {
    method,
    headers: { cookie, origin: base, ...(body ? { 'content-type': 'application/json' } : {}) },
    body: body ? JSON.stringify(body) : undefined,
  });
  const text = await r.text();
  if (r.status >= 300) throw new Error(`${method} ${path} answered ${r.status}: ${text.slice(0, 200)}`);
  return text ? JSON.parse(text) : null;
}

// Invented figures a shop might take: cuff depths in eighths, cloth three depths and a bit more.
const DEPTHS = ['1 1/4', '1 3/8', '1 1/2', '1 5/8', '1 3/4'];
const CLOTHS = ['Navy twill', 'Grey flannel', 'Tan chino', 'Olive cord', 'Charcoal serge', 'Stone drill'];
const blank = {
  backPin: '',
  frontPin: '',
  cuffDepth: '',
  hemSection: '',
  turnUnder: '',
  hemAllowance: '',
  slope: '',
  available: '',
  oldCrease: '',
  widthAtEdge: '',
  widthAbove: '',
  heightAbove: '',
  seamAllowance: '',
};
function fitting(i, full) {
  if (full) {
    // The fullest sheet: a tapered left leg, a right leg short of cloth with an old crease.
    return {
      unit: 'in',
      legs: {
        left: {
          ...blank,
          finish: 'cuff',
          cuffDepth: '1 1/2',
          available: '5',
          widthAtEdge: '7 1/2',
          widthAbove: '8 1/2',
          heightAbove: '6',
          seamAllowance: '1',
          backPin: '31',
        },
        right: { ...blank, finish: 'cuff', cuffDepth: '1 3/4', available: '4 3/4', oldCrease: '2 1/2', backPin: '31' },
      },
    };
  }
  const depth = DEPTHS[i % DEPTHS.length];
  const leg = { ...blank, finish: 'cuff', cuffDepth: depth, available: `${5 + (i % 4) * 0.25}`, backPin: `${29 + (i % 7)}` };
  return { unit: 'in', legs: { left: leg, right: { ...leg, available: `${4.75 + (i % 3) * 0.25}` } } };
}

// 500 garments over 25 tickets: the first 100 for customers "Batchfolk Alder …", the rest "Batchfolk Birch …".
const t0 = performance.now();
let made = 0;
for (let t = 0; t < BIG / PER_TICKET; t++) {
  const group = t * PER_TICKET < SMALL ? 'Alder' : 'Birch';
  const garments = Array.from({ length: PER_TICKET }, (_, k) => {
    const i = t * PER_TICKET + k;
    return { description: `${CLOTHS[i % CLOTHS.length]} trousers ${i + 1}`, existingFinish: i % 10 === 9 ? 'cuff' : 'plain-hem' };
  });
  const ticket = await api('POST', '/api/tickets', counter, { customer: { name: `Batchfolk ${group} ${t + 1}` }, garments });
  const ids = (await api('GET', `/api/tickets/${ticket.id}`, lead)).garments.map((g) => g.id);
  await Promise.all(ids.map((id, k) => api('PUT', `/api/garments/${id}/measurements`, lead, fitting(t * PER_TICKET + k, (t * PER_TICKET + k) % 10 === 9))));
  made += ids.length;
}
console.log(`seeded ${made} fitted garments in ${((performance.now() - t0) / 1000).toFixed(1)} s`);

/** One batch, request to last byte, with its page count (from the PDF) and the server's peak RSS meanwhile. */
async function batch(search, expectSheets) {
  let peak = rssMb(pid);
  let sampling = true;
  const sampler = (async () => {
    while (sampling) {
      peak = Math.max(peak, rssMb(pid));
      await sleep(25);
    }
  })();
  const t = performance.now();
  const r = await fetch(`${base}/api/queue/sheets?step=open&who=all&due=all&search=${encodeURIComponent(search)}`, { headers: { cookie: lead } });
  const bytes = new Uint8Array(await r.arrayBuffer());
  const ms = performance.now() - t;
  sampling = false;
  await sampler;
  if (r.status !== 200) throw new Error(`batch answered ${r.status}: ${new TextDecoder().decode(bytes).slice(0, 200)}`);
  const sheets = Number(r.headers.get('x-sheets'));
  if (sheets !== expectSheets) throw new Error(`batch printed ${sheets} sheets, expected ${expectSheets}`);
  const pages = (new TextDecoder('latin1').decode(bytes).match(/\/Type \/Page\b/g) ?? []).length;
  return { ms, peak, pages, mb: bytes.length / 1e6 };
}

// Warm: the workers, fonts and memos, as a shop's first batch of the morning would not be.
await batch('Batchfolk Alder', SMALL);

const small = [];
for (let i = 0; i < RUNS; i++) {
  const b = await batch('Batchfolk Alder', SMALL);
  small.push(b.ms);
  console.log(`batch of ${SMALL}: ${b.ms.toFixed(0)} ms, ${b.pages} pages, ${b.mb.toFixed(1)} MB`);
}

const big = [];
const peaks = [];
for (let i = 0; i < BIG_RUNS; i++) {
  const b = await batch('Batchfolk', BIG);
  big.push(b.ms);
  peaks.push(b.peak);
  console.log(`batch of ${BIG}: ${b.ms.toFixed(0)} ms, ${b.pages} pages, ${b.mb.toFixed(1)} MB, server peak ${b.peak.toFixed(0)} MB RSS`);
}

// A member's cheap GET: one garment of the demo shop, read by the tailor while the lead prints.
const garments = JSON.parse(await (await fetch(`${base}/api/garments`, { headers: { cookie: tailor } })).text());
const one = garments.find((g) => g.description === 'Navy suit trousers') ?? garments[0];
async function cheapGet() {
  const t = performance.now();
  const r = await fetch(`${base}/api/garments/${one.id}`, { headers: { cookie: tailor } });
  await r.arrayBuffer();
  if (r.status !== 200) throw new Error(`GET /api/garments/:id answered ${r.status}`);
  return performance.now() - t;
}
async function phase(printing) {
  const running = { on: printing };
  const printer = printing
    ? (async () => {
        while (running.on) await batch('Batchfolk Alder', SMALL);
      })()
    : null;
  if (printing) await sleep(300);
  const times = [];
  for (let i = 0; i < GETS; i++) {
    times.push(await cheapGet());
    await sleep(30);
  }
  running.on = false;
  await printer;
  return times;
}
for (let i = 0; i < 5; i++) await cheapGet();
const alone = [];
const beside = [];
const p = (xs, q) => percentile(xs, q);
const byRound = { alone50: [], alone99: [], beside50: [], beside99: [] };
for (let round = 0; round < ROUNDS; round++) {
  const a = await phase(false);
  const b = await phase(true);
  alone.push(...a);
  beside.push(...b);
  byRound.alone50.push(p(a, 50));
  byRound.alone99.push(p(a, 99));
  byRound.beside50.push(p(b, 50));
  byRound.beside99.push(p(b, 99));
}
console.log(
  `member GET alone: p50 ${p(alone, 50).toFixed(1)} ms, p99 ${p(alone, 99).toFixed(1)} ms; while a batch of ${SMALL} prints: p50 ${p(beside, 50).toFixed(1)} ms, p99 ${p(beside, 99).toFixed(1)} ms`,
);

const note = `${made} fitted garments, 1 in 10 overfull (2 pages); served by npm start`;
writeFigures('batch', [
  figure(`batch of ${SMALL} cut sheets, 10 overfull (request to last byte)`, 'ms', small, { max: 4000 }, note),
  figure(`batch of ${BIG} cut sheets (request to last byte)`, 'ms', big, null, note),
  figure(`server peak RSS while a batch of ${BIG} prints`, 'MB', peaks, { max: 600 }, 'sampled from /proc every 25 ms'),
  figure('member GET one garment, alone: p50 (per round)', 'ms', byRound.alone50, null, `${GETS} GETs a phase, A B alternated`),
  figure(`member GET one garment, while a batch of ${SMALL} prints: p50 (per round)`, 'ms', byRound.beside50, null),
  figure('member GET one garment, alone: p99 (per round)', 'ms', byRound.alone99, null),
  figure(`member GET one garment, while a batch of ${SMALL} prints: p99 (per round)`, 'ms', byRound.beside99, null),
]);
await server.stop();
process.exit(0);
