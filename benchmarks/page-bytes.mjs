// Measures the JavaScript each page sends: loads it in headless Chromium from a built server and
// sums the gzip size of every script response. Prints a table and writes benchmark-results/pages.json.
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync, mkdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { chromium } from 'playwright-core';
import { buildIfNeeded } from '../scripts/build-if-needed.mjs';
import { ensureChromium } from '../scripts/chromium.mjs';

/** Pages to weigh: path, and whether a demo sign-in is needed first. */
export const PAGES = [
  { path: '/', signIn: null },
  { path: '/queue', signIn: signInAs('tailor@pinmark.test') },
  { path: '/tickets/new', signIn: signInAs('counter@pinmark.test') },
  { path: '/presets', signIn: signInAs('lead@pinmark.test') },
];

/** Signs the tab's context in as a demo account (every demo account shares one password). */
function signInAs(email) {
  return async (tab) => {
    const res = await tab.context().request.post(`${BASE}/api/auth/sign-in/email`, { data: { email, password: 'cuffwright-demo' }, headers: { origin: BASE } });
    if (!res.ok()) throw new Error(`sign-in of ${email} answered ${res.status()}`);
  };
}

const PORT = Number(process.env.BENCH_PORT || 4399);
const BASE = `http://localhost:${PORT}`;

async function waitFor(url, ms) {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    try {
      if ((await fetch(url)).status < 500) return;
    } catch {}
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no answer from ${url}`);
}

/** Weighs each page's scripts; resolves to rows { path, files, rawBytes, gzipBytes }. */
export async function weighPages(pages = PAGES) {
  buildIfNeeded('.bench-dist');
  const dataDir = mkdtempSync(join(tmpdir(), 'cuffwright-bench-'));
  const server = spawn('node', ['.bench-dist/server/entry.mjs'], {
    env: { ...process.env, PORT: String(PORT), HOST: '127.0.0.1', DATA_DIR: dataDir, BETTER_AUTH_URL: BASE },
    stdio: 'ignore',
  });
  const browser = await chromium.launch({
    executablePath: ensureChromium(),
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run',
      '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  const rows = [];
  try {
    await waitFor(`${BASE}/`, 60_000);
    for (const page of pages) {
      const context = await browser.newContext({ baseURL: BASE });
      const tab = await context.newPage();
      if (page.signIn) await page.signIn(tab);
      const scripts = new Map();
      tab.on('response', async (res) => {
        const url = res.url();
        if (res.request().resourceType() !== 'script' && !url.endsWith('.js')) return;
        scripts.set(url, res.body().catch(() => Buffer.alloc(0)));
      });
      await tab.goto(page.path, { waitUntil: 'networkidle' });
      let raw = 0;
      let gz = 0;
      for (const body of scripts.values()) {
        const buf = await body;
        raw += buf.length;
        gz += gzipSync(buf, { level: 9 }).length;
      }
      rows.push({ path: page.path, files: scripts.size, rawBytes: raw, gzipBytes: gz });
      await context.close();
    }
  } finally {
    await browser.close();
    server.kill('SIGTERM');
    await new Promise((r) => setTimeout(r, 300));
    rmSync(dataDir, { recursive: true, force: true });
  }
  return rows;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const rows = await weighPages();
  console.log('\nJavaScript sent per page (gzip, level 9):');
  for (const r of rows) {
    console.log(`  ${r.path.padEnd(28)} ${String(r.files).padStart(3)} files  ${(r.gzipBytes / 1024).toFixed(1).padStart(7)} KiB gzip  (${(r.rawBytes / 1024).toFixed(1)} KiB raw)`);
  }
  mkdirSync('benchmark-results', { recursive: true });
  writeFileSync('benchmark-results/pages.json', JSON.stringify(rows, null, 2));
}
