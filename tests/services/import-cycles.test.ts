// Issue 13: the services import each other in no circle. Every static and dynamic import between
// files under src/services (relative or through `@/services/`) is read from the source, and the
// graph is searched for a cycle; one found is named file by file.
import { readdirSync, readFileSync, statSync, existsSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

const SRC = resolve(__dirname, '../../src');
const ROOT = join(SRC, 'services');

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? files(path) : /\.tsx?$/.test(name) ? [path] : [];
  });
}

function resolveImport(from: string, spec: string): string | null {
  const base = spec.startsWith('@/') ? join(SRC, spec.slice(2)) : spec.startsWith('.') ? resolve(dirname(from), spec) : null;
  if (!base) return null;
  for (const candidate of [base, `${base}.ts`, `${base}.tsx`, join(base, 'index.ts')]) {
    if (existsSync(candidate) && statSync(candidate).isFile()) return candidate;
  }
  return null;
}

/** Each services file and the services files it imports (type-only imports included: they still tie the modules). */
function graph(): Map<string, string[]> {
  const edges = new Map<string, string[]>();
  for (const file of files(ROOT)) {
    const text = readFileSync(file, 'utf8');
    const specs = [...text.matchAll(/(?:from\s+|import\s*\(\s*)['"]([^'"]+)['"]/g)].map((m) => m[1]!);
    const targets = specs.map((s) => resolveImport(file, s)).filter((t): t is string => !!t && t.startsWith(ROOT));
    edges.set(file, [...new Set(targets)]);
  }
  return edges;
}

function findCycle(edges: Map<string, string[]>): string[] | null {
  const state = new Map<string, 'open' | 'done'>();
  const path: string[] = [];
  const visit = (node: string): string[] | null => {
    if (state.get(node) === 'done') return null;
    if (state.get(node) === 'open') return [...path.slice(path.indexOf(node)), node];
    state.set(node, 'open');
    path.push(node);
    for (const next of edges.get(node) ?? []) {
      const found = visit(next);
      if (found) return found;
    }
    path.pop();
    state.set(node, 'done');
    return null;
  };
  for (const node of edges.keys()) {
    const found = visit(node);
    if (found) return found;
  }
  return null;
}

describe('services', () => {
  it('import each other in no cycle', () => {
    const edges = graph();
    expect(edges.size).toBeGreaterThan(20);
    const cycle = findCycle(edges);
    expect(cycle?.map((f) => relative(SRC, f)).join(' → ') ?? null).toBeNull();
  });

  it('keep the counter in its own folder, on the ticket core and not on the bench', () => {
    const edges = graph();
    const counter = [...edges.keys()].filter((f) => f.includes(`${join(ROOT, 'counter')}/`));
    expect(counter.length).toBeGreaterThanOrEqual(4);
    for (const f of counter) {
      const bench = (edges.get(f) ?? []).filter((t) => /services\/(garments|tickets)\.ts$/.test(t));
      expect(
        bench.map((t) => relative(SRC, t)),
        relative(SRC, f),
      ).toEqual([]);
    }
  });
});
