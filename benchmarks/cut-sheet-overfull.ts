// Overfull sheets, split from their first layout (pdf-platform/split-laid-out.ts) or laid out
// again wrapped (that patch off), alternated in one process on the benchmark's sheets (two tapered
// legs, one in four overfull): CPU per sheet over chunks of 8, and each overfull sheet's own CPU.
// NODE_ENV=production node_modules/.bin/vite-node benchmarks/cut-sheet-overfull.ts
import { loadavg } from 'node:os';
import { taperedPairSheet } from './cut-sheet-sample';
import { renderCutSheet } from '../src/lib/server/cut-sheet/render';
import { splitFromFirstLayout } from '../src/lib/server/pdf-platform/split-laid-out';
for (let i = 0; i < 40; i++) await renderCutSheet(taperedPairSheet(i));
const res: Record<string, number[]> = { on: [], off: [], overOn: [], overOff: [] };
const load0 = loadavg()[0]!;
for (let r = 0; r < 8; r++) {
  for (const mode of r % 2 ? ['off', 'on'] : ['on', 'off']) {
    const undo = splitFromFirstLayout();
    if (mode === 'off') undo();
    const list = Array.from({ length: 8 }, (_, i) => taperedPairSheet(100 + r * 8 + i));
    const s = process.cpuUsage();
    for (const d of list) {
      const t = process.cpuUsage();
      await renderCutSheet(d);
      const u = process.cpuUsage(t);
      if (d.existingFinish === 'cuff') res[mode === 'on' ? 'overOn' : 'overOff']!.push((u.user + u.system) / 1000);
    }
    const u = process.cpuUsage(s);
    res[mode]!.push((u.user + u.system) / 1000 / 8);
    splitFromFirstLayout();
  }
}
const med = (a: number[]) => [...a].sort((x, y) => x - y)[Math.floor(a.length / 2)]!.toFixed(1);
const min = (a: number[]) => Math.min(...a).toFixed(1);
console.log(
  `load ${load0.toFixed(1)}→${loadavg()[0]!.toFixed(1)}; cpu ms/sheet (1 in 4 overfull) split off: median ${med(res.off!)} min ${min(res.off!)}; on: median ${med(res.on!)} min ${min(res.on!)}; overfull alone off: median ${med(res.overOff!)} min ${min(res.overOff!)}; on: median ${med(res.overOn!)} min ${min(res.overOn!)}`,
);
