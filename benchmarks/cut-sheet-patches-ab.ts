// Named PDF speed patches off (A) and on (B), alternated in blocks in one process (A B, then B A),
// on the benchmark's sheets (two tapered legs, one in four overfull; USUAL=1: no overfull ones):
// wall and CPU per sheet, each sheet one sample, after eight untimed sheets per switch (a switch
// empties the memos). For judging one patch on a busy machine, where separate runs differ more
// than the patch does. Also printed: B's CPU over A's per round (each round's two blocks run
// back to back, so they share the machine's load), median and quartiles over the rounds.
// PAUSE=36 waits that many ms (idle, untimed) before each timed sheet: on this machine a render
// after a pause runs with its caches gone, as in the sheet benchmark, where Chromium's print comes
// between two of ours (7 ms back to back, about 10 ms after 36 ms away, 2026-12-05).
// NEW=style-memo,fast-runs NODE_ENV=production node_modules/.bin/vite-node benchmarks/cut-sheet-patches-ab.ts
import { loadavg } from 'node:os';
import { performance } from 'node:perf_hooks';
import { taperedPairSheet } from './cut-sheet-sample';
import { renderCutSheet } from '../src/lib/server/cut-sheet/render';
import { installPdfPlatform, PDF_PATCHES, uninstallPdfPlatform } from '../src/lib/server/pdf-platform/index';

const names = (process.env.NEW ?? '').split(',').filter(Boolean);
const unknown = names.filter((n) => !PDF_PATCHES.some((p) => p.name === n));
if (names.length === 0 || unknown.length > 0) throw new Error(`NEW must name patches of PDF_PATCHES (unknown: ${unknown.join(', ') || 'none given'})`);
const usual = process.env.USUAL === '1';
const sheet = (i: number) => taperedPairSheet(usual && i % 4 === 3 ? i + 1 : i);
const BLOCKS = Number(process.env.BLOCKS ?? 16);
const PER_BLOCK = 16;
const PAUSE = Number(process.env.PAUSE ?? 0);

const median = (a: number[]) => [...a].sort((x, y) => x - y)[a.length >> 1]!;
const use = (on: boolean) => {
  uninstallPdfPlatform();
  installPdfPlatform({ patches: on ? PDF_PATCHES : PDF_PATCHES.filter((p) => !names.includes(p.name)) });
};
for (let i = 0; i < 40; i++) await renderCutSheet(sheet(i));
const res = { A: { cpu: [] as number[], wall: [] as number[] }, B: { cpu: [] as number[], wall: [] as number[] } };
const ratios: number[] = [];
const load0 = loadavg()[0]!;
for (let r = 0; r < BLOCKS; r++) {
  const block = { A: [] as number[], B: [] as number[] };
  for (const mode of r % 2 ? (['B', 'A'] as const) : (['A', 'B'] as const)) {
    use(mode === 'B');
    for (let i = 0; i < 8; i++) await renderCutSheet(sheet(1000 + r * 97 + i));
    const list = Array.from({ length: PER_BLOCK }, (_, i) => sheet(100 + r * PER_BLOCK + i));
    for (const d of list) {
      if (PAUSE > 0) await new Promise((resolve) => setTimeout(resolve, PAUSE));
      const c = process.cpuUsage();
      const t = performance.now();
      await renderCutSheet(d);
      res[mode].wall.push(performance.now() - t);
      const u = process.cpuUsage(c);
      res[mode].cpu.push((u.user + u.system) / 1000);
      block[mode].push((u.user + u.system) / 1000);
    }
  }
  ratios.push(median(block.B) / median(block.A));
}
use(true);
const at = (a: number[], f: number) => [...a].sort((x, y) => x - y)[Math.floor(a.length * f)]!.toFixed(2);
for (const m of ['A', 'B'] as const)
  console.log(
    `${m} (${m === 'A' ? 'without' : 'with'}): wall p25 ${at(res[m].wall, 0.25)} median ${at(res[m].wall, 0.5)} ms; CPU p25 ${at(res[m].cpu, 0.25)} median ${at(res[m].cpu, 0.5)} ms`,
  );
console.log(`B/A CPU per round: median ${at(ratios, 0.5)} (p25 ${at(ratios, 0.25)}, p75 ${at(ratios, 0.75)})`);
console.log(
  `${BLOCKS} blocks of ${PER_BLOCK} sheets each way${PAUSE > 0 ? `, ${PAUSE} ms idle before each` : ''}; load ${load0.toFixed(1)}→${loadavg()[0]!.toFixed(1)}; patches: ${names.join(', ')}`,
);
