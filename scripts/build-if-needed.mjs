// Builds the app when dist/ is missing or older than any source it is built from.
import { existsSync, statSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { spawnSync } from 'node:child_process';

// The build plugins astro.config.mjs imports count too: a changed plugin changes what is built.
const SOURCES = [
  'src',
  'public',
  'astro.config.mjs',
  'scripts/vite-node-worker.mjs',
  'scripts/precompress.mjs',
  'scripts/vite-icu-catalog.mjs',
  'package.json',
  // patch-package's patches change the adapter bundled into the server.
  'patches',
  'tsconfig.json',
];

function newest(path) {
  const st = statSync(path);
  if (!st.isDirectory()) return st.mtimeMs;
  let t = st.mtimeMs;
  for (const name of readdirSync(path)) t = Math.max(t, newest(join(path, name)));
  return t;
}

/**
 * The build's environment: always NODE_ENV=production, whoever asks. The server is run that way, and
 * a build made under vitest's NODE_ENV=test compiles JSX for React's development runtime, which
 * the production server cannot run (every page failed: "jsxDEV is not a function").
 */
export function buildEnv(outDir, env = process.env) {
  return { ...env, NODE_ENV: 'production', ASTRO_OUT_DIR: outDir };
}

/** Runs `astro build` into outDir unless its server entry is newer than every source. */
export function buildIfNeeded(outDir = 'dist', env = process.env) {
  const entry = join(outDir, 'server', 'entry.mjs');
  const sourcesTime = Math.max(...SOURCES.filter(existsSync).map(newest));
  if (existsSync(entry) && statSync(entry).mtimeMs > sourcesTime) return;
  console.log(`Building the app into ${outDir}/ …`);
  const r = spawnSync('node_modules/.bin/astro', ['build'], {
    stdio: 'inherit',
    env: buildEnv(outDir, env),
  });
  if (r.status !== 0) process.exit(r.status ?? 1);
}
