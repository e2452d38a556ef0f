// Shaping word by word must place every glyph where shaping the whole text would.
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { setLayoutNodeHook, setLayoutTextHook } from '@react-pdf/layout';
import fc from 'fast-check';
import * as fontkit from 'fontkit';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { textWidth } from '@/lib/server/cut-sheet/measure';
import { renderCutSheet } from '@/lib/server/cut-sheet/render';
import { SHEET_FEATURES } from '@/lib/server/cut-sheet/shaping-features';
import { memoiseShaping, wordsOf, type Shaper } from '@/lib/server/pdf-platform/shaping-memo';
import { memoiseTextLayout } from '@/lib/server/pdf-platform/text-layout-memo';
import { busyLegs, cuffInch, cuffMetric, hemSloped, sheet, UNSAVED } from './sheets';

const FILES = ['400Regular/Inter_400Regular.ttf', '700Bold/Inter_700Bold.ttf', '800ExtraBold/Inter_800ExtraBold.ttf'];
const dir = dirname(createRequire(import.meta.url).resolve('@expo-google-fonts/inter/package.json'));
const open = (file: string) => fontkit.create(readFileSync(join(dir, file))) as Shaper;
// The features the sheet is set with.
const FEATURES = SHEET_FEATURES;

interface Run {
  glyphs: { id: number }[];
  positions: { xAdvance: number; yAdvance: number; xOffset: number; yOffset: number }[];
}
const placed = (r: Run) =>
  r.glyphs.map((g, i) => `${g.id}@${r.positions[i]!.xAdvance},${r.positions[i]!.yAdvance},${r.positions[i]!.xOffset},${r.positions[i]!.yOffset}`);

// Every run of text the renderer lays out on a varied set of sheets, as textkit hands it to fontkit.
const runs = new Set<string>();
beforeAll(async () => {
  await renderCutSheet(sheet([cuffInch]));
  // Every paragraph reaches the text hook: none is answered from the memo's node keys.
  setLayoutNodeHook(null);
  setLayoutTextHook((text, _c, _o, compute) => {
    const t = text as { string: string; runs: { start: number; end: number }[] };
    for (const r of t.runs) runs.add(t.string.slice(r.start, r.end));
    return compute();
  });
  for (const legs of [[cuffInch], [cuffMetric], busyLegs, [hemSloped]])
    await renderCutSheet(sheet(legs, { garment: 'Tan cotton chinos, “weekend” pair – café wash' }));
  await renderCutSheet(sheet([cuffMetric], UNSAVED));
  memoiseTextLayout(true);
});
afterAll(() => memoiseTextLayout(true));

describe('shaping word by word', () => {
  it('splits after each space and loses nothing', () => {
    fc.assert(
      fc.property(fc.string({ unit: fc.constantFrom('a', 'b', ' ', '4', ',', '/') }), (text) => {
        const words = wordsOf(text);
        expect(words.join('')).toBe(text);
        for (const w of words.slice(0, -1)) expect(w.endsWith(' ')).toBe(true);
        for (const w of words) expect(w.length).toBeGreaterThan(0);
      }),
    );
  });

  it('places every glyph of every run on the sheets as shaping the whole run does, in all three weights', () => {
    expect(runs.size).toBeGreaterThan(80);
    for (const file of FILES) {
      const whole = open(file);
      const kept = open(file);
      memoiseShaping(kept);
      for (const text of runs) {
        // Twice: the second answer comes from the kept words.
        for (let round = 0; round < 2; round++) {
          const a = placed(whole.layout(text, FEATURES, undefined, undefined, 'ltr') as unknown as Run);
          const b = placed(kept.layout(text, FEATURES, undefined, undefined, 'ltr') as unknown as Run);
          expect(b, `${file}: ${text}`).toEqual(a);
        }
      }
    }
  });

  it('shapes digits inside Latin text with kerning, as the whole text would', () => {
    // "4," alone is not Latin to fontkit, and would lose the pair kerning it gets in a sentence.
    const whole = open(FILES[0]!);
    const kept = open(FILES[0]!);
    memoiseShaping(kept);
    const text = 'Cut on line 4, the cutting line.';
    expect(placed(kept.layout(text, FEATURES, undefined, undefined, 'ltr') as unknown as Run)).toEqual(
      placed(whole.layout(text, FEATURES, undefined, undefined, 'ltr') as unknown as Run),
    );
  });
});

describe('a run shaped word by word, as its callers read it', () => {
  // measure.ts (the sheet's column widths) reads advanceWidth from the face's layout with the
  // features alone, which takes the word-by-word path for a long text: it was undefined there,
  // so a width came out NaN.
  it('has the advance width and script of the run shaped whole', () => {
    const whole = open(FILES[0]!);
    const kept = open(FILES[0]!);
    memoiseShaping(kept);
    for (const text of ['Cloth check: needs 5 7/16 in', 'Finished length from the waist seam']) {
      const a = whole.layout(text, FEATURES) as unknown as { advanceWidth: number; advanceHeight: number; script: string; glyphs: unknown[] };
      for (let round = 0; round < 2; round++) {
        const b = kept.layout(text, FEATURES) as unknown as { advanceWidth: number; advanceHeight: number; script: string; glyphs: unknown[] };
        expect(b.glyphs.length).toBe(a.glyphs.length);
        expect(b.advanceWidth, text).toBe(a.advanceWidth);
        expect(b.advanceHeight, text).toBe(a.advanceHeight);
        expect(b.script, text).toBe(a.script);
      }
    }
  });

  it('gives the sheet a finite column width for a long label', () => {
    // The faces the sheets were set with carry the memo (adopted at registration).
    const width = textWidth('Finished length from the waist seam', 400, 9);
    expect(Number.isFinite(width)).toBe(true);
    const whole = open(FILES[0]!) as unknown as { layout: (t: string, f: object) => { advanceWidth: number }; unitsPerEm: number };
    expect(width).toBeCloseTo((whole.layout('Finished length from the waist seam', FEATURES).advanceWidth * 9) / whole.unitsPerEm, 9);
  });
});
