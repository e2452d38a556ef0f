// fontkit shapes a string afresh on every call, and shaping is the largest part of laying out new
// text. A sheet's new sentences ("Cloth check: needs 5 7/16 in…") are mostly words it has printed
// before, so longer Latin text is shaped a word at a time (each word with the space after it),
// every word kept per face: what pdfkit's own text layout does. Each word is shaped as Latin, the
// script fontkit would find for the whole text, else "4," alone would be shaped without kerning.
// It changes nothing on the page as long as no kerning pair spans a space, which the tests check
// for every sheet's text. Results are read, never changed, by react-pdf (positions are copied).
import { override } from './override';

interface GlyphRun {
  glyphs: unknown[];
  positions: unknown[];
  script?: string;
}

interface Position {
  xAdvance: number;
  yAdvance: number;
}

// A run put together from kept words, read as fontkit's own GlyphRun is: measure.ts and pdfkit
// read its advanceWidth, which a plain { glyphs, positions } lacked (a width came out NaN).
class WordsRun implements GlyphRun {
  constructor(
    readonly glyphs: unknown[],
    readonly positions: unknown[],
    readonly script: string,
  ) {}
  get advanceWidth(): number {
    let width = 0;
    for (const p of this.positions) width += (p as Position).xAdvance;
    return width;
  }
  get advanceHeight(): number {
    let height = 0;
    for (const p of this.positions) height += (p as Position).yAdvance;
    return height;
  }
}

/** A fontkit face, as far as shaping goes. */
export interface Shaper {
  layout: (text: string, ...rest: unknown[]) => GlyphRun;
}

// Shaped words and short runs kept per face; a sheet repeats the same few hundred words.
const MEMO_LIMIT = 4000;
// Shorter runs (a number, a label) are kept whole: splitting them saves nothing.
const SPLIT_FROM = 16;
// Text split into words: Latin letters with the common signs a sheet prints, and at least one letter
// (so that fontkit would take the whole text as Latin). Anything else is shaped whole.
const SPLITTABLE = /^[\x20-\x7e\u00a0-\u00ff\u2010-\u2027\u2190-\u2193\u2150-\u215f\u2212\u25bc]*$/;
const LETTER = /[A-Za-z\u00c0-\u00ff]/;

/** Splits text after each space: "a bc d" → ["a ", "bc ", "d"]. */
export function wordsOf(text: string): string[] {
  const words: string[] = [];
  let start = 0;
  for (let i = 0; i < text.length; i++) {
    if (text[i] === ' ' && (i + 1 === text.length || text[i + 1] !== ' ')) {
      words.push(text.slice(start, i + 1));
      start = i + 1;
    }
  }
  if (start < text.length) words.push(text.slice(start));
  return words;
}

/** Makes a face keep its shaped words, and shape long text word by word; returns how to undo it. */
export function memoiseShaping(face: Shaper): () => void {
  const shape = face.layout.bind(face);
  const memo = new Map<string, GlyphRun>();
  // The same few feature objects come with every call: spell each one out once, not per run.
  const spelt = new WeakMap<object, string>();
  const spell = (x: unknown) => {
    if (typeof x !== 'object' || x === null) return String(x);
    let k = spelt.get(x);
    if (k === undefined) spelt.set(x, (k = JSON.stringify(x)));
    return k;
  };
  const shapeKept = (text: string, rest: unknown[], prefix: string): GlyphRun => {
    const key = prefix + text;
    let run = memo.get(key);
    if (run === undefined) {
      if (memo.size >= MEMO_LIMIT) memo.clear();
      run = shape(text, ...rest);
      memo.set(key, run);
    }
    return run;
  };
  // The tag fontkit gives Latin text, read from the face rather than assumed.
  const latin = shape('a').script;
  return override(face, 'layout', (text: string, ...rest: unknown[]): GlyphRun => {
    let prefix = '';
    for (const x of rest) prefix += `${spell(x)}\u0000`;
    // Only the call textkit makes (features, no script, no language, left to right) is split.
    const [features, script, language, direction] = rest;
    if (text.length < SPLIT_FROM || script != null || !latin || !SPLITTABLE.test(text) || !LETTER.test(text)) return shapeKept(text, rest, prefix);
    const words = wordsOf(text);
    if (words.length === 1) return shapeKept(text, rest, prefix);
    const asLatin = [features, latin, language, direction];
    let wordPrefix = '';
    for (const x of asLatin) wordPrefix += `${spell(x)}\u0000`;
    const glyphs: unknown[] = [];
    const positions: unknown[] = [];
    for (const word of words) {
      const run = shapeKept(word, asLatin, wordPrefix);
      for (const g of run.glyphs) glyphs.push(g);
      for (const p of run.positions) positions.push(p);
    }
    return new WordsRun(glyphs, positions, latin);
  });
}
