// What the engine benchmarks share: the engine bundled into one module as the server build bundles
// it (esbuild), the inputs typed as at the bench (one seeded generator, so every run plans the same
// inputs in the same order), the cases with their goals, and plans per CPU-second of one run.
// benchmarks/engine.ts measures this checkout; benchmarks/engine-ab.ts sets it against another.
import { existsSync, mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { build } from 'esbuild';
import type { CuffInput, HemInput, HemTaperInput, TaperInput } from '../../src/lib/allowance/index';
import type * as Allowance from '../../src/lib/allowance/index';
import type { LegOrder, planLeg as PlanLeg } from '../../src/lib/server/cut-sheet/build';

/** The engine as a benchmark calls it: the four plans and the cut sheet's planLeg. */
export type Engine = Pick<typeof Allowance, 'checkHemTaper' | 'checkTaper' | 'planCuff' | 'planHem'> & { planLeg: typeof PlanLeg };

/**
 * Bundles the engine found under `root` (a checkout, or another commit's copy of its sources) into
 * `outDir/<name>.mjs` (a name per engine: a module is imported once) and imports it. A copy from
 * before the layer split keeps planLeg in src/lib/cut-sheet/build.ts.
 */
export async function bundledEngine(root: string, outDir: string, name: string): Promise<Engine> {
  const from = resolve(root);
  const buildTs = ['server/cut-sheet', 'cut-sheet'].map((d) => `./src/lib/${d}/build`).find((p) => existsSync(join(from, `${p}.ts`)));
  mkdirSync(outDir, { recursive: true });
  const outfile = join(outDir, `${name}.mjs`);
  await build({
    stdin: {
      contents: `export { checkHemTaper, checkTaper, planCuff, planHem } from './src/lib/allowance/index';\nexport { planLeg } from '${buildTs ?? './src/lib/server/cut-sheet/build'}';\n`,
      resolveDir: from,
      loader: 'ts',
    },
    bundle: true,
    format: 'esm',
    platform: 'node',
    outfile,
    logLevel: 'warning',
  });
  return (await import(/* @vite-ignore */ pathToFileURL(outfile).href)) as Engine;
}

/** One case: a name, its goal in plans per second (or none), and a run of 1,000 plans returning a checksum. */
export interface Case {
  name: string;
  goal: number | null;
  run: () => number;
}

/** The cases of engine.ts over `engine`, the three with goals first; inputs made afresh from the one seed. */
export function engineCases(engine: Engine): Case[] {
  const { checkHemTaper, checkTaper, planCuff, planHem, planLeg } = engine;
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

  return [
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
    {
      name: 'planHem, numbers, slope + available',
      goal: null,
      run: over(hems, planHem, (p) => p.required.text.length + p.lines[0]!.frontBelowMark.text.length),
    },
    { name: 'checkHemTaper, typed', goal: null, run: over(hemTapers, checkHemTaper, taperRead) },
  ];
}

/**
 * Plans per CPU-second of one run of `ms` (and per wall second): on this shared 2-core machine wall
 * time also counts the time other work held the core, so the figure is judged per CPU-second.
 */
export function rate(run: () => number, ms: number): { wall: number; cpu: number; checksum: number } {
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
