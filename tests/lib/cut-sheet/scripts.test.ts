// Names in any script: a customer, shop or garment written in Greek, Japanese, Arabic… prints in
// an embedded font that has its glyphs (never the PDF reader's Helvetica), reads back as typed,
// and a Latin-only document embeds nothing but Inter. All names are invented.
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import * as fontkit from 'fontkit';
import { describe, expect, it } from 'vitest';
import { renderClaimSlip } from '@/lib/server/claim-slip/render';
import type { ClaimSlipData } from '@/lib/server/claim-slip/types';
import { renderCutSheet } from '@/lib/server/cut-sheet/render';
import { pdfObjects } from './pdf-objects';
import { flatText, fonts, pdfFile } from './poppler';
import { cuffInch, sheet } from './sheets';
import { SLIP as TWO_GARMENTS } from '../claim-slip/slip';

/** Invented names, one per script a shop meets. */
const NAMES = [
  ['Latin Extended', 'Łukasz Ðorđević'],
  ['Greek', 'Ελπίδα Καραβίδα'],
  ['Cyrillic', 'Зоя Веретенникова'],
  ['Japanese', '森川 ゆかり'],
  ['Chinese', '林雨桐'],
  ['Korean', '하솔빈'],
  ['Arabic', 'سلامة النجار'],
  ['Hebrew', 'תמר אלון'],
  ['Devanagari', 'कविता मेहरा'],
] as const;

interface Glyph {
  id: number;
  codePoints: number[];
}
interface Face {
  layout: (text: string, features?: object, script?: string, language?: string, direction?: string) => { glyphs: Glyph[] };
  glyphForCodePoint: (cp: number) => Glyph;
  createSubset: () => { includeGlyph: (id: number) => number; encode: () => Uint8Array };
}
const require = createRequire(import.meta.url);
/** A shipped face, loaded afresh with fontkit (not the renderer's memoised one). */
const face = (pkg: string, file: string) => fontkit.create(readFileSync(join(dirname(require.resolve(`${pkg}/package.json`)), file))) as unknown as Face;

/** Each word shaped in logical order as fontkit does it for the page (joined forms, conjuncts), left to right. */
const shaped = (f: Face, word: string) => f.layout(word, undefined, undefined, undefined, 'ltr').glyphs;

/**
 * The text a reader gets back from the page. pdftotext reads glyphs in the order they stand on
 * the line, so a Devanagari vowel sign written before its consonant (ि in कविता) comes out first:
 * the expected text is the shaped glyphs' characters in glyph order, which is the typed name for
 * every other script here.
 */
function readBack(name: string): string {
  if (!/[\u0900-\u097f]/.test(name)) return name;
  const deva = face('@expo-google-fonts/noto-sans-devanagari', '700Bold/NotoSansDevanagari_700Bold.ttf');
  return name
    .split(' ')
    .map((w) => String.fromCodePoint(...shaped(deva, w).flatMap((g) => g.codePoints)))
    .join(' ');
}

// One garment, unpaid.
const SLIP: ClaimSlipData = { ...TWO_GARMENTS, garments: ['Charcoal flannel'], lines: TWO_GARMENTS.lines.slice(0, 1), total: 2400, paid: 0, due: 2400 };

/** Each embedded font's PostScript name and every character its ToUnicode map gives for its glyphs. */
function embeddedFonts(pdf: Uint8Array): { name: string; chars: Set<number> }[] {
  const objects = pdfObjects(pdf);
  const byId = new Map(objects.map((o) => [o.id, o]));
  return objects
    .filter((o) => o.dict.includes('/Subtype /Type0'))
    .map((type0) => {
      const cmap = byId.get(Number(/\/ToUnicode (\d+) 0 R/.exec(type0.dict)![1]))!.stream!.toString('latin1');
      const chars = new Set<number>();
      for (const [, list] of cmap.matchAll(/<[0-9a-f]{4}> <[0-9a-f]{4}> \[([^\]]*)\]/g)) {
        for (const [, hex] of list!.matchAll(/<([0-9a-f]+)>/g)) {
          // UTF-16BE, possibly several characters for one glyph (a ligature, a conjunct).
          const units = hex!.match(/.{4}/g)!.map((h) => parseInt(h, 16));
          for (const c of String.fromCharCode(...units)) chars.add(c.codePointAt(0)!);
        }
      }
      return { name: /\/BaseFont \/(?:[A-Z]{6}\+)?(\S+)/.exec(type0.dict)![1]!, chars };
    });
}

