// Measures the JavaScript each page sends, from the app as `npm start` runs it (startShipped):
// each page is loaded several times in headless Chromium, each load in a fresh context (cold
// cache). Per load it sums, over every script response: the gzip size of the body (level 9, what
// the page would weigh if served gzipped), the bytes Chromium received for it (the transfer size,
// whatever encoding the server chose), and the bytes the server sends for the same URLs when asked
// with Accept-Encoding "br, gzip" and "gzip" (Chromium asks for br only over HTTPS). Writes its
// figures to benchmark-results/pages.json through benchmarks/lib/figures.mjs.
import http from 'node:http';
import { gzipSync } from 'node:zlib';
import { chromium } from 'playwright-core';
import { CHROMIUM_ARGS, ensureChromium } from '../scripts/chromium.mjs';
import { figure, writeFigures } from './lib/figures.mjs';
import { startShipped } from './lib/shipped-server.mjs';

/** Pages to weigh: path, a demo sign-in when needed first, and the goal (KiB of gzip) if the issue sets one. */
export const PAGES = [
  { path: '/', signIn: null, goalKiB: 100 },
  { path: '/queue', signIn: 'tailor@pinmark.test', goalKiB: null },
  { path: '/tickets/new', signIn: 'counter@pinmark.test', goalKiB: null },
  { path: '/presets', signIn: 'lead@pinmark.test', goalKiB: null },
  { path: '/customers', signIn: 'counter@pinmark.test', goalKiB: null },
  // Charts drawn on the server: the overview sends no script of its own.
  { path: '/overview?period=4w', signIn: 'lead@pinmark.test', goalKiB: 5 },
  // Drawn on the server from the API document: no script of its own.
  { path: '/api-reference', signIn: null, goalKiB: null },
  // The fitting page: trouser legs plus the skirt and sleeve forms and plan views it may show.
  { path: '/garments/[id]', signIn: 'tailor@pinmark.test', goalKiB: null, resolve: firstOpenGarment },
];

/** The page of the first open garment in the queue (the path holds its id). */
async function firstOpenGarment(request) {
  const res = await request.get('/api/garments');
  const rows = await res.json();
  if (!res.ok() || !rows.length) throw new Error(`no open garment to weigh (${res.status()})`);
  return `/garments/${rows[0].id}`;
}

/** How many cold loads of each page (PAGE_LOADS, default 5). */
const LOADS = Number(process.env.PAGE_LOADS || 5);

/** Signs the tab's context in as a demo account (every demo account shares one password). */
async function signInAs(tab, base, email) {
  const res = await tab.context().request.post(`${base}/api/auth/sign-in/email`, { data: { email, password: 'cuffwright-demo' }, headers: { origin: base } });
  if (!res.ok()) throw new Error(`sign-in of ${email} answered ${res.status()}`);
}

/** The bytes of a response body as sent (not decoded) for one Accept-Encoding, and the encoding the server chose. */
function wireBytes(url, acceptEncoding, cookie) {
  return new Promise((resolve, reject) => {
    const req = http.get(url, { headers: { 'accept-encoding': acceptEncoding, ...(cookie ? { cookie } : {}) } }, (res) => {
      let n = 0;
      res.on('data', (chunk) => (n += chunk.length));
      res.on('end', () => resolve({ bytes: n, encoding: res.headers['content-encoding'] ?? 'identity', status: res.statusCode }));
      res.on('error', reject);
    });
    req.on('error', reject);
  });
}

