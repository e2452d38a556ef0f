// npm run bench: every benchmark in benchmarks/, one after another, on this machine as it is; then
// every figure they wrote to benchmark-results/ beside its goal (median and range over the runs).
import { spawnSync } from 'node:child_process';
import { existsSync, rmSync } from 'node:fs';
import { formatFigure, readAllFigures, RESULTS_DIR } from '../benchmarks/lib/figures.mjs';

const vn = 'node_modules/.bin/vite-node';
const runs = [
  ['engine: plans per second', [vn, 'benchmarks/engine.ts']],
  ['pages: JavaScript bytes sent', ['node', 'benchmarks/page-bytes.mjs']],
  ['cut sheet: ours vs Chromium printing from a warm page, alternated', [vn, 'benchmarks/cut-sheet.ts']],
  ['start: npm start to first 200, idle memory', ['node', 'benchmarks/start.mjs']],
  ['morning batch: 100 and 500 sheets, memory, a member beside it', ['node', 'benchmarks/batch.mjs']],
  ['queue: reads at a steady 200 req/s and on a 10,000-garment shop', ['node', 'benchmarks/queue.mjs']],
  ['queue page: drawing 1,178 open garments in Chromium', ['node', 'benchmarks/queue-draw.mjs']],
  ['queue on PostgreSQL: one server against two', ['bash', 'scripts/with-postgres.sh', 'node', 'benchmarks/queue-servers.mjs']],
];
const only = process.argv.slice(2);
rmSync(RESULTS_DIR, { recursive: true, force: true });
let failed = false;
for (const [name, [cmd, file, ...rest]] of runs) {
  if (!existsSync(file)) continue;
  if (only.length && !only.some((o) => [file, ...rest].some((a) => a.includes(o)))) continue;
  console.log(`\n=== ${name} ===`);
  const r = spawnSync(cmd, [file, ...rest], { stdio: 'inherit', env: { ...process.env, NODE_ENV: 'production' } });
  if (r.status !== 0) failed = true;
}
const all = readAllFigures();
if (all.length) {
  console.log('\n=== every figure beside its goal (median, range) ===');
  let unmet = 0;
  for (const b of all) {
    console.log(`\n${b.bench}`);
    for (const f of b.figures) {
      console.log(`  ${formatFigure(f)}`);
      if (f.met === false) unmet += 1;
    }
  }
  console.log(`\n${unmet === 0 ? 'every goal met' : `${unmet} goal(s) not met`} on this machine (${new Date().toISOString()})`);
}
process.exit(failed ? 1 : 0);
