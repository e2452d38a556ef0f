// Warm cut sheets with names in other scripts, beside the usual Latin-only sheet (a measurement,
// not a test): NODE_ENV=production node_modules/.bin/vite-node benchmarks/cut-sheet-scripts.ts
// Prints CPU per sheet (min and median over chunks of 10 distinct sheets, the kinds interleaved
// so that load on the machine falls on each alike) and the PDF's size. OUT=file writes a Latin
// sheet, to compare two versions byte for byte. Invented names.
import { writeFileSync } from 'node:fs';
import { sampleSheet } from './cut-sheet-sample';
import { renderCutSheet } from '../src/lib/server/cut-sheet/render';

const KINDS = {
  latin: (i: number) => sampleSheet(i),
  cjk: (i: number) => ({ ...sampleSheet(i), assignee: ['林雨桐', '森川 ゆかり', '周子涵'][i % 3]! }),
  arabic: (i: number) => ({ ...sampleSheet(i), assignee: ['سلامة النجار', 'ليلى حداد'][i % 2]! }),
};
type Kind = keyof typeof KINDS;
const kinds = (process.env.KINDS?.split(',') ?? Object.keys(KINDS)) as Kind[];
const chunks = Number(process.env.CHUNKS ?? 12);

if (process.env.OUT) writeFileSync(process.env.OUT, await renderCutSheet(sampleSheet(42)));
for (const kind of kinds) for (let i = 0; i < 40; i++) await renderCutSheet(KINDS[kind](i));
const cpu = Object.fromEntries(kinds.map((k) => [k, [] as number[]]));
const bytes: Record<string, number> = {};
for (let c = 0; c < chunks; c++) {
  for (const kind of kinds) {
    // Built before the clock starts: only the render is timed.
    const list = Array.from({ length: 10 }, (_, i) => KINDS[kind](100 + c * 10 + i));
    const start = process.cpuUsage();
    let size = 0;
    for (const data of list) size = (await renderCutSheet(data)).length;
    const u = process.cpuUsage(start);
    cpu[kind]!.push((u.user + u.system) / 1000 / 10);
    bytes[kind] = size;
  }
}
for (const kind of kinds) {
  const t = cpu[kind]!.sort((a, b) => a - b);
  console.log(`${kind.padEnd(7)} cpu ms/sheet: min ${t[0]!.toFixed(1)} median ${t[Math.floor(t.length / 2)]!.toFixed(1)}   pdf ${bytes[kind]} bytes`);
}
