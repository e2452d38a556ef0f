// Plans per second for the allowance engine, on one core of this machine as it is.
// Run: NODE_ENV=production node_modules/.bin/vite-node benchmarks/engine.ts   (figures in benchmark-results/engine.json)
// The three goal figures use text as the shop types it (the calculator and saved fittings send text);
// the others are kept for comparison, without goals.
// The engine is measured as the server runs it: its modules bundled into one (esbuild, as the server
// build bundles them), not module by module as vite-node loads them for the tests (there each use of
// an imported name is a lookup and a getter call the server's code never pays).
import { cpus, loadavg } from 'node:os';
import { join } from 'node:path';
import { figure, writeFigures } from './lib/figures.mjs';
import { bundledEngine, engineCases, rate } from './lib/engine-cases';

const RUNS = 7;
const RUN_MS = 300;
const WARM_MS = 300;

const cases = engineCases(await bundledEngine(process.cwd(), join(process.cwd(), '.bench-engine'), 'engine'));

const fmt = (n: number) => Math.round(n).toLocaleString('en-US');
const load0 = loadavg()[0]!;
console.log(
  `allowance engine, node ${process.version}, ${cpus().length} cores (${cpus()[0]?.model ?? '?'}), load ${load0.toFixed(2)}, NODE_ENV=${process.env.NODE_ENV ?? ''}`,
);
console.log(`median of ${RUNS} runs of ${RUN_MS} ms after ${WARM_MS} ms warm-up; 1,000 varied inputs per case; plans per CPU-second\n`);

const figures = [];
for (const c of cases) {
  rate(c.run, WARM_MS);
  const runs = Array.from({ length: RUNS }, () => rate(c.run, RUN_MS));
  const f = figure(
    c.name,
    'plans/s',
    runs.map((r) => Math.round(r.cpu)),
    c.goal === null ? null : { min: c.goal },
    'per CPU-second, one core',
  );
  figures.push(f);
  const wall = [...runs.map((r) => r.wall)].sort((a, b) => a - b)[RUNS >> 1]!;
  console.log(
    `${c.name.padEnd(56)} ${fmt(f.median).padStart(10)} plans/s (${fmt(f.min)}–${fmt(f.max)}; wall ${fmt(wall)})${c.goal === null ? '' : `  goal ≥ ${fmt(c.goal)}: ${f.met ? 'met' : 'NOT MET'}`}`,
  );
}
const load1 = loadavg()[0]!;
console.log(`\nload average ${load0.toFixed(2)} → ${load1.toFixed(2)} (other work on the machine lowers these numbers)`);
writeFigures('engine', figures, { node: process.version, cores: cpus().length, loadAverage: [load0, load1], runMs: RUN_MS });
console.log('written: benchmark-results/engine.json');