/** One cold load of a page: its scripts, and their sizes summed four ways. */
async function loadOnce(browser, base, page) {
  const context = await browser.newContext({ baseURL: base });
  const tab = await context.newPage();
  if (page.signIn) await signInAs(tab, base, page.signIn);
  const scripts = new Map();
  tab.on('requestfinished', (req) => {
    const url = req.url();
    if (req.resourceType() !== 'script' && !url.endsWith('.js')) return;
    scripts.set(
      url,
      (async () => {
        const res = await req.response();
        const [body, sizes, headers] = await Promise.all([res.body(), req.sizes(), res.allHeaders()]);
        return {
          body,
          received: sizes.responseBodySize,
          encoding: headers['content-encoding'] ?? 'identity',
          asked: (await req.allHeaders())['accept-encoding'] ?? '',
        };
      })(),
    );
  });
  await tab.goto(page.resolve ? await page.resolve(context.request) : page.path, { waitUntil: 'networkidle' });
  const cookie = (await context.cookies()).map((c) => `${c.name}=${c.value}`).join('; ');
  const load = { files: [], raw: 0, gzip: 0, chromium: 0, br: 0, gzipWire: 0 };
  for (const [url, pending] of scripts) {
    const s = await pending;
    const gz = gzipSync(s.body, { level: 9 }).length;
    const [br, gzw] = [await wireBytes(url, 'br, gzip', cookie), await wireBytes(url, 'gzip', cookie)];
    load.files.push({
      path: new URL(url).pathname,
      raw: s.body.length,
      gzip: gz,
      chromium: s.received,
      chromiumEncoding: s.encoding,
      chromiumAsked: s.asked,
      br: br.bytes,
      brEncoding: br.encoding,
      gzipWire: gzw.bytes,
      gzipEncoding: gzw.encoding,
    });
    load.raw += s.body.length;
    load.gzip += gz;
    load.chromium += s.received;
    load.br += br.bytes;
    load.gzipWire += gzw.bytes;
  }
  await context.close();
  return load;
}

/** Loads every page LOADS times (pages alternated, each load cold); resolves to { page, loads }[] . */
export async function weighPages(pages = PAGES, loads = LOADS) {
  const app = await startShipped();
  const browser = await chromium.launch({
    executablePath: ensureChromium(),
    args: CHROMIUM_ARGS,
  });
  const out = pages.map((page) => ({ page, loads: [] }));
  try {
    for (let i = 0; i < loads; i++) {
      for (const row of out) row.loads.push(await loadOnce(browser, app.base, row.page));
    }
  } finally {
    await browser.close();
    await app.stop();
  }
  return out;
}

const kib = (n) => n / 1024;

/** The figures for one page's loads. */
export function pageFigures({ page, loads }) {
  const p = page.path;
  const files = `${loads[0].files.length} files`;
  return [
    figure(
      `${p} JS sent (gzip)`,
      'KiB',
      loads.map((l) => kib(l.gzip)),
      page.goalKiB == null ? null : { max: page.goalKiB },
      `${files}, gzip -9 of each script body`,
    ),
    figure(
      `${p} JS on the wire to Chromium`,
      'KiB',
      loads.map((l) => kib(l.chromium)),
      null,
      `transfer size; Chromium asked "${loads[0].files[0]?.chromiumAsked ?? ''}"`,
    ),
    figure(
      `${p} JS on the wire, Accept-Encoding br`,
      'KiB',
      loads.map((l) => kib(l.br)),
      null,
      'bytes of each script response as sent',
    ),
    figure(
      `${p} JS on the wire, Accept-Encoding gzip`,
      'KiB',
      loads.map((l) => kib(l.gzipWire)),
      null,
      'bytes of each script response as sent',
    ),
    figure(
      `${p} JS decoded`,
      'KiB',
      loads.map((l) => kib(l.raw)),
    ),
  ];
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const rows = await weighPages();
  const figures = rows.flatMap(pageFigures);
  console.log(`\nJavaScript sent per page (${LOADS} cold loads each; median, KiB):`);
  console.log(
    `  ${'page'.padEnd(16)} ${'files'.padStart(5)} ${'gzip -9'.padStart(9)} ${'Chromium'.padStart(9)} ${'br'.padStart(9)} ${'gzip'.padStart(9)} ${'decoded'.padStart(9)}`,
  );
  for (let i = 0; i < rows.length; i++) {
    const f = figures.slice(i * 5, i * 5 + 5).map((x) => x.median.toFixed(1).padStart(9));
    console.log(`  ${rows[i].page.path.padEnd(16)} ${String(rows[i].loads[0].files.length).padStart(5)} ${f.join(' ')}`);
  }
  const encodings = [...new Set(rows.flatMap((r) => r.loads[0].files.map((f) => `${f.chromiumEncoding}/${f.brEncoding}/${f.gzipEncoding}`)))];
  console.log(`  encodings seen (Chromium/br/gzip): ${encodings.join(', ')}`);
  writeFigures('pages', figures, { files: Object.fromEntries(rows.map((r) => [r.page.path, r.loads[0].files])) });
}
