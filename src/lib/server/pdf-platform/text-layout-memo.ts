// Every cut sheet repeats the same paragraphs (bench steps, cautions, headings, line names) in the
// same style at the same width, and react-pdf lays each one out again for every sheet: breaking
// lines, bidi, glyph runs. Laying out a paragraph is a pure function of its text, its runs'
// attributes, the box it flows into and the layout options, so the lines are kept per process
// under a key made of exactly those. Nothing downstream writes to the lines (render copies the
// glyphs it changes; page splits slice), so a kept answer is shared as it is. The hook into
// react-pdf's layout is ours: patches/@react-pdf+layout+*.patch (patch-package) adds it.
import * as reactPdfLayout from '@react-pdf/layout';

interface Run {
  start: number;
  end: number;
  attributes: Record<string, unknown>;
}
interface AttributedString {
  string: string;
  runs: Run[];
}
interface Container {
  x: number;
  y: number;
  width: number;
  height: number;
  maxLines?: number;
  truncateMode?: string;
  exclusions?: unknown[];
}
interface Options {
  hyphenationPenalty?: number;
  shrinkWhitespaceFactor?: unknown;
  hyphenationCallback?: unknown;
}

/** Paragraph layouts kept at most after a second use; a sheet has about seventy, most of them the same every time. */
const TEXT_LAYOUT_LIMIT = 3000;

const ids = new WeakMap<object, number>();
let nextId = 1;
const idOf = (o: object): number => {
  let id = ids.get(o);
  if (id === undefined) ids.set(o, (id = nextId++));
  return id;
};

function spell(value: unknown): string | null {
  if (value === undefined) return '';
  if (value === null) return 'null';
  switch (typeof value) {
    case 'string':
      return JSON.stringify(value);
    case 'number':
    case 'boolean':
      return String(value);
    case 'function':
      return `#${idOf(value)}`;
    case 'object': {
      if (Array.isArray(value)) {
        const parts: string[] = [];
        for (const v of value) {
          const p = spell(v);
          if (p === null) return null;
          parts.push(p);
        }
        return `[${parts.join(',')}]`;
      }
      // Plain settings (font features) by content; anything else (a loaded font) by identity:
      // fonts are loaded once per process.
      const proto = Object.getPrototypeOf(value);
      return proto === Object.prototype || proto === null ? JSON.stringify(value) : `#${idOf(value)}`;
    }
    default:
      return null;
  }
}

/** The key of one layout request, or null when it holds something not safely compared (images, exclusions). */
export function layoutKey(text: AttributedString, container: Container, options: Options): string | null {
  if (container.exclusions && container.exclusions.length > 0) return null;
  // Parts joined once: a key built by += would be kept as a rope of hundreds of pieces.
  const parts = [
    `${container.x},${container.y},${container.width},${container.height},${container.maxLines},${container.truncateMode}|${options.hyphenationPenalty}|${spell(options.hyphenationCallback)}|${JSON.stringify(options.shrinkWhitespaceFactor)}|`,
  ];
  const spelt = new Map<object, string>();
  for (const run of text.runs) {
    const a = run.attributes;
    if (a.attachment) return null;
    let attrs = spelt.get(a);
    if (attrs === undefined) {
      const named: string[] = [];
      for (const name in a) {
        const v = spell(a[name]);
        if (v === null) return null;
        named.push(`${name}=${v};`);
      }
      spelt.set(a, (attrs = named.join('')));
    }
    parts.push(`${run.start}-${run.end}{${attrs}}`);
  }
  parts.push(`|${text.string}`);
  return parts.join('');
}

// Two generations: a paragraph laid out once waits in `fresh`; laid out again, it moves to `kept`.
// The wording every sheet shares is kept after its second sheet, while one-off paragraphs (this
// ticket's numbers) are dropped with `fresh` whenever it fills, instead of growing the heap.
const fresh = new Map<string, unknown>();
const kept = new Map<string, unknown>();
const FRESH_LIMIT = 500;

/** What layoutText would have computed, kept for the process under layoutKey. */
function rememberedLayout(text: AttributedString, container: Container, options: Options, compute: () => unknown): unknown {
  const key = layoutKey(text, container, options);
  if (key === null) return compute();
  let lines = kept.get(key);
  if (lines !== undefined) return lines;
  lines = fresh.get(key);
  if (lines !== undefined) {
    fresh.delete(key);
    if (kept.size >= TEXT_LAYOUT_LIMIT) kept.clear();
    kept.set(key, lines);
    return lines;
  }
  if (fresh.size >= FRESH_LIMIT) fresh.clear();
  lines = compute();
  fresh.set(key, lines);
  return lines;
}

type Hook = Parameters<typeof reactPdfLayout.setLayoutTextHook>[0];

/** Turns the paragraph layout memo on or off, emptying it; throws if react-pdf's layout has no hook (our patch not applied). */
export function memoiseTextLayout(on: boolean): void {
  fresh.clear();
  kept.clear();
  // Read from the namespace: a missing export is then a clear error here, not a failed import.
  const setHook = (reactPdfLayout as { setLayoutTextHook?: (hook: Hook) => void }).setLayoutTextHook;
  if (typeof setHook !== 'function') throw new Error('@react-pdf/layout has no setLayoutTextHook: patches/@react-pdf+layout+*.patch is not applied');
  // The hook hands over textkit's own objects; rememberedLayout names the parts it reads.
  setHook(on ? (rememberedLayout as Hook) : null);
}

/** Turns the paragraph layout memo on; returns how to turn it off. */
export function keepTextLayouts(): () => void {
  memoiseTextLayout(true);
  return () => memoiseTextLayout(false);
}

/** How many paragraph layouts are kept now, laid out once or more. */
export const keptLayouts = (): number => fresh.size + kept.size;
