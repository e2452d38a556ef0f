// The engine against another version of itself, alternated A B A B in one process (issue 12: compare
// warm against warm, same load). A is another commit's src/lib/allowance and
// src/lib/server/cut-sheet/build.ts (before the layer split, cut-sheet/build.ts + types.ts right
// under src/lib), copied inside this checkout (its packages come from node_modules here). Both are
// bundled by esbuild as engine.ts bundles this checkout's (.bench-engine/engine-a.mjs and
// engine-b.mjs), so each runs as the server would run it:
//   mkdir -p .test-dist-ab/engA && git archive main src/lib/allowance src/lib/server/cut-sheet/build.ts src/lib/shared/cut-sheet-types.ts | tar -x -C .test-dist-ab/engA
//   NODE_ENV=production node_modules/.bin/vite-node benchmarks/engine-ab.ts [rounds]
// (ENGINE_A=<folder> for another copy.) Prints, per goal case of engine.ts (same inputs, same
// generator), the medians per CPU-second of A and B (this checkout), B/A and the pairwise ratios.
import { loadavg } from 'node:os';
import { join, resolve } from 'node:path';
import { bundledEngine, engineCases, rate } from './lib/engine-cases';

const ROUNDS = Number(process.argv[2] ?? 9);
const RUN_MS = 300;
const root = resolve(process.env.ENGINE_A ?? '.test-dist-ab/engA');
const out = join(process.cwd(), '.bench-engine');
// The three cases with goals, each side over inputs from the same seed.
const ca = engineCases(await bundledEngine(root, out, 'engine-a')).filter((c) => c.goal !== null);
const cb = engineCases(await bundledEngine(process.cwd(), out, 'engine-b')).filter((c) => c.goal !== null);
const cpuRate = (run: () => number, ms: number) => rate(run, ms).cpu;

const median = (s: number[]) => [...s].sort((p, q) => p - q)[s.length >> 1]!;
const fmt = (n: number) => Math.round(n).toLocaleString('en-US');

console.log(`engine A (${root}) against B (this checkout), ${ROUNDS} rounds of ${RUN_MS} ms each, alternated; load ${loadavg()[0]!.toFixed(2)}`);
for (let k = 0; k < ca.length; k++) {
  const { name, run: runA } = ca[k]!;
  const runB = cb[k]!.run;
  // The same checksum from both: the same plans were read.
  if (runA() !== runB()) console.log(`  ${name}: A and B read different plans (a change in output, not only speed)`);
  cpuRate(runA, RUN_MS);
  cpuRate(runB, RUN_MS);
  const a: number[] = [];
  const b: number[] = [];
  for (let r = 0; r < ROUNDS; r++) {
    // A B, then B A: neither side always runs first.
    if (r % 2 === 0) {
      a.push(cpuRate(runA, RUN_MS));
      b.push(cpuRate(runB, RUN_MS));
    } else {
      b.push(cpuRate(runB, RUN_MS));
      a.push(cpuRate(runA, RUN_MS));
    }
  }
  const pairs = a.map((x, i) => b[i]! / x);
  console.log(
    `${name.padEnd(52)} A ${fmt(median(a)).padStart(9)}  B ${fmt(median(b)).padStart(9)}  B/A ${(median(b) / median(a)).toFixed(2)}  (pairwise median ${median(pairs).toFixed(2)}, ${Math.min(...pairs).toFixed(2)}–${Math.max(...pairs).toFixed(2)})`,
  );
}
console.log(`load ${loadavg()[0]!.toFixed(2)}`);
