// Every cut sheet repeats the same paragraphs (bench steps, cautions, headings, line names) in the
// same style at the same width, and react-pdf lays each one out again for every sheet: breaking
// lines, bidi, glyph runs. Laying out a paragraph is a pure function of its text, its runs'
// attributes, the box it flows into and the layout options, so the lines are kept per process
// under a key made of exactly those. Nothing downstream writes to the lines (render copies the
// glyphs it changes; page splits slice), so a kept answer is shared as it is. Building that
// attributed string and its key for each of a sheet's seventy paragraphs cost more than the three
// it actually lays out afresh, so a second key is read from the text node itself (its text style,
// fonts and text) and answers before the attributed string is built. The hooks into react-pdf's
// layout are ours: patches/@react-pdf+layout+*.patch (patch-package) adds them.
import * as reactPdfLayout from '@react-pdf/layout';
import { KeyTree, type KeyPath } from './key-tree';

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

// A flat settings object (font features) spelt before, with the keys and values it had then: the
// same object is spelt again only when one of them changed. The sheet's text nodes share a few
// such objects, and spelling each as JSON was about a third of building their keys.
const flatSpelt = new WeakMap<object, { spelt: string; entries: unknown[] }>();

function flatEntries(o: Record<string, unknown>): unknown[] | null {
  const entries: unknown[] = [];
  for (const name in o) {
    const v = o[name];
    if (typeof v === 'object' && v !== null) return null;
    entries.push(name, v);
  }
  return entries;
}

function unchanged(o: Record<string, unknown>, entries: unknown[]): boolean {
  let i = 0;
  for (const name in o) {
    if (name !== entries[i] || !Object.is(o[name], entries[i + 1])) return false;
    i += 2;
  }
  return i === entries.length;
}

function spellPlain(o: Record<string, unknown>): string {
  const kept = flatSpelt.get(o);
  if (kept !== undefined && unchanged(o, kept.entries)) return kept.spelt;
  const spelt = `{${JSON.stringify(o)}`;
  const entries = flatEntries(o);
  if (entries) flatSpelt.set(o, { spelt, entries });
  return spelt;
}

