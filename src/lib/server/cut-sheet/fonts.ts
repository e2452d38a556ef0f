// Inter, read from the installed package at run time and embedded in every PDF: no network.
// TTF, not WOFF2 (react-pdf cannot read WOFF2), and the full glyph set (⅓, –, ×). Three weights:
// each one more is embedded (subset) again in every PDF. Inter also has Latin Extended, Greek and
// Cyrillic; names in scripts it lacks (Arabic, Hebrew, Devanagari, Chinese, Japanese and Korean)
// take a Noto face after Inter in the document's font stack, loaded and embedded only for a
// document that holds such a character, so a Latin-only document is made exactly as before.
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { Font } from '@react-pdf/renderer';
import { adoptFace, installPdfPlatform, type PlatformFace } from '../pdf-platform/index';
import { SEED_CHARACTERS, SHEET_FEATURES } from './shaping-features';
import { keepCodePointsOfText, type GlyphMaker } from './glyph-code-points';

/** The font family the sheet is set in. */
export const FAMILY = 'Inter';

type Weights = readonly (readonly [number, string])[];

const WEIGHTS: Weights = [
  [400, '400Regular/Inter_400Regular.ttf'],
  [700, '700Bold/Inter_700Bold.ttf'],
  [800, '800ExtraBold/Inter_800ExtraBold.ttf'],
];

interface Fallback {
  family: string;
  pkg: string;
  /** Regular first: it alone is read to learn which characters the face has. */
  weights: Weights;
  /** Read only for a document with a character of this pattern (else for any Inter lacks). */
  only?: RegExp;
}

/**
 * The faces tried, in this order, for a character Inter lacks, each in regular and bold (800
 * resolves to 700, so bold names stay bold). Noto Sans SC covers every Han character of GB 2312
 * and of JIS X 0208 and the kana, so Chinese and Japanese names (Japanese with Chinese letterforms
 * for a few kanji); it has no Hangul. Noto Sans KR (all 11,172 Hangul syllables) comes last, after
 * SC so Chinese and Japanese text keeps SC's forms; at 6 MB a weight it is read only for Hangul.
 */
const FALLBACKS: readonly Fallback[] = [
  {
    family: 'Noto Sans Arabic',
    pkg: '@expo-google-fonts/noto-sans-arabic',
    weights: [
      [400, '400Regular/NotoSansArabic_400Regular.ttf'],
      [700, '700Bold/NotoSansArabic_700Bold.ttf'],
    ],
  },
  {
    family: 'Noto Sans Hebrew',
    pkg: '@expo-google-fonts/noto-sans-hebrew',
    weights: [
      [400, '400Regular/NotoSansHebrew_400Regular.ttf'],
      [700, '700Bold/NotoSansHebrew_700Bold.ttf'],
    ],
  },
  {
    family: 'Noto Sans Devanagari',
    pkg: '@expo-google-fonts/noto-sans-devanagari',
    weights: [
      [400, '400Regular/NotoSansDevanagari_400Regular.ttf'],
      [700, '700Bold/NotoSansDevanagari_700Bold.ttf'],
    ],
  },
  {
    family: 'Noto Sans SC',
    pkg: '@expo-google-fonts/noto-sans-sc',
    weights: [
      [400, '400Regular/NotoSansSC_400Regular.ttf'],
      [700, '700Bold/NotoSansSC_700Bold.ttf'],
    ],
  },
  {
    family: 'Noto Sans KR',
    pkg: '@expo-google-fonts/noto-sans-kr',
    weights: [
      [400, '400Regular/NotoSansKR_400Regular.ttf'],
      [700, '700Bold/NotoSansKR_700Bold.ttf'],
    ],
    only: /\p{Script=Hangul}/u,
  },
];

type Face = PlatformFace;

let ready: Promise<void> | null = null;
const fallbackFaces = new Map<string, Promise<Face>>();
let inter: Face | null = null;

const require = createRequire(import.meta.url);
const packageDir = (pkg: string) => dirname(require.resolve(`${pkg}/package.json`));

/** Registers Inter (and, unloaded, the other scripts' faces) with react-pdf and loads Inter, once per process. */
export function registerFonts(): Promise<void> {
  ready ??= load();
  return ready;
}

async function load(): Promise<void> {
  // The PDF speed layer (src/lib/server/pdf-platform): patches that fit the installed packages.
  installPdfPlatform();
  const dir = packageDir('@expo-google-fonts/inter');
  Font.register({ family: FAMILY, fonts: WEIGHTS.map(([fontWeight, file]) => ({ src: join(dir, file), fontWeight })) });
  for (const f of FALLBACKS) {
    const fdir = packageDir(f.pkg);
    Font.register({ family: f.family, fonts: f.weights.map(([fontWeight, file]) => ({ src: join(fdir, file), fontWeight })) });
  }
  // Lengths such as "1 15/16 in" must never be split across lines by hyphenation.
  Font.registerHyphenationCallback((word) => [word]);
  for (const [fontWeight] of WEIGHTS) {
    const face = await loadFace(FAMILY, fontWeight);
    inter ??= face;
    // Every Inter font in a PDF starts with the same glyphs, so a usual sheet's font files repeat.
    adoptFace(face, { seed: { text: SEED_CHARACTERS, features: SHEET_FEATURES } });
  }
}

