// Warm cut-sheet renders in a loop, for a CPU profile or a quick A/B on a busy machine:
// NODE_ENV=production node --cpu-prof node_modules/vite-node/vite-node.mjs benchmarks/cut-sheet-profile.ts
// Prints CPU per sheet over chunks of 10 distinct sheets: the lowest chunk is the least disturbed.
// SHEETS=single profiles the one-leg sheet; the default is the benchmark's (two tapered legs, one
// in four overfull); USUAL=1 leaves the overfull ones out (the benchmark's median sheet is a usual one).
import { writeFileSync } from 'node:fs';
import { sampleSheet, taperedPairSheet } from './cut-sheet-sample';
import { renderCutSheet } from '../src/lib/server/cut-sheet/render';

const pick = process.env.SHEETS === 'single' ? sampleSheet : taperedPairSheet;
const sheet = (i: number) => pick(process.env.USUAL === '1' && i % 4 === 3 ? i + 1 : i);

const chunks = Number(process.env.CHUNKS ?? 15);
if (process.env.OUT) writeFileSync(process.env.OUT, await renderCutSheet(sheet(42)));
for (let i = 0; i < 40; i++) await renderCutSheet(sheet(i));
const cpu: number[] = [];
for (let c = 0; c < chunks; c++) {
  // Planned before the clock starts, as in benchmarks/cut-sheet.ts: only the render is timed.
  const list = Array.from({ length: 10 }, (_, i) => sheet(100 + c * 10 + i));
  const start = process.cpuUsage();
  for (const data of list) await renderCutSheet(data);
  const u = process.cpuUsage(start);
  cpu.push((u.user + u.system) / 1000 / 10);
}
cpu.sort((a, b) => a - b);
console.log(`cpu ms/sheet: min ${cpu[0]!.toFixed(1)} median ${cpu[Math.floor(cpu.length / 2)]!.toFixed(1)}`);
