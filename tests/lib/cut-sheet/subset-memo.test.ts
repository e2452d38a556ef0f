// Kept font subsets: each embedded font file is exactly what fontkit makes afresh for the glyphs
// the page's text refers to, and usual sheets share one font file per weight.
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import * as fontkit from 'fontkit';
import { describe, expect, it } from 'vitest';
import { renderCutSheet } from '@/lib/server/cut-sheet/render';
import { SEED_CHARACTERS, SHEET_FEATURES } from '@/lib/server/cut-sheet/shaping-features';
import { keepSubsets, seedSubset, type EmbeddedFontLike } from '@/lib/server/pdf-platform/subset-memo';
import { pdfObjects, type PdfObject } from './pdf-objects';
import { flatText, pdfFile } from './poppler';
import { cuffInch, cuffMetric, sheet } from './sheets';

interface Face {
  postscriptName: string;
  glyphForCodePoint: (cp: number) => { id: number };
  layout: (text: string, features: object) => { glyphs: { id: number }[] };
  createSubset: () => { includeGlyph: (id: number) => number; encode: () => Uint8Array };
}
const dir = dirname(createRequire(import.meta.url).resolve('@expo-google-fonts/inter/package.json'));
const FACES = ['400Regular/Inter_400Regular.ttf', '700Bold/Inter_700Bold.ttf', '800ExtraBold/Inter_800ExtraBold.ttf'].map(
  (f) => fontkit.create(readFileSync(join(dir, f))) as Face,
);

/** Each embedded font: its PostScript name, font file bytes and the characters its CIDs stand for, in CID order. */
function embeddedFonts(pdf: Uint8Array) {
  const objects = pdfObjects(pdf);
  const byId = new Map(objects.map((o) => [o.id, o]));
  const ref = (o: PdfObject, key: string) => byId.get(Number(new RegExp(`/${key} (\\d+) 0 R`).exec(o.dict)?.[1]))!;
  return objects
    .filter((o) => o.dict.includes('/Subtype /Type0'))
    .map((type0) => {
      const cid = byId.get(Number(/\/DescendantFonts \[(\d+) 0 R\]/.exec(type0.dict)![1]))!;
      const file = ref(ref(cid, 'FontDescriptor'), 'FontFile2').stream!;
      const cmap = ref(type0, 'ToUnicode').stream!.toString('latin1');
      const chars: number[] = [];
      for (const [, list] of cmap.matchAll(/<[0-9a-f]{4}> <[0-9a-f]{4}> \[([^\]]*)\]/g)) {
        for (const [, hex] of list!.matchAll(/<([0-9a-f ]+)>/g)) chars.push(parseInt(hex!.split(' ')[0]!, 16));
      }
      return { name: /\/BaseFont \/[A-Z]{6}\+(\S+)/.exec(type0.dict)![1]!, file, chars };
    });
}

function freshSubset(name: string, chars: number[]): Buffer {
  const face = FACES.find((f) => f.postscriptName === name)!;
  const subset = face.createSubset();
  // CID 0 is the missing glyph, always first; then the glyphs in the order the PDF numbered them,
  // each as the sheet's features shape it (tabular digits).
  for (const cp of chars.slice(1)) subset.includeGlyph(face.layout(String.fromCodePoint(cp), SHEET_FEATURES).glyphs[0]!.id);
  return Buffer.from(subset.encode());
}

