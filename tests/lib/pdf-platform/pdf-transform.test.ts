// pdfkit's transform written without its arrays must write the very same operator and leave the
// same matrix, for any numbers, and give generated sheets the same PDF objects.
import fc from 'fast-check';
import PDFDocument from 'pdfkit';
import { afterAll, describe, expect, it } from 'vitest';
import { renderCutSheet } from '@/lib/server/cut-sheet/render';
import { installPdfPlatform, PDF_PATCHES, pdfPatchStatus, uninstallPdfPlatform } from '@/lib/server/pdf-platform/index';
import { transformFast } from '@/lib/server/pdf-platform/pdf-transform';
import { comparable } from '../cut-sheet/pdf-objects';
import { generatedSheets } from './generated-sheets';

interface Doc {
  _ctm: number[];
  addContent: (data: string) => unknown;
  transform: (...m: number[]) => unknown;
}

// What one document's transforms write and where they leave its matrix.
function written(calls: readonly (readonly number[])[]): { content: string[]; ctm: number[] } {
  const doc = new (PDFDocument as unknown as new (o: object) => Doc)({ autoFirstPage: false });
  const content: string[] = [];
  doc.addContent = (data: string) => content.push(data);
  for (const m of calls) doc.transform(...m);
  return { content, ctm: [...doc._ctm] };
}

afterAll(() => {
  uninstallPdfPlatform();
  installPdfPlatform();
});

describe('pdfkit transform without arrays', () => {
  it('writes what pdfkit writes and leaves the same matrix, for any finite numbers and the identity', () => {
    uninstallPdfPlatform();
    const num = fc.oneof(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.constantFrom(0, 1, -1, 0.5, 1e-7, 612, 791.9999999));
    const matrix = fc.tuple(num, num, num, num, num, num);
    fc.assert(
      fc.property(fc.array(fc.oneof(matrix, fc.constant([1, 0, 0, 1, 0, 0])), { maxLength: 6 }), (calls) => {
        const own = written(calls);
        const undo = transformFast();
        try {
          expect(written(calls)).toEqual(own);
        } finally {
          undo();
        }
      }),
    );
    installPdfPlatform();
  });

  it('is installed over pdfkit 0.20.1 and gives generated sheets the same PDF objects', async () => {
    uninstallPdfPlatform();
    installPdfPlatform({ setting: 'on' });
    expect(pdfPatchStatus().find((s) => s.name === 'pdf-transform')).toMatchObject({ on: true, installed: '0.20.1' });
    const sheets = generatedSheets(8, 515);
    const fast = [];
    for (const s of sheets) fast.push(comparable(await renderCutSheet(s)));
    // The same sheets drawn with pdfkit's own transform, every other patch still on.
    uninstallPdfPlatform();
    installPdfPlatform({ setting: 'on', patches: PDF_PATCHES.filter((p) => p.name !== 'pdf-transform') });
    const own = [];
    for (const s of sheets) own.push(comparable(await renderCutSheet(s)));
    for (let i = 0; i < sheets.length; i++) expect(fast[i], `sheet ${i}`).toEqual(own[i]);
  }, 120_000);
});
