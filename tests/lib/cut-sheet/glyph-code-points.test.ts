// fontkit keeps one glyph object per glyph number, with the characters of the call that first made
// it. A PDF's font subset makes the parts of composite glyphs by number alone (no characters): any
// sheet with a comma left Inter's right quote (a part of its comma) with none. Every later sheet in
// the process then set "’" as a glyph standing for no character, so textkit counted the paragraph's
// characters one short: a French sheet broke "cette règle doit" as "règle d / oit", and its text
// read back "d épingle" (the text layer found with the French sheets, issue 13, and kept as a
// failing case in to-unicode.test.ts; the broken lines found by running the sheet tests in one
// process). And a glyph that stands for two characters (Inter draws "’" and the modifier letter
// "ʼ" alike) kept the one the process met first: after a name typed with "ʼ", every sheet's "’"
// read back as "ʼ". Each file here runs in a fresh process (vitest.config.ts), so the other sheets
// come first, as on a server.
import { Font } from '@react-pdf/renderer';
import { describe, expect, it } from 'vitest';
import { sheetContent } from '@/lib/server/cut-sheet/content';
import { FAMILY, registerFonts } from '@/lib/server/cut-sheet/fonts';
import { renderCutSheet } from '@/lib/server/cut-sheet/render';
import type { CutSheetData } from '@/lib/shared/cut-sheet-types';
import { generatedSheets } from '../pdf-platform/generated-sheets';
import { flatText, pdfFile } from './poppler';
import { buildCutSheet } from '@/lib/server/cut-sheet/build';
import { cuffInch, cuffMetric, sheet, UNSAVED } from './sheets';

interface Glyph {
  id: number;
  codePoints: number[];
}
interface Face {
  getGlyph: (id: number, characters?: number[]) => Glyph;
  glyphForCodePoint: (cp: number) => Glyph;
  layout: (text: string) => { glyphs: Glyph[] };
  _glyphs: Record<number, Glyph | undefined>;
}

const FRENCH: CutSheetData = { ...sheet([cuffInch]), existingFinish: 'cuff', language: 'fr' };

describe('glyphs made by number first (a font subset) and then used in text', () => {
  it('keep the characters of their first use in text', async () => {
    await registerFonts();
    const face = Font.getFont({ fontFamily: FAMILY, fontWeight: 700, fontStyle: 'normal' }).data as unknown as Face;
    // "‹" (single left angle quote, U+2039): no sheet prints it, so its glyph is not made yet.
    const id = face.glyphForCodePoint(0x2039).id;
    delete face._glyphs[id];
    face.getGlyph(id);
    expect(face._glyphs[id]?.codePoints).toEqual([]);
    expect(face.layout('a‹b').glyphs.map((g) => g.codePoints)).toEqual([[0x61], [0x2039], [0x62]]);
  });

  it('leave a French sheet whole after English ones: every sentence unbroken, every apostrophe read back', async () => {
    for (const data of generatedSheets(6, 1207)) await renderCutSheet({ ...data, language: 'en' });
    const text = flatText(pdfFile(await renderCutSheet(FRENCH)));
    const c = sheetContent(FRENCH);
    // The guide's first note ("Vérifiez l’imprimante : cette règle doit mesurer…"), the steps and the
    // cautions: text poppler reads in order (the drawing's numbers come between the later notes).
    const sentences = [c.guideNote[0]!, ...c.steps.flatMap((b) => b.items), ...c.cautions].map((s) => s.replace(/\s+/g, ' '));
    expect(sentences.filter((s) => s.includes('’')).length).toBeGreaterThan(3);
    for (const s of sentences) expect(text).toContain(s);
  }, 60_000);

  it('give a glyph drawn for two characters the one each text used (Inter draws ’ and ʼ alike)', async () => {
    await registerFonts();
    const face = Font.getFont({ fontFamily: FAMILY, fontWeight: 400, fontStyle: 'normal' }).data as unknown as Face;
    // Inter's own: U+02BC (modifier letter apostrophe, in Ukrainian names) and U+2019 are one glyph.
    expect(face.glyphForCodePoint(0x2bc).id).toBe(face.glyphForCodePoint(0x2019).id);
    expect(face.layout('Мар\u02bcяна').glyphs[3]!.codePoints).toEqual([0x2bc]);
    expect(face.layout('l\u2019aiguille').glyphs[1]!.codePoints).toEqual([0x2019]);
    expect(face.layout('Мар\u02bcяна').glyphs[3]!.codePoints).toEqual([0x2bc]);
  });

  it('print each of the two in its own sheet: the name reads back ʼ, the French sheet after it ’', async () => {
    // The other tests here printed French sheets first: the process met "’" before "ʼ".
    const named = flatText(pdfFile(await renderCutSheet({ ...sheet([cuffInch]), garment: 'Сірі штани для Мар\u02bcяни' })));
    expect(named).toContain('Мар\u02bcяни');
    const text = flatText(pdfFile(await renderCutSheet(FRENCH)));
    expect(text).toContain('l\u2019imprimante');
    expect(text).not.toContain('\u02bc');
  }, 60_000);

  it("read back a French sheet's ’ after a metric sheet and an unsaved French one (issue 13's case)", async () => {
    await renderCutSheet({ ...buildCutSheet(UNSAVED, [cuffMetric]), pageSize: 'A4' });
    await renderCutSheet({ ...buildCutSheet(UNSAVED, [cuffInch]), language: 'fr' });
    const text = flatText(pdfFile(await renderCutSheet({ ...sheet([cuffMetric]), language: 'fr', pageSize: 'A4' })));
    expect(text).toContain('À L’ÉTABLI');
  });
});