/** What every document with the name must show: only embedded fonts, each of the name's letters in one, the name in the text. */
function expectPrinted(pdf: Uint8Array, name: string): void {
  const file = pdfFile(pdf);
  const used = fonts(file);
  for (const f of used) {
    expect(f.name, 'no standard font left to the reader').not.toMatch(/Helvetica|Times|Courier/);
    expect(f.embedded, `${f.name} embedded`).toBe(true);
  }
  const embedded = embeddedFonts(pdf);
  // Every font pdffonts lists is one of ours, a Type0 font with its glyphs and ToUnicode map.
  expect(embedded.length).toBe(used.length);
  for (const ch of name.replace(/\s/g, '')) {
    const cp = ch.codePointAt(0)!;
    expect(
      embedded.some((f) => f.chars.has(cp)),
      `U+${cp.toString(16)} drawn by an embedded font`,
    ).toBe(true);
  }
  // Poppler puts a right-to-left run drawn right to left back into typing order (between
  // embedding marks): it reads back as typed only if the page drew it in the right order.
  const text = flatText(file).replace(/[\u202a-\u202e]/g, '');
  expect(text).toContain(readBack(name));
}

describe.each(NAMES)('a name in %s', (_script, name) => {
  it('prints on the claim slip in an embedded font and reads back', async () => {
    expectPrinted(await renderClaimSlip({ ...SLIP, customerName: name, garments: [`${name} — Charcoal flannel`] }), name);
  });

  it('prints on the cut sheet (shop, garment and assignee) in an embedded font and reads back', async () => {
    expectPrinted(await renderCutSheet(sheet([cuffInch], { shop: name, garment: `Navy flannel for ${name}`, assignee: name })), name);
  });
});

describe('right-to-left names', () => {
  // The embedded subset lists glyphs in the order the page first draws them. For a name drawn once,
  // that is right to left: the last word first, each word's shaped glyphs reversed. Rebuilt with
  // fontkit from the logical string, it must equal the embedded font file byte for byte, which
  // checks both the joined (contextual) forms and the visual order.
  // The sheet is set with features that turn off what Arabic needs (its lam-alef below is a
  // required ligature); the slip sets none.
  const cases = [
    ['Arabic', 'سلامة النجار', '@expo-google-fonts/noto-sans-arabic', '700Bold/NotoSansArabic_700Bold.ttf', 'NotoSansArabic-Bold'],
    ['Hebrew', 'תמר אלון', '@expo-google-fonts/noto-sans-hebrew', '700Bold/NotoSansHebrew_700Bold.ttf', 'NotoSansHebrew-Bold'],
  ] as const;
  const docs = [
    ['claim slip', (name: string) => renderClaimSlip({ ...SLIP, customerName: name })],
    ['cut sheet', (name: string) => renderCutSheet(sheet([cuffInch], { shop: name }))],
  ] as const;
  const rows = cases.flatMap(([script, ...c]) => docs.map(([doc, render]) => [script, doc, ...c, render] as const));
  it.each(rows)('draws the %s name on the %s right to left, with its joined forms', async (script, _doc, name, pkg, file, postscript, render) => {
    const pdf = await render(name);
    const f = face(pkg, file);
    const visual = name
      .split(' ')
      .reverse()
      .flatMap((w) => shaped(f, w).reverse());
    const subset = f.createSubset();
    for (const g of visual) subset.includeGlyph(g.id);
    const objects = pdfObjects(pdf);
    const byId = new Map(objects.map((o) => [o.id, o]));
    const ref = (dict: string, key: string) => byId.get(Number(new RegExp(`/${key} (\\d+) 0 R`).exec(dict)![1]))!;
    const type0 = objects.find((o) => o.dict.includes('/Subtype /Type0') && o.dict.includes(postscript))!;
    const cid = byId.get(Number(/\/DescendantFonts \[(\d+) 0 R\]/.exec(type0.dict)![1]))!;
    const embedded = ref(ref(cid.dict, 'FontDescriptor').dict, 'FontFile2').stream!;
    expect(embedded.equals(Buffer.from(subset.encode()))).toBe(true);
    if (script === 'Arabic') {
      // Joining matters here: the shaped letters are not the isolated forms the character map gives.
      const isolated = [...name.replace(/ /g, '')].map((c) => f.glyphForCodePoint(c.codePointAt(0)!).id);
      expect(visual.map((g) => g.id)).not.toEqual(expect.arrayContaining(isolated));
    }
  });
});

