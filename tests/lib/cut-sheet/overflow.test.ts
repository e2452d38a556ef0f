// A batch where one sheet is too full for its paper: only that sheet is laid out again to spill
// onto a second page; the others keep the one-pass layout (the whole batch in the slower mode
// took 100 sheets from 2.5 s to 6.5 s), and the batch is drawn once, not twice. Read from the
// documents handed to the renderer: those it draws, and those it only lays out.
import type { ReactElement } from 'react';
import { describe, expect, it, vi } from 'vitest';

const documents: ReactElement[] = [];
const laidOut: ReactElement[] = [];
vi.mock('@/lib/render-pdf', async (importOriginal) => {
  const real = await importOriginal<typeof import('@/lib/render-pdf')>();
  return {
    ...real,
    renderPdf: (doc: ReactElement) => {
      documents.push(doc);
      return real.renderPdf(doc as Parameters<typeof real.renderPdf>[0]);
    },
    renderPdfParts: (parts: Iterable<import('@/lib/render-pdf').PdfPart>, props: import('@react-pdf/renderer').DocumentProps) =>
      real.renderPdfParts(
        [...parts].map(({ doc, adjust }) => {
          documents.push(doc);
          return {
            doc,
            adjust: adjust && ((layout, layOut) =>
              adjust(layout, (other) => {
                laidOut.push(other);
                return layOut(other);
              })),
          };
        }),
        props,
      ),
  };
});

const { renderCutSheets } = await import('@/lib/cut-sheet/render');
const { flatText, pageInfo, pdfFile } = await import('./poppler');
const { renderPdf } = await import('@/lib/render-pdf');
const { cutSheetDocument } = await import('@/lib/cut-sheet/CutSheet');
const { comparable } = await import('./pdf-objects');
const { busyLegs, cuffInch, cuffMetric, sheet } = await import('./sheets');

/** The wrap setting of each sheet page of a rendered document. */
function wraps(doc: ReactElement): boolean[] {
  const children = (doc.props as { children: unknown[] }).children;
  const pages = children.flat().filter((c): c is ReactElement => !!c && typeof c === 'object' && 'props' in c && 'data' in ((c as ReactElement).props as object));
  return pages.map((p) => (p.props as { wrap: boolean }).wrap);
}

describe('a batch with one overfull sheet', () => {
  it('lays out again only the overfull sheet, which spills onto a second page at paper size, and draws the batch once', async () => {
    documents.length = 0;
    laidOut.length = 0;
    const list = [
      sheet([cuffInch], { ticket: '3001' }),
      { ...sheet(busyLegs, { ticket: '3002' }), pageSize: 'LETTER' as const, existingFinish: 'cuff' as const },
      sheet([cuffMetric], { ticket: '3003' }),
    ];
    const file = pdfFile(await renderCutSheets(list));
    expect(documents).toHaveLength(1);
    expect(wraps(documents[0]!)).toEqual([false, false, false]);
    // Laid out again alone, wrapped: the overfull sheet and no other.
    expect(laidOut).toHaveLength(1);
    expect(wraps(laidOut[0]!)).toEqual([true]);
    expect(flatText(file, 2)).toContain('Ticket 3002');
    const info = pageInfo(file);
    expect(info).toMatchObject({ pages: 4, width: 612, height: 792 });
    expect(flatText(file, 1)).toContain('Ticket 3001');
    expect(flatText(file, 2)).toContain('Ticket 3002');
    expect(flatText(file, 3)).toContain('AT THE BENCH');
    expect(flatText(file, 4)).toContain('Ticket 3003');
  });

  it('renders a batch that fits in one pass', async () => {
    documents.length = 0;
    laidOut.length = 0;
    await renderCutSheets([sheet([cuffInch]), sheet([cuffMetric])]);
    expect(documents).toHaveLength(1);
    expect(laidOut).toHaveLength(0);
  });

  it('comes out object for object as the whole batch drawn with that one sheet wrapped', async () => {
    const list = [
      sheet([cuffInch], { ticket: '3001' }),
      { ...sheet(busyLegs, { ticket: '3002' }), pageSize: 'LETTER' as const, existingFinish: 'cuff' as const },
      sheet([cuffMetric], { ticket: '3003' }),
    ];
    const spliced = await renderCutSheets(list);
    const whole = await renderPdf(cutSheetDocument(list, [false, true, false]));
    expect(comparable(spliced)).toEqual(comparable(whole));
  });
});
