// pdfkit's paths of straight lines read in one pass must write the very same content as pdfkit's
// own reader (the same bytes in the stream, the same error where pdfkit refuses a number), for
// any path text, and give generated sheets the same PDF objects.
import fc from 'fast-check';
import PDFDocument from 'pdfkit';
import { afterAll, describe, expect, it } from 'vitest';
import { installPdfPlatform, PDF_PATCHES, pdfPatchStatus, uninstallPdfPlatform } from '@/lib/server/pdf-platform/index';
import { straightPathLines, straightPathsFast } from '@/lib/server/pdf-platform/pdf-path';
import { qrPath } from '@/lib/server/cut-sheet/qr';
import { expectSamePrints, printedObjects } from './printed-objects';
import { generatedSheets } from './generated-sheets';

interface Doc {
  addContent: (data: string) => unknown;
  path: (d: string) => unknown;
}

// The stream text one document gets for these paths (each written command ends in a newline), and any error.
function written(paths: readonly string[]): { text: string; error: string | null } {
  const doc = new (PDFDocument as unknown as new (o: object) => Doc)({ autoFirstPage: false });
  let text = '';
  doc.addContent = (data: string) => {
    text += `${data}\n`;
    return doc;
  };
  try {
    for (const d of paths) doc.path(d);
  } catch (e) {
    return { text, error: (e as Error).message };
  }
  return { text, error: null };
}

afterAll(() => {
  uninstallPdfPlatform();
  installPdfPlatform();
});

// Mostly well formed paths of straight lines, as react-pdf hands them on.
const command = fc.oneof(
  fc
    .tuple(fc.constantFrom('M', 'm', 'L', 'l'), fc.double({ min: -1e3, max: 1e3, noNaN: true }), fc.integer({ min: -99, max: 99 }))
    .map(([c, a, b]) => `${c}${a} ${b}`),
  fc.tuple(fc.constantFrom('H', 'h', 'V', 'v'), fc.double({ min: -1e3, max: 1e3, noNaN: true })).map(([c, a]) => `${c}${a}`),
  fc.constantFrom('Z', 'z', ' ', ','),
);
// Path text near what pdfkit reads: commands, numbers of every form it knows (signs, decimals,
// exponents, huge ones), commas and white space, and stray characters.
const token = fc.oneof(
  command,
  fc.constantFrom(
    ',,',
    ', ,',
    'M',
    'm',
    'L',
    'l',
    'H',
    'h',
    'V',
    'v',
    'Z',
    'z',
    'C',
    'q',
    'A',
    ' ',
    ',',
    '\n',
    '\t',
    '.',
    '-',
    '+',
    'e',
    'E',
    'x',
    '1e999',
    '-1e30',
    '9e20',
  ),
  fc.integer({ min: -500, max: 500 }).map(String),
  fc.double({ min: -1e4, max: 1e4, noNaN: true }).map(String),
  fc.tuple(fc.integer({ min: 0, max: 99 }), fc.integer({ min: 0, max: 99 })).map(([a, b]) => `${a}.${b}`),
  fc.tuple(fc.integer({ min: 0, max: 9 }), fc.integer({ min: -3, max: 3 })).map(([a, b]) => `${a}e${b}`),
);
const pathText = fc.oneof(
  fc.tuple(fc.constantFrom('', 'M', 'm', 'M0 0', 'm1,2'), fc.array(token, { maxLength: 40 })).map(([start, t]) => start + t.join('')),
  fc.string({ maxLength: 30 }),
);
const wellFormed = fc.array(command, { maxLength: 30 }).map((c) => `M0 0${c.join('')}`);

describe('pdfkit paths of straight lines read in one pass', () => {
  it('writes what pdfkit writes, and fails where it fails, for any path text', () => {
    uninstallPdfPlatform();
    fc.assert(
      fc.property(fc.array(fc.oneof(pathText, wellFormed), { minLength: 1, maxLength: 4 }), (paths) => {
        const own = written(paths);
        const undo = straightPathsFast();
        try {
          expect(written(paths)).toEqual(own);
        } finally {
          undo();
        }
      }),
      { numRuns: 2000 },
    );
    installPdfPlatform();
  });

  it('reads a QR code path itself, and leaves curves and refused numbers to pdfkit', () => {
    const { d } = qrPath('https://cuffwright.example/garments/0b7e3c52-9d4f-4b1e-8a55-2f7c1d9e6a10');
    expect(straightPathLines(d)?.length).toBeGreaterThan(500);
    expect(straightPathLines('M0 0C1 1 2 2 3 3')).toBeNull();
    expect(straightPathLines('M0 0L1e999 0')).toBeNull();
    expect(straightPathLines('M0 0h2.5v1Z')).toEqual(['0 0 m', '2.5 0 l', '2.5 1 l', 'h']);
  });

  it('is installed over pdfkit 0.20.1 and gives generated sheets the same PDF objects', async () => {
    uninstallPdfPlatform();
    installPdfPlatform({ setting: 'on' });
    expect(pdfPatchStatus().find((s) => s.name === 'pdf-path')).toMatchObject({ on: true, installed: '0.20.1' });
    const sheets = generatedSheets(12, 9127);
    const fast = await printedObjects(sheets);
    // The same sheets drawn with pdfkit's own path reader, every other patch still on.
    uninstallPdfPlatform();
    installPdfPlatform({ setting: 'on', patches: PDF_PATCHES.filter((p) => p.name !== 'pdf-path') });
    expectSamePrints(fast, await printedObjects(sheets));
  }, 180_000);
});