// Each value spelt so that no two differ only in where one ends: a string by its length, then
// itself (no escaping to scan for); a number or a name never holds a separator; an object by
// identity (@), or a plain one as JSON, which closes itself.
function spell(value: unknown): string | null {
  switch (typeof value) {
    case 'undefined':
      return '';
    case 'string':
      return `${value.length}'${value}`;
    case 'number':
      return `#${value}`;
    case 'boolean':
      return value ? 'T' : 'F';
    case 'function':
      return `@${idOf(value)}`;
    case 'object': {
      if (value === null) return 'N';
      if (Array.isArray(value)) {
        let spelt = '[';
        for (const v of value) {
          const p = spell(v);
          if (p === null) return null;
          spelt += `${p},`;
        }
        return `${spelt}]`;
      }
      // Plain settings (font features) by content; anything else (a loaded font) by identity:
      // fonts are loaded once per process.
      const proto = Object.getPrototypeOf(value);
      return proto === Object.prototype || proto === null ? spellPlain(value as Record<string, unknown>) : `@${idOf(value)}`;
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

/** The text node of react-pdf's layout tree, as far as its text layout reads it. */
export interface TextNodeLike {
  type: string;
  value?: string;
  style?: Record<string, unknown>;
  props?: Record<string, unknown>;
  children?: TextNodeLike[];
  exclusions?: unknown[];
}

/** react-pdf's font store, as far as the key reads it. */
export interface FontStoreLike {
  getFont: (descriptor: { fontFamily: string; fontWeight?: unknown; fontStyle?: unknown }) => { data?: unknown } | null | undefined;
  getHyphenationCallback?: () => unknown;
  getEmojiSource?: () => unknown;
}

// The style properties react-pdf 5.2's text layout reads from a text node (getFragments,
// getContainer); the rest (position, margins, widths) reaches it only as the box it is given.
const TEXT_STYLE = [
  'color',
  'direction',
  'fontFamily',
  'fontWeight',
  'fontStyle',
  'fontSize',
  'fontFeatureSettings',
  'textAlign',
  'lineHeight',
  'textDecoration',
  'textDecorationColor',
  'textDecorationStyle',
  'textTransform',
  'letterSpacing',
  'textIndent',
  'opacity',
  'verticalAlign',
  'backgroundColor',
  'maxLines',
  'textOverflow',
] as const;

// A node's key is found as a path through a tree of maps (key-tree.ts): spelling each of a
// sheet's seventy text nodes into a string took about half a millisecond a sheet. The path's
// structure is marked with objects of this module's own, so no two nodes share a path unless
// everything read is the same; settings objects and lists count by content, a loaded font or a
// function by identity.
/** The key of one node layout: the same object for the same text, style, fonts and box. */
export type NodeKey = object;

const OPEN = { mark: 'open' };
const CLOSE = { mark: 'close' };
const PIECE = { mark: 'text' };
const NO_FONT = { mark: 'no font' };
const NOT_SAFE = { mark: 'not safe' };
/** Maps in the key tree at most (a new paragraph adds two or three, some 0.2 kB each), beyond which it starts afresh. */
const TRIE_LIMIT = 20_000;

// The kept layouts are keyed by the tree's objects: a new tree means new keys, so both go together.
const tree = new KeyTree(TRIE_LIMIT, () => byNode.clear());

// The atom standing for a value in a path, or NOT_SAFE for what is not compared safely.
function atom(value: unknown): unknown {
  switch (typeof value) {
    case 'undefined':
    case 'string':
    case 'number':
    case 'boolean':
    case 'function':
      return value;
    case 'object': {
      if (value === null) return null;
      const proto = Object.getPrototypeOf(value);
      if (!Array.isArray(value) && proto !== Object.prototype && proto !== null) return value;
      const spelt = spell(value);
      return spelt === null ? NOT_SAFE : tree.spelling(spelt);
    }
    default:
      return NOT_SAFE;
  }
}

// One node of the text as react-pdf reads it to build the attributed string (getFragments): each
// text node's text style and links, the font each of its families resolves to (by identity: a font
// not yet loaded has no data and another path), and every piece of text. Null for what is not
// compared safely (images, an unresolved family, values of other kinds).
function walkNode(node: TextNodeLike, fonts: FontStoreLike, at: KeyPath): KeyPath | null {
  if (node.type === 'TEXT_INSTANCE') {
    if (typeof node.value !== 'string') return null;
    return tree.step(tree.step(at, PIECE), node.value);
  }
  if (node.type === 'IMAGE') return null;
  const style = node.style ?? {};
  const props = node.props ?? {};
  at = tree.step(tree.step(at, OPEN), node.type);
  for (const value of [props.src, props.href, props.hyphenationPenalty, props.hyphenationCallback]) {
    const a = atom(value);
    if (a === NOT_SAFE) return null;
    at = tree.step(at, a);
  }
  for (const name of TEXT_STYLE) {
    const a = atom(style[name]);
    if (a === NOT_SAFE) return null;
    at = tree.step(at, a);
  }
  const family = style.fontFamily === undefined ? 'Helvetica' : style.fontFamily;
  const families: unknown[] = typeof family === 'string' ? [family] : [...((family as unknown[] | null) || [])];
  families.push('Helvetica');
  for (const fontFamily of families) {
    if (typeof fontFamily !== 'string') return null;
    let data: unknown;
    try {
      data = fonts.getFont({ fontFamily, fontWeight: style.fontWeight, fontStyle: style.fontStyle })?.data;
    } catch {
      return null;
    }
    at = tree.step(at, typeof data === 'object' && data !== null ? data : NO_FONT);
  }
  for (const child of node.children ?? []) {
    const next = walkNode(child, fonts, at);
    if (next === null) return null;
    at = next;
  }
  return tree.step(at, CLOSE);
}

/**
 * The key of one text node's layout in a box, or null when it is not safely compared: what the
 * layout reads from the node (style, links, fonts, text) and the font store (hyphenation), without
 * building the attributed string. Text flowing round shapes and emoji images are never keyed.
 */
export function nodeLayoutKey(node: TextNodeLike, width: number, height: number, fonts: FontStoreLike): NodeKey | null {
  if (node.exclusions && node.exclusions.length > 0) return null;
  if (typeof fonts !== 'object' || fonts === null) return null;
  // Emoji become images once fetched: text with them lays out differently over time.
  if (fonts.getEmojiSource?.()) return null;
  const hyphenation = atom(fonts.getHyphenationCallback?.() ?? null);
  if (hyphenation === NOT_SAFE) return null;
  const at = walkNode(node, fonts, tree.step(tree.step(tree.step(tree.step(tree.start(), width), height), hyphenation), fonts));
  return at === null ? null : tree.end(at);
}

// Two generations: a paragraph laid out once waits in `fresh`; laid out again, it moves to `kept`.
// The wording every sheet shares is kept after its second sheet, while one-off paragraphs (this
// ticket's numbers) are dropped with `fresh` whenever it fills, instead of growing the heap.
const FRESH_LIMIT = 500;

class Generations<K> {
  fresh = new Map<K, unknown>();
  kept = new Map<K, unknown>();

  get(key: K | null, compute: () => unknown): unknown {
    if (key === null) return compute();
    let lines = this.kept.get(key);
    if (lines !== undefined) return lines;
    lines = this.fresh.get(key);
    if (lines !== undefined) {
      this.fresh.delete(key);
      if (this.kept.size >= TEXT_LAYOUT_LIMIT) this.kept.clear();
      this.kept.set(key, lines);
      return lines;
    }
    if (this.fresh.size >= FRESH_LIMIT) this.fresh.clear();
    lines = compute();
    this.fresh.set(key, lines);
    return lines;
  }

  clear(): void {
    this.fresh.clear();
    this.kept.clear();
  }

  get size(): number {
    return this.fresh.size + this.kept.size;
  }
}

// Kept by attributed string (what textkit is given), and in front of that by text node, which
// answers a paragraph seen before without building its attributed string at all.
const byText = new Generations<string>();
const byNode = new Generations<NodeKey>();

/** What layoutText would have computed, kept for the process under layoutKey. */
function rememberedLayout(text: AttributedString, container: Container, options: Options, compute: () => unknown): unknown {
  return byText.get(layoutKey(text, container, options), compute);
}

/** The same, kept under nodeLayoutKey; a node not kept goes on to rememberedLayout. */
function rememberedNodeLayout(node: TextNodeLike, width: number, height: number, fonts: FontStoreLike, compute: () => unknown): unknown {
  return byNode.get(nodeLayoutKey(node, width, height, fonts), compute);
}

type Hook = Parameters<typeof reactPdfLayout.setLayoutTextHook>[0];
type NodeHook = Parameters<typeof reactPdfLayout.setLayoutNodeHook>[0];

/** Turns the paragraph layout memo on or off, emptying it; throws if react-pdf's layout has no hook (our patch not applied). */
export function memoiseTextLayout(on: boolean): void {
  byText.clear();
  byNode.clear();
  // Read from the namespace: a missing export is then a clear error here, not a failed import.
  const layout = reactPdfLayout as { setLayoutTextHook?: (hook: Hook) => void; setLayoutNodeHook?: (hook: NodeHook) => void };
  const { setLayoutTextHook: setHook, setLayoutNodeHook: setNodeHook } = layout;
  if (typeof setHook !== 'function' || typeof setNodeHook !== 'function')
    throw new Error('@react-pdf/layout has no setLayoutTextHook or setLayoutNodeHook: patches/@react-pdf+layout+*.patch is not applied');
  // The hooks hand over react-pdf's and textkit's own objects; the memo names the parts it reads.
  setHook(on ? (rememberedLayout as Hook) : null);
  setNodeHook(on ? (rememberedNodeLayout as NodeHook) : null);
}

/** Turns the paragraph layout memo on; returns how to turn it off. */
export function keepTextLayouts(): () => void {
  memoiseTextLayout(true);
  return () => memoiseTextLayout(false);
}

/** How many paragraph layouts are kept now, laid out once or more (by text and by node). */
export const keptLayouts = (): number => byText.size + byNode.size;
