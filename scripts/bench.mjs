// npm run bench: every benchmark in benchmarks/, one after another, on this machine as it is.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

const runs = [
  ['engine: plans per second', ['node_modules/.bin/vite-node', 'benchmarks/engine.ts']],
  ['pages: JavaScript bytes sent', ['node', 'benchmarks/page-bytes.mjs']],
  ['cut sheet: react-pdf vs Chromium print', ['node_modules/.bin/vite-node', 'benchmarks/cut-sheet.ts']],
];
let failed = false;
for (const [name, [cmd, file, ...rest]] of runs) {
  if (!existsSync(file)) continue;
  console.log(`\n=== ${name} ===`);
  const r = spawnSync(cmd, [file, ...rest], { stdio: 'inherit' });
  if (r.status !== 0) failed = true;
}
process.exit(failed ? 1 : 0);
