// Inter, read from the installed package at run time and embedded in every PDF: no network.
// TTF, not WOFF2 (react-pdf cannot read WOFF2), and the full glyph set (⅓, –, ×). Three weights:
// each one more is embedded (subset) again in every PDF.
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { Font } from '@react-pdf/renderer';
import { memoiseFace } from './face-memo';
import { cacheFontObjects } from './pdf-font-cache';

/** The font family the sheet is set in. */
export const FAMILY = 'Inter';

const WEIGHTS = [
  [400, '400Regular/Inter_400Regular.ttf'],
  [700, '700Bold/Inter_700Bold.ttf'],
  [800, '800ExtraBold/Inter_800ExtraBold.ttf'],
] as const;

// Shaped runs kept per face; a sheet repeats the same few hundred words, so this stays small.
const MEMO_LIMIT = 4000;

interface Shaper {
  layout: (text: string, ...rest: unknown[]) => unknown;
}

let ready: Promise<void> | null = null;

/** Registers Inter with react-pdf and loads it, once per process. */
export function registerFonts(): Promise<void> {
  ready ??= load();
  return ready;
}

async function load(): Promise<void> {
  cacheFontObjects();
  const require = createRequire(import.meta.url);
  const dir = dirname(require.resolve('@expo-google-fonts/inter/package.json'));
  Font.register({ family: FAMILY, fonts: WEIGHTS.map(([fontWeight, file]) => ({ src: join(dir, file), fontWeight })) });
  // Lengths such as "1 15/16 in" must never be split across lines by hyphenation.
  Font.registerHyphenationCallback((word) => [word]);
  for (const [fontWeight] of WEIGHTS) {
    const source = Font.getFont({ fontFamily: FAMILY, fontWeight, fontStyle: 'normal' });
    await source.load();
    memoiseShaping(source.data as unknown as Shaper);
    memoiseFace(source.data as unknown as Parameters<typeof memoiseFace>[0]);
  }
}

// fontkit shapes a string afresh on every call, and shaping is the largest part of a render.
// Its result is read, never changed, by react-pdf (positions are copied before scaling).
function memoiseShaping(face: Shaper): void {
  const shape = face.layout.bind(face);
  const memo = new Map<string, unknown>();
  // The same few feature objects come with every call: spell each one out once, not per run.
  const spelt = new WeakMap<object, string>();
  const spell = (x: unknown) => {
    if (typeof x !== 'object' || x === null) return String(x);
    let k = spelt.get(x);
    if (k === undefined) spelt.set(x, (k = JSON.stringify(x)));
    return k;
  };
  face.layout = (text, ...rest) => {
    let key = text;
    for (const x of rest) key = `${spell(x)}\u0000${key}`;
    let run = memo.get(key);
    if (run === undefined) {
      if (memo.size >= MEMO_LIMIT) memo.clear();
      run = shape(text, ...rest);
      memo.set(key, run);
    }
    return run;
  };
}
