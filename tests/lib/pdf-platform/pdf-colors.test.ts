// pdfkit's colours parsed once per process must write the very same commands as pdfkit's own
// parsing, for any colour text and for spot colours, fill and stroke, and give generated sheets
// the same PDF objects.
import fc from 'fast-check';
import PDFDocument from 'pdfkit';
import { afterAll, describe, expect, it } from 'vitest';
import { installPdfPlatform, PDF_PATCHES, pdfPatchStatus, uninstallPdfPlatform } from '@/lib/server/pdf-platform/index';
import { keepColors } from '@/lib/server/pdf-platform/pdf-colors';
import { expectSamePrints, printedObjects } from './printed-objects';
import { generatedSheets } from './generated-sheets';

interface Doc {
  addContent: (data: string) => unknown;
  addSpotColor: (name: string, c: number, m: number, y: number, k: number) => unknown;
  fillColor: (color: unknown, opacity?: number) => unknown;
  strokeColor: (color: unknown, opacity?: number) => unknown;
}

type Call = { color: unknown; stroke: boolean };

// What one document writes for these colour calls (a spot colour named "Chalk" defined first).
function written(calls: readonly Call[]): string[] {
  const doc = new (PDFDocument as unknown as new (o: object) => Doc)({ autoFirstPage: false });
  doc.addSpotColor('Chalk', 10, 20, 30, 0);
  const content: string[] = [];
  doc.addContent = (data: string) => content.push(data);
  for (const c of calls) {
    try {
      if (c.stroke) doc.strokeColor(c.color);
      else doc.fillColor(c.color);
    } catch (e) {
      content.push(`threw ${(e as Error).message}`);
    }
  }
  return content;
}

afterAll(() => {
  uninstallPdfPlatform();
  installPdfPlatform();
});

describe('pdfkit colours kept per process', () => {
  it('writes what pdfkit writes for hex, short hex, named, spot, unknown and array colours, fill and stroke', () => {
    uninstallPdfPlatform();
    const hex = fc.stringMatching(/^#([0-9a-fA-F]{3}|[0-9a-fA-F]{6})$/);
    const text = fc.oneof(
      hex,
      fc.constantFrom('black', 'white', 'red', 'rebeccapurple', 'Chalk', 'chalk', 'nocolour', '', '#', '#12', '#zzzzzz'),
      fc.string({ maxLength: 8 }),
    );
    const color = fc.oneof(text, fc.tuple(fc.nat(255), fc.nat(255), fc.nat(255)), fc.tuple(fc.nat(100), fc.nat(100), fc.nat(100), fc.nat(100)));
    const call = fc.record({ color, stroke: fc.boolean() });
    fc.assert(
      fc.property(fc.array(call, { maxLength: 12 }), (calls) => {
        const own = written(calls);
        const undo = keepColors();
        try {
          // Twice: the first call parses and keeps, the second answers from what was kept.
          expect(written(calls)).toEqual(own);
          expect(written(calls)).toEqual(own);
        } finally {
          undo();
        }
      }),
      { numRuns: 300 },
    );
    installPdfPlatform();
  });

  it('keeps a colour text only as numbers: a spot colour of one document is not kept for the next', () => {
    uninstallPdfPlatform();
    const undo = keepColors();
    try {
      const spot = written([{ color: 'Chalk', stroke: false }]);
      expect(spot.some((line) => line.startsWith('/CS'))).toBe(true);
      // A document without that spot colour writes nothing for the name, as pdfkit does.
      const doc = new (PDFDocument as unknown as new (o: object) => Doc)({ autoFirstPage: false });
      const content: string[] = [];
      doc.addContent = (data: string) => content.push(data);
      doc.fillColor('Chalk');
      expect(content).toEqual([]);
    } finally {
      undo();
      installPdfPlatform();
    }
  });

  it('is installed over pdfkit 0.20.1 and gives generated sheets the same PDF objects', async () => {
    uninstallPdfPlatform();
    installPdfPlatform({ setting: 'on' });
    expect(pdfPatchStatus().find((s) => s.name === 'pdf-colors')).toMatchObject({ on: true, installed: '0.20.1' });
    const sheets = generatedSheets(12, 9127);
    const kept = await printedObjects(sheets);
    // The same sheets drawn with pdfkit's own colour parsing, every other patch still on.
    uninstallPdfPlatform();
    installPdfPlatform({ setting: 'on', patches: PDF_PATCHES.filter((p) => p.name !== 'pdf-colors') });
    expectSamePrints(kept, await printedObjects(sheets));
  }, 180_000);
});
