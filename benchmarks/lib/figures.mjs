// One shape for every benchmark's figures, so `npm run bench` can print them all beside their goals.
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

/** The folder every benchmark writes its figures to (git-ignored). */
export const RESULTS_DIR = 'benchmark-results';

/** Median, min and max of a list of samples (numbers); the median of an even count is the mean of the middle two. */
export function stats(samples) {
  if (samples.length === 0) throw new Error('no samples');
  const s = [...samples].sort((a, b) => a - b);
  const mid = s.length >> 1;
  const median = s.length % 2 ? s[mid] : (s[mid - 1] + s[mid]) / 2;
  return { median, min: s[0], max: s[s.length - 1], runs: s.length };
}

/** The p-th percentile (0–100) of samples, nearest-rank. */
export function percentile(samples, p) {
  const s = [...samples].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.max(0, Math.ceil((p / 100) * s.length) - 1))];
}

/**
 * One figure: `samples` are the per-run values (the median is reported, with the range);
 * `goal` is { max } or { min } in the same unit, or null for a figure reported without a goal.
 * @param {string} name
 * @param {string} unit
 * @param {number[]} samples
 * @param {{ max: number, min?: undefined } | { min: number, max?: undefined } | null} [goal]
 * @param {string} [note]
 */
export function figure(name, unit, samples, goal = null, note = '') {
  const st = stats(samples);
  const met = goal == null ? null : goal.max != null ? st.median <= goal.max : st.median >= goal.min;
  return { name, unit, ...st, goal, met, note };
}

/** Writes a benchmark's figures to benchmark-results/<bench>.json (read by scripts/bench.mjs). */
export function writeFigures(bench, figures, extra = {}) {
  mkdirSync(RESULTS_DIR, { recursive: true });
  writeFileSync(join(RESULTS_DIR, `${bench}.json`), `${JSON.stringify({ bench, at: new Date().toISOString(), figures, ...extra }, null, 2)}\n`);
}

/** Every figure written so far, by benchmark, in file-name order. */
export function readAllFigures() {
  let names = [];
  try {
    names = readdirSync(RESULTS_DIR)
      .filter((n) => n.endsWith('.json'))
      .sort();
  } catch {
    return [];
  }
  const out = [];
  for (const n of names) {
    try {
      const data = JSON.parse(readFileSync(join(RESULTS_DIR, n), 'utf8'));
      if (Array.isArray(data.figures)) out.push(data);
    } catch {
      // A file from an older benchmark shape: not part of the summary.
    }
  }
  return out;
}

const fmt = (v) => (Math.abs(v) >= 100 ? Math.round(v).toLocaleString('en-US') : Number(v.toPrecision(3)).toString());

/** One printed line: name, median, range, goal and verdict. */
export function formatFigure(f) {
  const goal = f.goal == null ? '—' : f.goal.max != null ? `≤ ${fmt(f.goal.max)}` : `≥ ${fmt(f.goal.min)}`;
  const verdict = f.met == null ? '' : f.met ? 'met' : 'NOT MET';
  const range = f.runs > 1 ? `(${fmt(f.min)}–${fmt(f.max)}, ${f.runs} runs)` : '(1 run)';
  return `${f.name.padEnd(58)} ${`${fmt(f.median)} ${f.unit}`.padStart(16)} ${range.padEnd(26)} goal ${goal.padEnd(10)} ${verdict}`;
}
