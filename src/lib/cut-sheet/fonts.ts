// Inter, read from the installed package at run time and embedded in every PDF: no network.
// TTF, not WOFF2 (react-pdf cannot read WOFF2), and the full glyph set (⅓, –, ×). Three weights:
// each one more is embedded (subset) again in every PDF.
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { Font } from '@react-pdf/renderer';
import { memoiseFace } from './face-memo';
import { memoiseShaping, type Shaper } from './shaping-memo';
import { cacheFontObjects } from './pdf-font-cache';
import { memoiseTextLayout } from './text-layout-memo';

/** The font family the sheet is set in. */
export const FAMILY = 'Inter';

const WEIGHTS = [
  [400, '400Regular/Inter_400Regular.ttf'],
  [700, '700Bold/Inter_700Bold.ttf'],
  [800, '800ExtraBold/Inter_800ExtraBold.ttf'],
] as const;

let ready: Promise<void> | null = null;

/** Registers Inter with react-pdf and loads it, once per process. */
export function registerFonts(): Promise<void> {
  ready ??= load();
  return ready;
}

async function load(): Promise<void> {
  cacheFontObjects();
  memoiseTextLayout(true);
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
