// A long-running server prints thousands of sheets: rendering must not keep each document alive.
// react-pdf's own renderToBuffer kept every document's whole tree (about 170 kB a sheet).
import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import { Document, Page, Text, View } from '@react-pdf/renderer';
import { createElement } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { buildCutSheet } from '@/lib/server/cut-sheet/build';
import { FAMILY, registerFonts } from '@/lib/server/cut-sheet/fonts';
import { renderCutSheet } from '@/lib/server/cut-sheet/render';
import { renderPdf } from '@/lib/server/render-pdf';
import { cutSheetDocument } from '@/lib/server/cut-sheet/CutSheet';
import { SHOP } from './cut-sheet/sheets';
import { textRuns } from './cut-sheet/pdf-runs';

setFlagsFromString('--expose-gc');
const gc = runInNewContext('gc') as () => void;

// A different garment each time: ticket, cuff depth (1/16 steps) and cloth all vary.
const sheet = (i: number) =>
  buildCutSheet({ ...SHOP, ticket: String(3000 + i), link: `https://cuffwright.example/garments/${3000 + i}` }, [
    { side: 'left', finish: 'cuff', input: { unit: 'in', precision: 16, cuffDepth: `${20 + (i % 13)}/16`, available: `${64 + (i % 41)}/16` } },
  ]);

const heapAfterGc = () => {
  gc();
  gc();
  return process.memoryUsage().heapUsed;
};

describe('rendering PDFs', () => {
  it('keeps the heap flat over 150 different sheets', async () => {
    for (let i = 0; i < 30; i++) await renderCutSheet(sheet(i));
    const before = heapAfterGc();
    for (let i = 30; i < 180; i++) await renderCutSheet(sheet(i));
    const grown = heapAfterGc() - before;
    // Kept layouts of one-off paragraphs are bounded (they fill to their limit within these 150:
    // over 450 sheets the heap grew 4 MB, less than here); 150 documents kept alive would be ~25 MB.
    expect(grown).toBeLessThan(12 * 1024 * 1024);
  }, 120_000);

  it('renders documents asked for at the same moment one at a time, each whole', async () => {
    const pdfs = await Promise.all([0, 1, 2, 3].map((i) => renderPdf(cutSheetDocument([sheet(500 + i)]))));
    pdfs.forEach((bytes, i) => {
      const text = bytes.toString('latin1');
      expect(text.startsWith('%PDF-')).toBe(true);
      expect(text.trimEnd().endsWith('%%EOF')).toBe(true);
      expect(text).toContain(`(Cut sheet ${3500 + i})`);
    });
  });

  // When one React root served every document, React moved a keyed row that changed place between
  // two documents without removing it first, and react-pdf's host kept the old place too, so the
  // row printed twice (found on the sleeve sheet's buttons table). Each tree is now made afresh.
  it('prints a keyed row once when the next document has the rows in another order', async () => {
    await registerFonts();
    const rows = (order: string[]) =>
      createElement(
        Document,
        { title: 'Rows' },
        createElement(
          Page,
          { style: { fontFamily: FAMILY } },
          order.map((r) => createElement(View, { key: r }, createElement(Text, null, `row ${r}`))),
        ),
      );
    const words = (pdf: Buffer) =>
      textRuns(pdf)
        .map((run) => run.text.trim())
        .filter((t) => t.startsWith('row'));
    expect(words(await renderPdf(rows(['A', 'B', 'C'])))).toEqual(['row A', 'row B', 'row C']);
    expect(words(await renderPdf(rows(['C', 'A', 'B'])))).toEqual(['row C', 'row A', 'row B']);
    expect(words(await renderPdf(rows(['A', 'B', 'C'])))).toEqual(['row A', 'row B', 'row C']);
  });

  it('refuses a document that fails while drawing instead of printing the one before it', async () => {
    await registerFonts();
    const good = await renderPdf(cutSheetDocument([sheet(600)]));
    expect(good.toString('latin1')).toContain('(Cut sheet 3600)');
    const Broken = () => {
      throw new Error('a part of the sheet failed');
    };
    const quiet = vi.spyOn(console, 'error').mockImplementation(() => undefined);
    try {
      const broken = createElement(Document, { title: 'Broken sheet' }, createElement(Page, null, createElement(Broken)));
      await expect(renderPdf(broken)).rejects.toThrow('a part of the sheet failed');
    } finally {
      quiet.mockRestore();
    }
    const next = await renderPdf(createElement(Document, { title: 'Next sheet' }, createElement(Page, null, createElement(Text, null, 'next'))));
    expect(next.toString('latin1')).toContain('(Next sheet)');
  });
});
