// Cut sheet speed: a warm single sheet, a 100-sheet batch, and the same sheet printed to PDF by
// headless Chromium, in the same run. Goal: warm ≤ 40 ms and ≥ 10× faster than the browser.
// Run: node_modules/.bin/vite-node bench/cut-sheet.ts
import { spawnSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { loadavg } from 'node:os';
import { performance } from 'node:perf_hooks';
import { fileURLToPath } from 'node:url';
import { chromium } from 'playwright-core';
import { buildCutSheet } from '../src/lib/cut-sheet/build';
import { renderCutSheet, renderCutSheets } from '../src/lib/cut-sheet/render';
import { cutSheetHtml } from './cut-sheet-html';

// Measure what the built server runs: React's production build, not vite-node's dev transform.
if (process.env.NODE_ENV !== 'production') {
  const env = { ...process.env, NODE_ENV: 'production' };
  const r = spawnSync('node_modules/.bin/vite-node', [fileURLToPath(import.meta.url)], { stdio: 'inherit', env });
  process.exit(r.status ?? 1);
}

const WARM_RUNS = 25;
const BATCH = 100;
const BROWSER_RUNS = 12;

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
};
const round = (x: number) => Math.round(x * 10) / 10;

async function time<T>(fn: () => Promise<T>): Promise<[number, T]> {
  const t = performance.now();
  const out = await fn();
  return [performance.now() - t, out];
}

const sheet = (ticket: string) =>
  buildCutSheet(
    {
      shop: 'Hartley & Sons Alterations',
      ticket,
      garment: 'Navy wool flannel trousers',
      due: '2025-03-14',
      assignee: 'Sam Ortiz',
      link: `https://cuffwright.example/garments/${ticket}`,
    },
    [{ side: 'left', finish: 'cuff', input: { unit: 'in', precision: 8, cuffDepth: '1 1/2', available: 5 } }],
  );

const one = sheet('1042');
const [firstMs] = await time(() => renderCutSheet(one));
// JIT and the shaping memo settle over the first dozen renders.
for (let i = 0; i < 12; i++) await renderCutSheet(one);
const warm: number[] = [];
let bytes = 0;
const cpu = process.cpuUsage();
for (let i = 0; i < WARM_RUNS; i++) {
  const [ms, pdf] = await time(() => renderCutSheet(one));
  warm.push(ms);
  bytes = pdf.byteLength;
}
const cpuUsed = process.cpuUsage(cpu);
const warmCpuMs = (cpuUsed.user + cpuUsed.system) / 1000 / WARM_RUNS;
const warmMs = median(warm);

const list = Array.from({ length: BATCH }, (_, i) => sheet(String(2000 + i)));
const batches: number[] = [];
for (let i = 0; i < 3; i++) batches.push((await time(() => renderCutSheets(list)))[0]);
const batchMs = median(batches);

const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
  args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
});
const page = await browser.newPage();
const html = cutSheetHtml(one);
const print = async () => {
  await page.setContent(html);
  return page.pdf({ format: 'Letter', printBackground: true, preferCSSPageSize: true });
};
for (let i = 0; i < 3; i++) await print();
const browserRuns: number[] = [];
for (let i = 0; i < BROWSER_RUNS; i++) browserRuns.push((await time(print))[0]);
await browser.close();
const browserMs = median(browserRuns);

const result = {
  date: new Date().toISOString(),
  node: process.version,
  // Two cores shared with other work: a high load average inflates every wall time below.
  loadAverage1m: round(loadavg()[0]!),
  firstRenderMs: round(firstMs),
  warmSingleMs: { median: round(warmMs), runs: WARM_RUNS, min: round(Math.min(...warm)), max: round(Math.max(...warm)), cpuMeanMs: round(warmCpuMs) },
  singleSheetBytes: bytes,
  batch: { sheets: BATCH, totalMs: round(batchMs), perSheetMs: round(batchMs / BATCH), runs: batches.length },
  chromiumPrint: { medianMs: round(browserMs), runs: BROWSER_RUNS },
  ratioChromiumOverReactPdf: round(browserMs / warmMs),
  goals: { warmSingleAtMost40Ms: warmMs <= 40, atLeast10xFasterThanChromium: browserMs / warmMs >= 10 },
};
console.log(JSON.stringify(result, null, 2));
mkdirSync('bench-results', { recursive: true });
writeFileSync('bench-results/cut-sheet.json', `${JSON.stringify(result, null, 2)}\n`);
