// Page content deflated aside (on libuv's thread pool while the document goes on) must give the
// same objects as deflated in place, and a file whose cross-reference table points at each one.
import { afterAll, describe, expect, it } from 'vitest';
import { renderCutSheet, renderCutSheets } from '@/lib/server/cut-sheet/render';
import { installPdfPlatform, PDF_PATCHES, uninstallPdfPlatform } from '@/lib/server/pdf-platform/index';
import { comparable, pdfObjects } from '../cut-sheet/pdf-objects';
import { generatedSheets } from './generated-sheets';

const SHEETS = generatedSheets(6, 4417);

const use = (aside: boolean) => {
  uninstallPdfPlatform();
  installPdfPlatform({ patches: aside ? PDF_PATCHES : PDF_PATCHES.filter((p) => p.name !== 'pdf-deflate-aside') });
};

/** Every object the cross-reference table lists, checked to start where it says; their count. */
function checkedOffsets(pdf: Uint8Array): number {
  const text = Buffer.from(pdf).toString('latin1');
  const start = Number(/startxref\n(\d+)\n%%EOF\s*$/.exec(text)?.[1]);
  expect(text.slice(start, start + 5)).toBe('xref\n');
  const table = text.slice(start, text.indexOf('trailer', start));
  const offsets = [...table.matchAll(/^(\d{10}) 00000 n $/gm)].map((m) => Number(m[1]));
  offsets.forEach((at, i) => expect(text.slice(at, at + `${i + 1} 0 obj`.length), `object ${i + 1}`).toBe(`${i + 1} 0 obj`));
  return offsets.length;
}

afterAll(() => use(true));

describe('page content deflated aside', () => {
  it('gives every sheet and a batch the same objects as deflated in place, each where the table says', async () => {
    use(false);
    const inPlace: string[][] = [];
    const orderInPlace: number[][] = [];
    for (const s of SHEETS) {
      const pdf = await renderCutSheet(s);
      inPlace.push(comparable(pdf));
      orderInPlace.push(pdfObjects(pdf).map((o) => o.id));
    }
    const batchInPlace = comparable(await renderCutSheets(SHEETS, [], 2));
    use(true);
    let moved = 0;
    for (const [i, s] of SHEETS.entries()) {
      const pdf = await renderCutSheet(s);
      expect(checkedOffsets(pdf)).toBeGreaterThan(10);
      expect(comparable(pdf), `sheet ${i}`).toEqual(inPlace[i]);
      if (pdfObjects(pdf).some((o, k) => o.id !== orderInPlace[i]![k])) moved += 1;
    }
    // The content came later in the file than in place: it was deflated aside.
    expect(moved).toBe(SHEETS.length);
    // In parts of two: each part's pages are deflated aside while the next part is laid out.
    const batch = await renderCutSheets(SHEETS, [], 2);
    expect(checkedOffsets(batch)).toBeGreaterThan(30);
    expect(comparable(batch)).toEqual(batchInPlace);
  });
});
