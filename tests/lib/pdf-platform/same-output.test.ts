// The speed patches change how fast a PDF is made, never what it shows: many generated sheets,
// and a batch of them, printed with every patch installed (cold, then warm) and with none, must
// give the same pages pixel for pixel and the same words in the same boxes. Font subsets are
// numbered differently with the seed (subset-memo.ts), so pages are compared as printed, not byte
// for byte; the single-patch tests in tests/lib/cut-sheet compare objects where they can.
import { afterAll, describe, expect, it } from 'vitest';
import { renderCutSheet, renderCutSheets } from '@/lib/server/cut-sheet/render';
import { installPdfPlatform, pdfPatchStatus, uninstallPdfPlatform } from '@/lib/server/pdf-platform/index';
import { allWords, grayPages, pdfFile } from '../cut-sheet/poppler';
import { generatedSheets } from './generated-sheets';

const SHEETS = generatedSheets(24);
const DPI = 50;

/** What a reader of the PDF sees: each page's pixels and every word with its box. */
function printed(pdf: Uint8Array) {
  const file = pdfFile(pdf);
  return { pages: grayPages(file, DPI).map((p) => ({ width: p.width, height: p.height, px: Buffer.from(p.px).toString('base64') })), words: allWords(file) };
}

afterAll(() => {
  uninstallPdfPlatform();
  installPdfPlatform();
});

describe('the PDF speed patches', () => {
  it('cover two-leg tapered sheets, overfull pages, metric and inch, both papers and other scripts among the generated sheets', async () => {
    expect(SHEETS).toHaveLength(24);
    expect(SHEETS.some((s) => s.legs.length === 2 && s.legs.every((l) => l.taper))).toBe(true);
    expect(SHEETS.some((s) => s.unit === 'mm') && SHEETS.some((s) => s.unit === 'in')).toBe(true);
    expect(SHEETS.some((s) => s.pageSize === 'A4') && SHEETS.some((s) => s.pageSize === 'LETTER')).toBe(true);
    expect(SHEETS.some((s) => /\p{Script=Han}/u.test(s.garment ?? '')) && SHEETS.some((s) => /\p{Script=Arabic}/u.test(s.garment ?? ''))).toBe(true);
  });

  it('print every generated sheet, cold and warm, and a batch, the same as without any patch', async () => {
    uninstallPdfPlatform();
    installPdfPlatform();
    expect(pdfPatchStatus().map((s) => s.on)).toEqual(pdfPatchStatus().map(() => true));
    const cold: Uint8Array[] = [];
    for (const s of SHEETS) cold.push(await renderCutSheet(s));
    const warm: Uint8Array[] = [];
    for (const s of SHEETS) warm.push(await renderCutSheet(s));
    const batch = await renderCutSheets(SHEETS.slice(0, 8));
    uninstallPdfPlatform();
    const plain: Uint8Array[] = [];
    let plainBatch: Uint8Array;
    try {
      for (const s of SHEETS) plain.push(await renderCutSheet(s));
      plainBatch = await renderCutSheets(SHEETS.slice(0, 8));
    } finally {
      installPdfPlatform();
    }
    // The two paths really differ (seeded subsets, other compression), so the comparison means something.
    expect(plain.filter((p, i) => Buffer.compare(Buffer.from(p), Buffer.from(cold[i]!)) !== 0).length).toBeGreaterThan(0);
    let overfull = 0;
    for (let i = 0; i < SHEETS.length; i++) {
      const want = printed(plain[i]!);
      if (want.pages.length > 1) overfull += 1;
      expect(printed(cold[i]!), `sheet ${i} cold`).toEqual(want);
      expect(printed(warm[i]!), `sheet ${i} warm`).toEqual(want);
    }
    // Some generated sheets spill onto a second page (relaid: render.ts), and are compared too.
    expect(overfull).toBeGreaterThan(0);
    expect(printed(batch)).toEqual(printed(plainBatch!));
  }, 240_000);
});
