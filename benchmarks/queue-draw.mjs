// The queue page in Chromium on a shop with 1,178 open garments (issue 15: "at 1,177 open rows
// the queue page takes 1.8 s to draw"), against the server as `npm start` runs it: from the start
// of the navigation to the first row drawn, to the bench section's pager shown (the page is
// whole), and a turn of the page (Next page to the new rows). Warm: one navigation first.
// Usage: node benchmarks/queue-draw.mjs [runs=5]
import { mkdtempSync, rmSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { chromium } from 'playwright-core';
import { chromiumLaunchOptions } from '../scripts/chromium.mjs';
import { figure, writeFigures } from './lib/figures.mjs';
import { newShop, seedShop, signIn } from './lib/queue-load.mjs';
import { startShipped } from './lib/shipped-server.mjs';

const RUNS = Number(process.argv[2] ?? 5);
const dir = mkdtempSync(join(tmpdir(), 'cuffwright-queue-draw-'));
const email = `lead-draw-${Date.now()}@bench.test`;
let server;
let browser;
try {
  server = await startShipped({ dataDir: dir, timeoutMs: 600_000 });
  await newShop(server.base, 'Eleven Hundred Hems', email);
  await server.stop();
  const pg = new PGlite(join(dir, 'pglite'));
  // 1,400 garments, the newest 1,178 not yet collected (two a ticket).
  await seedShop(pg, email, 1400, 1178);
  const { rows } = await pg.query(
    `select count(*)::int as n from garments g join member m on m.organization_id = g.shop_id join "user" u on u.id = m.user_id where u.email = $1 and g.status <> 'collected'`,
    [email],
  );
  await pg.close();
  server = await startShipped({ dataDir: dir, timeoutMs: 600_000 });
  const cookie = await signIn(server.base, email);
  browser = await chromium.launch(chromiumLaunchOptions());
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  const url = new URL(server.base);
  await context.addCookies(
    cookie.split('; ').map((c) => ({ name: c.slice(0, c.indexOf('=')), value: c.slice(c.indexOf('=') + 1), domain: url.hostname, path: '/' })),
  );
  const page = await context.newPage();
  const firstRow = [];
  const whole = [];
  const turn = [];
  for (let r = 0; r <= RUNS; r++) {
    await page.goto(`${server.base}/queue`);
    await page.waitForSelector('[data-testid=queue-row]');
    const first = await page.evaluate(() => performance.now());
    // The page is whole once the bench section's pager is there (drawn with its rows). A build
    // without pages (before issue 15) draws every row in the commit that draws the first.
    const paged = await page.waitForSelector('nav[aria-label^="Pages of"]', { timeout: 5000 }).then(
      () => true,
      () => false,
    );
    const done = paged ? await page.evaluate(() => performance.now()) : first;
    const drawn = await page.locator('[data-testid=queue-row]').count();
    if (!paged) {
      console.log(
        `run ${r}: first row (every row) ${first.toFixed(0)} ms, ${drawn} rows drawn of ${rows[0].n} open, no pages (load ${loadavg()[0].toFixed(2)})`,
      );
      if (r > 0) firstRow.push(first);
      continue;
    }
    // A turn of the page: from the click to the first row of page 2 drawn.
    const t = await page.evaluate(
      () =>
        new Promise((resolve) => {
          const before = document.querySelector('[data-testid=queue-row]');
          const t0 = performance.now();
          const obs = new MutationObserver(() => {
            const now = document.querySelector('[data-testid=queue-row]');
            if (now && now !== before && /Page 2 of/.test(document.body.innerText)) {
              obs.disconnect();
              requestAnimationFrame(() => resolve(performance.now() - t0));
            }
          });
          obs.observe(document.body, { childList: true, subtree: true, characterData: true });
          [...document.querySelectorAll('button')].find((b) => b.textContent === 'Next page').click();
        }),
    );
    console.log(
      `run ${r}${r === 0 ? ' (warm-up)' : ''}: first row ${first.toFixed(0)} ms, whole ${done.toFixed(0)} ms, ${drawn} rows drawn of ${rows[0].n} open; next page ${t.toFixed(0)} ms (load ${loadavg()[0].toFixed(2)})`,
    );
    if (r === 0) continue;
    firstRow.push(first);
    whole.push(done);
    turn.push(t);
  }
  const load = loadavg()[0].toFixed(2);
  if (!turn.length) {
    console.log(
      `no pages: navigation to every row drawn, median ${firstRow.sort((a, b) => a - b)[Math.floor(firstRow.length / 2)].toFixed(0)} ms (load ${load})`,
    );
  } else
    writeFigures(
      'queue-draw',
      [
        figure(`queue page, ${rows[0].n} open garments: navigation to first row drawn`, 'ms', firstRow, { max: 1000 }),
        figure(`queue page, ${rows[0].n} open garments: navigation to the page whole (pager shown)`, 'ms', whole, { max: 1200 }),
        figure('queue page: Next page to its rows drawn', 'ms', turn, { max: 200 }),
      ],
      { load, runs: RUNS },
    );
} finally {
  await browser?.close();
  await server?.stop();
  rmSync(dir, { recursive: true, force: true });
}
