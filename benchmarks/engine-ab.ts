// The engine against another version of itself, alternated A B A B in one process (issue 12: compare
// warm against warm, same load). A is a copy of another commit's src/lib/allowance and
// src/lib/server/cut-sheet/build.ts (before the layer split, cut-sheet/build.ts + types.ts right under src/lib)
// inside this checkout (vite-node serves only files under it; build.ts reaches the engine by a relative path, so
// A's sheet runs on A's engine):
//   mkdir -p .test-dist-ab/engA && git archive main src/lib/allowance src/lib/server/cut-sheet/build.ts src/lib/shared/cut-sheet-types.ts | tar -x -C .test-dist-ab/engA
//   NODE_ENV=production node_modules/.bin/vite-node benchmarks/engine-ab.ts [rounds]
// (ENGINE_A=<folder> for another copy.) Prints, per goal case of engine.ts (same inputs, same
// generator), the medians per CPU-second of A and B (this checkout), B/A and the pairwise ratios.
import { existsSync } from 'node:fs';
import { loadavg } from 'node:os';
import { resolve } from 'node:path';
import * as B from '../src/lib/allowance/index';
import * as BB from '../src/lib/server/cut-sheet/build';

const ROUNDS = Number(process.argv[2] ?? 9);
const RUN_MS = 300;
const root = resolve(process.env.ENGINE_A ?? '.test-dist-ab/engA');
const A: typeof B = await import(`${root}/src/lib/allowance/index.ts`);
// The cut sheet's build moved to src/lib/server/ with the layer split; an A from before it has the old path.
const buildA = ['server/cut-sheet', 'cut-sheet'].map((d) => `${root}/src/lib/${d}/build.ts`).find((p) => existsSync(p));
const AB: typeof BB = await import(buildA ?? `${root}/src/lib/server/cut-sheet/build.ts`);

// The generator and the first three input sets exactly as benchmarks/engine.ts makes them.
let seed = 20240601;
const rand = (n: number) => {
  seed = (seed * 1103515245 + 12345) % 2147483648;
  return seed % n;
};
const eighths = ['', ' 1/8', ' 1/4', ' 3/8', ' 1/2', ' 5/8', ' 3/4', ' 7/8'];
const sixteenths = ['', ' 1/16', ' 1/8', ' 3/16', ' 1/4', ' 5/16', ' 3/8', ' 7/16', ' 1/2', ' 9/16', ' 5/8', ' 11/16', ' 3/4', ' 13/16', ' 7/8', ' 15/16'];
const many = <T>(make: () => T): T[] => Array.from({ length: 1000 }, make);
const depthText = () => `${1 + rand(2)}${sixteenths[rand(8)]}`;
const clothText = () => `${3 + rand(5)}${eighths[rand(8)]}`;
const creaseText = () => `${rand(3) === 0 ? '-' : ''}${rand(5)}${eighths[rand(8)]}`;
const fullCuffText = many<B.CuffInput>(() => ({ unit: 'in', cuffDepth: depthText(), available: clothText(), oldCrease: creaseText() }));
const taperWidths = () => ({
  widthAtEdge: `${7 + rand(2)}${eighths[rand(8)]}`,
  widthAbove: `${8 + rand(3)}${eighths[rand(8)]}`,
  heightAbove: `${12 + rand(12)}`,
  seamAllowance: `${rand(8)}/16`,
});
const tapersText = many<B.TaperInput>(() => ({ unit: 'in', cuffDepth: depthText(), ...taperWidths() }));
const taperedLegs = many<BB.LegOrder>(() => ({
  side: 'left',
  finish: 'cuff',
  input: { unit: 'in', precision: 16, cuffDepth: depthText(), available: clothText(), oldCrease: creaseText() },
  taper: taperWidths(),
}));

type Cuff = ReturnType<typeof B.planCuff>;
type Taper = ReturnType<typeof B.checkTaper>;
const cuffRead = (p: Cuff) => p.required.text.length + p.lines[1]!.belowMark.text.length + p.warnings.length;
const taperRead = (p: Taper) => p.targetWidth.text.length + p.lines.at(-1)!.perSide.text.length + p.warnings.length;
const legRead = (l: ReturnType<typeof BB.planLeg>) => (l.plan.kind === 'cuff' ? cuffRead(l.plan) : 0) + (l.taper ? taperRead(l.taper.plan) : 0);
const over =
  <T, P>(inputs: T[], plan: (i: T) => P, read: (p: P) => number) =>
  () => {
    let sum = 0;
    for (const input of inputs) sum += read(plan(input));
    return sum;
  };
const cases = (E: typeof B, L: typeof BB): [string, () => number][] => [
  ['full cuff plan (typed)', over(fullCuffText, E.planCuff, cuffRead)],
  ['checkTaper (typed)', over(tapersText, E.checkTaper, taperRead)],
  ['tapered cuff leg (planLeg)', over(taperedLegs, L.planLeg, legRead)],
];

// Plans per CPU-second over one run of `ms`.
function rate(run: () => number, ms: number): number {
  let plans = 0;
  const cpu0 = process.cpuUsage();
  const t0 = performance.now();
  while (performance.now() - t0 < ms) {
    run();
    plans += 1000;
  }
  const cpu = process.cpuUsage(cpu0);
  return plans / ((cpu.user + cpu.system) / 1e6);
}
const median = (s: number[]) => [...s].sort((p, q) => p - q)[s.length >> 1]!;
const fmt = (n: number) => Math.round(n).toLocaleString('en-US');

console.log(`engine A (${root}) against B (this checkout), ${ROUNDS} rounds of ${RUN_MS} ms each, alternated; load ${loadavg()[0]!.toFixed(2)}`);
const ca = cases(A, AB);
const cb = cases(B, BB);
for (let k = 0; k < ca.length; k++) {
  const [name, runA] = ca[k]!;
  const runB = cb[k]![1];
  // The same checksum from both: the same plans were read.
  if (runA() !== runB()) console.log(`  ${name}: A and B read different plans (a change in output, not only speed)`);
  rate(runA, RUN_MS);
  rate(runB, RUN_MS);
  const a: number[] = [];
  const b: number[] = [];
  for (let r = 0; r < ROUNDS; r++) {
    // A B, then B A: neither side always runs first.
    if (r % 2 === 0) {
      a.push(rate(runA, RUN_MS));
      b.push(rate(runB, RUN_MS));
    } else {
      b.push(rate(runB, RUN_MS));
      a.push(rate(runA, RUN_MS));
    }
  }
  const pairs = a.map((x, i) => b[i]! / x);
  console.log(
    `${name.padEnd(28)} A ${fmt(median(a)).padStart(9)}  B ${fmt(median(b)).padStart(9)}  B/A ${(median(b) / median(a)).toFixed(2)}  (pairwise median ${median(pairs).toFixed(2)}, ${Math.min(...pairs).toFixed(2)}–${Math.max(...pairs).toFixed(2)})`,
  );
}
console.log(`load ${loadavg()[0]!.toFixed(2)}`);
