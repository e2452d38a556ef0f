// react-pdf resolves every node's style afresh for every document: it flattens the style list,
// copies the object once per key while looking for media queries, then expands shorthands and
// parses colours and units, about a fifteenth of a sheet. A sheet's nodes carry the same few dozen
// styles every time (most are inline objects, so not the same objects: the same contents), and
// resolving is a pure function of the flattened style and the page it is on (size, orientation,
// dpi, root font size). So the resolved style is kept per process under a key found from exactly
// those (a path through a tree of maps, key-tree.ts). Strings, numbers, booleans and flat objects of them (font features, a media query's
// styles) are compared by content; a style holding anything else (a transform list) is not kept. Each node gets its own copy, as it got its own object before. The hook into
// react-pdf's layout is ours: patches/@react-pdf+layout+*.patch adds it. Also here: the
// percent-radius pass keeps the style of a node that names no corner radius, and the inheritance
// pass merges a node's own values without an array of entries (the same patch).
import * as reactPdfLayout from '@react-pdf/layout';
import { KeyTree } from './key-tree';

type Resolve = (container: unknown, style: unknown) => unknown;
type Hook = (container: unknown, style: unknown, resolve: Resolve) => unknown;

/** Maps in the key tree at most (a new style adds a few), beyond which it and the kept styles start afresh. */
const TREE_LIMIT = 20_000;

/** Resolved styles kept at most; a sheet has a few dozen different ones. Emptied when full. */
const STYLE_LIMIT = 2000;

const kept = new Map<object, Record<string, unknown>>();
// The kept styles are keyed by the tree's objects: a new tree means new keys, so both go together.
const tree = new KeyTree(TREE_LIMIT, () => kept.clear());
const NOT_SAFE = { mark: 'not safe' };

// A plain object of strings, numbers and booleans (font feature settings), compared by content.
function isFlat(v: unknown): boolean {
  if (typeof v !== 'object' || v === null || Array.isArray(v)) return false;
  const proto = Object.getPrototypeOf(v);
  if (proto !== Object.prototype && proto !== null) return false;
  for (const x of Object.values(v)) if (typeof x !== 'string' && typeof x !== 'number' && typeof x !== 'boolean') return false;
  return true;
}

// A value as it stands in a key's path: itself, a flat object by its content, else NOT_SAFE.
function atom(v: unknown): unknown {
  const type = typeof v;
  if (type === 'string' || type === 'number' || type === 'boolean') return v;
  return isFlat(v) ? tree.spelling(JSON.stringify(v)) : NOT_SAFE;
}

// Each set value of one plain style object, in order, as it stands in a path; false (and stops)
// at a value not safely compared.
function eachValue(s: Record<string, unknown>, take: (key: string, a: unknown) => void): boolean {
  for (const key of Object.keys(s)) {
    const v = s[key];
    if (v === null || v === undefined) continue;
    const a = atom(v);
    if (a === NOT_SAFE) return false;
    take(key, a);
  }
  return true;
}

// The style list merged as react-pdf's flatten merges it (later entries win, null and undefined
// values skipped, nested lists flattened), into `into`; false for a value not safely compared.
function merge(style: unknown, into: Map<string, unknown>): boolean {
  if (style === null || style === undefined) return true;
  if (Array.isArray(style)) {
    for (const item of style) if (!merge(item, into)) return false;
    return true;
  }
  if (typeof style !== 'object') return false;
  return eachValue(style as Record<string, unknown>, (key, a) => into.set(key, a));
}

/** The key of one style on one page (the same object for the same merged style and page), or null when the style holds something not safely compared. */
export function styleKey(container: unknown, style: unknown): object | null {
  if (typeof container !== 'object' || container === null) return null;
  const c = container as Record<string, unknown>;
  let at = tree.step(tree.step(tree.step(tree.step(tree.step(tree.start(), c.width), c.height), c.orientation), c.dpi), c.remBase);
  // One plain object, as most are: its own values in order are the merged style.
  if (style !== null && typeof style === 'object' && !Array.isArray(style)) {
    const whole = eachValue(style as Record<string, unknown>, (key, a) => {
      at = tree.step(tree.step(at, key), a);
    });
    return whole ? tree.end(at) : null;
  }
  const merged = new Map<string, unknown>();
  if (!merge(style, merged)) return null;
  for (const [key, a] of merged) at = tree.step(tree.step(at, key), a);
  return tree.end(at);
}

function rememberedStyle(container: unknown, style: unknown, resolve: Resolve): unknown {
  const key = styleKey(container, style);
  if (key === null) return resolve(container, style);
  let hit = kept.get(key);
  if (!hit) {
    const resolved = resolve(container, style) as Record<string, unknown>;
    if (kept.size >= STYLE_LIMIT) kept.clear();
    // Kept as a copy: react-pdf may change the object it hands on (a float becomes absolute).
    kept.set(key, (hit = { ...resolved }));
    return resolved;
  }
  return { ...hit };
}

interface LayoutHooks {
  setResolveStyleHook?: (hook: Hook | null) => void;
  setFastRadii?: (on: boolean) => void;
  setLeanInheritance?: (on: boolean) => void;
}

/** Turns the resolved-style memo and the fast radius pass on or off, emptying the memo; throws if react-pdf's layout lacks the hooks (our patch not applied). */
export function memoiseStyles(on: boolean): void {
  kept.clear();
  const layout = reactPdfLayout as LayoutHooks;
  if (typeof layout.setResolveStyleHook !== 'function' || typeof layout.setFastRadii !== 'function' || typeof layout.setLeanInheritance !== 'function')
    throw new Error('@react-pdf/layout has no setResolveStyleHook, setFastRadii or setLeanInheritance: patches/@react-pdf+layout+*.patch is not applied');
  layout.setResolveStyleHook(on ? rememberedStyle : null);
  layout.setFastRadii(on);
  layout.setLeanInheritance(on);
}

/** Turns the style memo on; returns how to turn it off. */
export function keepStyles(): () => void {
  memoiseStyles(true);
  return () => memoiseStyles(false);
}

/** How many resolved styles are kept now. */
export const keptStyles = (): number => kept.size;