describe('font subsets kept across sheets', () => {
  it('embeds, cold and warm, exactly the subset fontkit makes afresh for the glyphs the text uses', async () => {
    for (const data of [sheet([cuffInch]), sheet([cuffInch], { ticket: '2077' }), sheet([cuffMetric], { garment: 'Crêpe trousers, café wash' })]) {
      const fonts = embeddedFonts(await renderCutSheet(data));
      expect(fonts.map((f) => f.name).sort()).toEqual(['Inter-Bold', 'Inter-ExtraBold', 'Inter-Regular']);
      for (const f of fonts) expect(f.file.equals(freshSubset(f.name, f.chars)), f.name).toBe(true);
    }
  });

  it('starts every font with the seed characters, so sheets differing in tickets and names share font files', async () => {
    const a = embeddedFonts(await renderCutSheet(sheet([cuffInch], { ticket: '1001', assignee: 'Priya Navarro' })));
    const b = embeddedFonts(await renderCutSheet(sheet([cuffInch], { ticket: '1987', assignee: 'Jonah Whitcombe', garment: 'Olive moleskin trousers' })));
    const seed = [...SEED_CHARACTERS].map((c) => c.codePointAt(0)!);
    for (const f of a) expect(f.chars.slice(1, 1 + seed.length)).toEqual(seed.filter((cp) => FACES[0]!.glyphForCodePoint(cp).id !== 0));
    for (let i = 0; i < a.length; i++) expect(b[i]!.file.equals(a[i]!.file)).toBe(true);
  });

  it('gives a sheet with a character outside the seed its own subset, and reads that text back', async () => {
    const plain = embeddedFonts(await renderCutSheet(sheet([cuffInch])));
    const pdf = await renderCutSheet(sheet([cuffInch], { garment: 'Crêpe trousers' }));
    expect(flatText(pdfFile(pdf))).toContain('Crêpe trousers');
    const withE = embeddedFonts(pdf);
    const title = withE.find((f) => f.chars.includes('ê'.codePointAt(0)!))!;
    expect(title.file.equals(plain.find((f) => f.name === title.name)!.file)).toBe(false);
    // The usual sheet afterwards still gets the usual subset.
    const again = embeddedFonts(await renderCutSheet(sheet([cuffInch])));
    for (let i = 0; i < plain.length; i++) expect(again[i]!.file.equals(plain[i]!.file)).toBe(true);
  });
});

describe('seeding a new document font', () => {
  it('starts each later font from a copy of the first one seeded: the same glyphs, numbers, widths and text, nothing shared to write into', () => {
    const face = fontkit.create(readFileSync(join(dir, '400Regular/Inter_400Regular.ttf'))) as Face & { getGlyph: (id: number) => { advanceWidth: number } };
    const undo = keepSubsets(face as never, { text: SEED_CHARACTERS, features: SHEET_FEATURES });
    // As pdfkit's EmbeddedFont starts: glyph 0 alone, its width and its text.
    const newFont = () =>
      ({ font: face, subset: face.createSubset(), scale: 1000 / 2048, widths: [face.getGlyph(0).advanceWidth], unicode: [[0]] }) as unknown as EmbeddedFontLike;
    try {
      const first = newFont();
      seedSubset(first);
      expect(first.subset.glyphs.length).toBeGreaterThan(90);
      const second = newFont();
      seedSubset(second);
      const state = (f: EmbeddedFontLike) => ({
        glyphs: f.subset.glyphs,
        numbers: f.subset.glyphs.map((g) => f.subset.mapping[g]),
        widths: f.widths,
        unicode: f.unicode,
      });
      expect(state(second)).toEqual(state(first));
      // A glyph the second document's text adds stays its own.
      second.subset.includeGlyph(face.glyphForCodePoint(0x0416).id);
      second.widths[second.subset.glyphs.length - 1] = 1;
      const third = newFont();
      seedSubset(third);
      expect(state(third)).toEqual(state(first));
      expect(third.subset.mapping[face.glyphForCodePoint(0x0416).id]).toBeUndefined();
      // A font that has written text already is seeded glyph by glyph, after what it holds.
      const used = newFont();
      const smile = used.subset.includeGlyph(face.glyphForCodePoint(0x0416).id);
      seedSubset(used);
      expect(used.subset.glyphs[smile]).toBe(face.glyphForCodePoint(0x0416).id);
      expect(used.subset.glyphs.length).toBe(first.subset.glyphs.length + 1);
    } finally {
      undo();
    }
  });
});
