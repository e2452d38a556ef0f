// Plans per second for the allowance engine, on one core of this machine as it is.
// Run: NODE_ENV=production node_modules/.bin/vite-node benchmarks/engine.ts   (figures in benchmark-results/engine.json)
// The three goal figures use text as the shop types it (the calculator and saved fittings send text);
// the others are kept for comparison, without goals.
// The engine is measured as the server runs it: its modules bundled into one (esbuild, as the server
// build bundles them), not module by module as vite-node loads them for the tests (there each use of
// an imported name is a lookup and a getter call the server's code never pays).
import { mkdirSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { build } from 'esbuild';
import type { CuffInput, HemInput, HemTaperInput, TaperInput } from '../src/lib/allowance/index';
import type * as Allowance from '../src/lib/allowance/index';
import type { LegOrder, planLeg as PlanLeg } from '../src/lib/server/cut-sheet/build';
import { figure, writeFigures } from './lib/figures.mjs';

const outDir = join(process.cwd(), '.bench-engine');
mkdirSync(outDir, { recursive: true });
await build({
  stdin: {
    contents:
      "export { checkHemTaper, checkTaper, planCuff, planHem } from './src/lib/allowance/index';\nexport { planLeg } from './src/lib/server/cut-sheet/build';\n",
    resolveDir: process.cwd(),
    loader: 'ts',
  },
  bundle: true,
  format: 'esm',
  platform: 'node',
  outfile: join(outDir, 'engine.mjs'),
  logLevel: 'warning',
});
const engine = (await import(/* @vite-ignore */ pathToFileURL(join(outDir, 'engine.mjs')).href)) as Pick<
  typeof Allowance,
  'checkHemTaper' | 'checkTaper' | 'planCuff' | 'planHem'
> & { planLeg: typeof PlanLeg };
const { checkHemTaper, checkTaper, planCuff, planHem, planLeg } = engine;

const RUNS = 7;
const RUN_MS = 300;
const WARM_MS = 300;

// A small deterministic generator, so every run plans the same varied inputs.
let seed = 20240601;
const rand = (n: number) => {
  seed = (seed * 1103515245 + 12345) % 2147483648;
  return seed % n;
};
const eighths = ['', ' 1/8', ' 1/4', ' 3/8', ' 1/2', ' 5/8', ' 3/4', ' 7/8'];
const sixteenths = ['', ' 1/16', ' 1/8', ' 3/16', ' 1/4', ' 5/16', ' 3/8', ' 7/16', ' 1/2', ' 9/16', ' 5/8', ' 11/16', ' 3/4', ' 13/16', ' 7/8', ' 15/16'];
const many = <T>(make: () => T): T[] => Array.from({ length: 1000 }, make);

// Typed as at the bench: depths 1 to 2 7/16 in, 3 to 7 7/8 in of cloth (some short), old creases above and below the mark.
const depthText = () => `${1 + rand(2)}${sixteenths[rand(8)]}`;
const clothText = () => `${3 + rand(5)}${eighths[rand(8)]}`;
const creaseText = () => `${rand(3) === 0 ? '-' : ''}${rand(5)}${eighths[rand(8)]}`;
const fullCuffText = many<CuffInput>(() => ({ unit: 'in', cuffDepth: depthText(), available: clothText(), oldCrease: creaseText() }));
const taperWidths = () => ({
  widthAtEdge: `${7 + rand(2)}${eighths[rand(8)]}`,
  widthAbove: `${8 + rand(3)}${eighths[rand(8)]}`,
  heightAbove: `${12 + rand(12)}`,
  seamAllowance: `${rand(8)}/16`,
});
const tapersText = many<TaperInput>(() => ({ unit: 'in', cuffDepth: depthText(), ...taperWidths() }));
// A leg as the cut sheet plans it: the cuff, and the taper check on the same depth (planLeg in cut-sheet/build.ts).
const taperedLegs = many<LegOrder>(() => ({
  side: 'left',
  finish: 'cuff',
  input: { unit: 'in', precision: 16, cuffDepth: depthText(), available: clothText(), oldCrease: creaseText() },
  taper: taperWidths(),
}));

const cuffDepthIn = () => 1 + rand(24) / 16;
const cuffNumbers = many<CuffInput>(() => ({ unit: 'in', cuffDepth: cuffDepthIn() }));
const cuffNumbersFull = many<CuffInput>(() => ({ unit: 'in', cuffDepth: cuffDepthIn(), available: 3 + rand(40) / 8, oldCrease: -2 + rand(64) / 8 }));
const cuffStrings = many<CuffInput>(() => ({ unit: 'in', cuffDepth: `1${eighths[rand(8)]}` }));
const cuffSums = many<CuffInput>(() => ({ unit: 'in', cuffDepth: '1 1/2', available: `4${eighths[rand(8)]} + 1/16` }));
const cuffMetric = many<CuffInput>(() => ({ unit: 'mm', cuffDepth: 30 + rand(30), available: 90 + rand(80), oldCrease: rand(60) - 30 }));
const hems = many<HemInput>(() => ({ unit: 'in', hemAllowance: 1.25 + rand(6) / 8, slope: rand(5) / 8, available: 1 + rand(24) / 8 }));
const tapersNumbers = many<TaperInput>(() => ({
  unit: 'in',
  cuffDepth: cuffDepthIn(),
  widthAtEdge: 7 + rand(16) / 8,
  widthAbove: 8 + rand(24) / 8,
  heightAbove: 12 + rand(12),
  seamAllowance: rand(8) / 16,
}));
const hemTapers = many<HemTaperInput>(() => ({ unit: 'in', hemAllowance: `1${eighths[rand(8)]}`, ...taperWidths() }));

interface Case {
  name: string;
  goal: number | null;
  run: () => number;
}

// Each case returns a checksum read from the plans' text, so no plan or text goes unused.
const over =
  <T, P>(inputs: T[], plan: (i: T) => P, read: (p: P) => number) =>
  () => {
    let sum = 0;
    for (const input of inputs) sum += read(plan(input));
    return sum;
  };
const cuffRead = (p: ReturnType<typeof planCuff>) => p.required.text.length + p.lines[1]!.belowMark.text.length + p.warnings.length;
const taperRead = (p: ReturnType<typeof checkTaper>) => p.targetWidth.text.length + p.lines.at(-1)!.perSide.text.length + p.warnings.length;
const legRead = (l: ReturnType<typeof planLeg>) =>
  (l.plan.kind === 'cuff' ? cuffRead(l.plan) : 0) + (l.taper ? taperRead(l.taper.plan as ReturnType<typeof checkTaper>) : 0);

const cases: Case[] = [
  { name: 'full cuff plan (typed: depth, cloth, old crease)', goal: 600_000, run: over(fullCuffText, planCuff, cuffRead) },
  { name: 'checkTaper (typed widths, seam allowance)', goal: 200_000, run: over(tapersText, checkTaper, taperRead) },
  { name: 'tapered cuff leg (cut sheet planLeg: cuff + taper)', goal: 200_000, run: over(taperedLegs, planLeg, legRead) },
  { name: 'planCuff, numbers, depth only', goal: null, run: over(cuffNumbers, planCuff, cuffRead) },
  { name: 'planCuff, numbers, available + old crease', goal: null, run: over(cuffNumbersFull, planCuff, cuffRead) },
  { name: 'planCuff, typed, depth only', goal: null, run: over(cuffStrings, planCuff, cuffRead) },
  { name: 'planCuff, mm numbers, available + old crease', goal: null, run: over(cuffMetric, planCuff, cuffRead) },
  { name: 'planCuff, typed sums', goal: null, run: over(cuffSums, planCuff, cuffRead) },
  { name: 'planCuff + JSON.stringify, typed full plan', goal: null, run: over(fullCuffText, planCuff, (p) => JSON.stringify(p).length) },
  { name: 'checkTaper, numbers', goal: null, run: over(tapersNumbers, checkTaper, taperRead) },
  { name: 'planHem, numbers, slope + available', goal: null, run: over(hems, planHem, (p) => p.required.text.length + p.lines[0]!.frontBelowMark.text.length) },
  { name: 'checkHemTaper, typed', goal: null, run: over(hemTapers, checkHemTaper, taperRead) },
];

// Plans per CPU-second of one run (and per wall second): on this shared 2-core machine wall time also
// counts the time other work held the core, so the figure is judged per CPU-second.
function rate(run: () => number, ms: number): { wall: number; cpu: number; checksum: number } {
  let plans = 0;
  let checksum = 0;
  const cpu0 = process.cpuUsage();
  const t0 = performance.now();
  let t = t0;
  while (t - t0 < ms) {
    checksum += run();
    plans += 1000;
    t = performance.now();
  }
  const cpu = process.cpuUsage(cpu0);
  return { wall: plans / ((t - t0) / 1000), cpu: plans / ((cpu.user + cpu.system) / 1e6), checksum };
}

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