async function loadFace(fontFamily: string, fontWeight: number): Promise<Face> {
  const source = Font.getFont({ fontFamily, fontWeight, fontStyle: 'normal' });
  await source.load();
  const face = source.data as unknown as Face;
  keepCodePointsOfText(face as unknown as GlyphMaker);
  return face;
}

// Each read on the first document that needs it, once per process (SC about 10 MB a weight, KR 6 MB).
function fallbackFace(f: Fallback, fontWeight: number): Promise<Face> {
  const key = `${f.family}:${fontWeight}`;
  let face = fallbackFaces.get(key);
  if (!face) {
    face = loadFace(f.family, fontWeight).then((face) => {
      // The sheet's feature settings turn off what these scripts need (required ligatures,
      // contextual forms, mark positioning): they shape with their script's defaults. Only
      // characters Inter lacks reach them, so the sheet's tabular digits are untouched.
      const layout = face.layout.bind(face);
      face.layout = (text, _features, ...rest) => layout(text, undefined, ...rest);
      adoptFace(face);
      return face;
    });
    fallbackFaces.set(key, face);
  }
  return face;
}

/** Every string inside a value (a document's data). */
export function stringsIn(value: unknown, into: string[] = []): string[] {
  if (typeof value === 'string') into.push(value);
  else if (Array.isArray(value)) for (const v of value) stringsIn(v, into);
  else if (typeof value === 'object' && value !== null) for (const k in value) stringsIn((value as Record<string, unknown>)[k], into);
  return into;
}

// Printable ASCII and Latin-1: every character of it is in Inter, so most text is passed at a glance.
const PLAIN = /^[\x20-\x7e\u00a0-\u00ff]*$/;
// Drawn for a character no shipped face has (an emoji): Inter's white square, embedded like
// the rest, where react-pdf would have fallen back to an unembedded Helvetica with no such glyph.
const NO_GLYPH = '\u25a1';
const IGNORABLE = /^\p{Default_Ignorable_Code_Point}$/u;

/** How a document is set: its font family, and its data with characters no face has made printable. */
export interface Typeset {
  /** Inter alone when it has every character, else Inter followed by the faces the text needs. */
  family: string | string[];
  /** The data as printed: unchanged (the same object) unless some character has no face. */
  print: <T>(value: T) => T;
}

const same = <T>(value: T): T => value;

function replaced<T>(value: T, swap: (text: string) => string): T {
  if (typeof value === 'string') return swap(value) as T;
  if (Array.isArray(value)) return value.map((v: unknown) => replaced(v, swap)) as T;
  // Plain data only: class instances (exact fractions) hold no text typed by anyone.
  if (typeof value !== 'object' || value === null || Object.getPrototypeOf(value) !== Object.prototype) return value;
  return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, replaced(v, swap)])) as T;
}

/**
 * Which faces a document's text (every string in `data`) needs. react-pdf takes each character
 * from the first face of the family list that has it, and from Helvetica, unembedded, when none
 * has: so characters no shipped face has are replaced (a white square; invisible format
 * characters dropped) by `print`.
 */
export async function typeset(data: unknown): Promise<Typeset> {
  await registerFonts();
  const missing = new Set<number>();
  for (const text of stringsIn(data)) {
    if (PLAIN.test(text)) continue;
    for (let i = 0; i < text.length; i++) {
      const cp = text.codePointAt(i)!;
      if (cp > 0xffff) i++;
      // Line breaks and other controls are never drawn from a font.
      if (cp < 0x20 || inter!.hasGlyphForCodePoint(cp)) continue;
      missing.add(cp);
    }
  }
  if (missing.size === 0) return { family: FAMILY, print: same };
  const chars = [...missing].map((cp) => String.fromCodePoint(cp));
  const tried = FALLBACKS.filter((f) => !f.only || chars.some((ch) => f.only!.test(ch)));
  const faces = await Promise.all(tried.map((f) => fallbackFace(f, f.weights[0]![0])));
  const has = (cp: number) => faces.some((f) => f.hasGlyphForCodePoint(cp));
  const used = tried.filter((_, i) => [...missing].some((cp) => faces[i]!.hasGlyphForCodePoint(cp)));
  // react-pdf loads every weight of a family in the list that the document sets; loaded here
  // first, they shape with the script's own features like the regular.
  await Promise.all(used.flatMap((f) => f.weights.slice(1).map(([fontWeight]) => fallbackFace(f, fontWeight))));
  const family = used.length === 0 ? FAMILY : [FAMILY, ...used.map((f) => f.family)];
  const none = new Set([...missing].filter((cp) => !has(cp)));
  if (none.size === 0) return { family, print: same };
  const swap = (text: string) => {
    let out = '';
    for (const ch of text) {
      const cp = ch.codePointAt(0)!;
      out += !none.has(cp) ? ch : IGNORABLE.test(ch) ? '' : NO_GLYPH;
    }
    return out;
  };
  return { family, print: (value) => replaced(value, swap) };
}