describe('a character no shipped face has', () => {
  // An emoji (no shipped face has one): a white square from Inter, embedded, rather than an
  // unembedded Helvetica that has no such glyph either.
  const name = '🧵 Ahn 🪡';
  it.each([
    ['claim slip', () => renderClaimSlip({ ...SLIP, customerName: name })],
    ['cut sheet', () => renderCutSheet(sheet([cuffInch], { assignee: name }))],
  ])('prints as a white square on the %s, in embedded fonts only', async (_doc, render) => {
    const pdf = await render();
    expectPrinted(pdf, '□ Ahn □');
    expect(embeddedFonts(pdf).every((f) => f.name.startsWith('Inter-'))).toBe(true);
  });
});

describe('a CJK name set in bold', () => {
  // The slip sets the customer's name at 700 and the shop's at 800, the sheet its title (the shop)
  // at 800: each prints in the face's bold, not its regular beside a bold Inter.
  const cases = [
    ['Chinese', '林雨桐', 'NotoSansSC-Bold'],
    ['Korean', '하솔빈', 'NotoSansKR-Bold'],
  ] as const;
  const docs = [
    ['claim slip (customer, 700)', (name: string) => renderClaimSlip({ ...SLIP, customerName: name })],
    ['claim slip (shop, 800)', (name: string) => renderClaimSlip({ ...SLIP, shopName: name })],
    ['cut sheet (shop, 800)', (name: string) => renderCutSheet(sheet([cuffInch], { shop: name, assignee: null, garment: null }))],
  ] as const;
  const rows = cases.flatMap(([script, name, bold]) => docs.map(([doc, render]) => [script, doc, name, bold, render] as const));
  it.each(rows)('draws the %s name on the %s in the bold face', async (_script, _doc, name, bold, render) => {
    const fonts = embeddedFonts(await render(name));
    const face = fonts.find((f) => f.name === bold);
    expect(face, `${bold} embedded`).toBeDefined();
    for (const ch of name) expect(face!.chars.has(ch.codePointAt(0)!), `${ch} in ${bold}`).toBe(true);
    // The name appears only in bold, so the regular face has nothing to draw.
    expect(fonts.map((f) => f.name)).not.toContain(bold.replace('-Bold', '-Regular'));
  });
});

describe('a Latin-only document', () => {
  it('embeds Inter and no other font, on the slip and on the sheet', async () => {
    for (const pdf of [await renderClaimSlip(SLIP), await renderCutSheet(sheet([cuffInch]))]) {
      expect(
        embeddedFonts(pdf)
          .map((f) => f.name)
          .sort(),
      ).toEqual(expect.arrayContaining(['Inter-Bold', 'Inter-ExtraBold']));
      for (const f of embeddedFonts(pdf)) expect(f.name).toMatch(/^Inter-/);
    }
  });
});
