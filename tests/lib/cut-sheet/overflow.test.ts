// A batch where one sheet is too full for its paper: only that sheet's page is split to spill
// onto a second page; the others keep the one-pass layout (the whole batch in the slower mode
// took 100 sheets from 2.5 s to 6.5 s), and the batch is drawn once, not twice. The split starts
// from the first layout's tall page (pdf-platform/split-laid-out.ts); with that patch off the
// sheet is laid out again, wrapped. Read from the documents handed to the renderer: those it
// draws, and those it only lays out.
import type { ReactElement } from 'react';
import { describe, expect, it, vi } from 'vitest';

const documents: ReactElement[] = [];
const laidOut: ReactElement[] = [];
vi.mock('@/lib/server/render-pdf', async (importOriginal) => {
  const real = await importOriginal<typeof import('@/lib/server/render-pdf')>();
  return {
    ...real,
    renderPdf: (doc: ReactElement) => {
      documents.push(doc);
      return real.renderPdf(doc as Parameters<typeof real.renderPdf>[0]);
    },
    renderPdfParts: (parts: Iterable<import('@/lib/server/render-pdf').PdfPart>, props: import('@react-pdf/renderer').DocumentProps) =>
      real.renderPdfParts(
        [...parts].map(({ doc, adjust }) => {
          documents.push(doc);
          return {
            doc,
            adjust:
              adjust &&
              ((layout, layOut) =>
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

const { renderCutSheets } = await import('@/lib/server/cut-sheet/render');
const { flatText, pageInfo, pdfFile } = await import('./poppler');
const { renderPdf } = await import('@/lib/server/render-pdf');
const { cutSheetDocument } = await import('@/lib/server/cut-sheet/CutSheet');

const { comparable } = await import('./pdf-objects');
const { busyLegs, cuffInch, cuffMetric, sheet } = await import('./sheets');
const { sheetStripColumns } = await import('@/lib/server/cut-sheet/CutSheet');
const { installPdfPlatform, uninstallPdfPlatform } = await import('@/lib/server/pdf-platform/index');

/** A cuff deep enough that its strip goes on over a page of strip (as in strip-reach.test.ts). */
const longCuff = { side: 'right' as const, finish: 'cuff' as const, input: { unit: 'in' as const, precision: 8 as const, cuffDepth: '2 3/4', available: 10 } };

/** The wrap setting of each sheet page of a rendered document. */
function wraps(doc: ReactElement): boolean[] {
  const children = (doc.props as { children: unknown[] }).children;
  const pages = children
    .flat()
    .filter((c): c is ReactElement => !!c && typeof c === 'object' && 'props' in c && 'data' in ((c as ReactElement).props as object));
  return pages.map((p) => (p.props as { wrap: boolean }).wrap);
}

describe('a batch with one overfull sheet', () => {
  it('splits only the overfull sheet from the first layout (laying out nothing again), onto a second page at paper size, and draws the batch once', async () => {
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
    expect(laidOut).toHaveLength(0);
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

  // Overfull on both papers, one overfull sheet with a page of strip after it, a sheet that fits
  // between them, and a skipped-garments page: each split page in its place, as if drawn wrapped.
  const mixed = () => [
    { ...sheet(busyLegs, { ticket: '3101' }), pageSize: 'A4' as const, existingFinish: 'cuff' as const },
    { ...sheet([busyLegs[0]!, longCuff], { ticket: '3102' }), existingFinish: 'cuff' as const },
    { ...sheet([longCuff], { ticket: '3103' }), pageSize: 'A4' as const },
    { ...sheet(busyLegs, { ticket: '3104' }), existingFinish: 'cuff' as const },
  ];
  const overfull = [true, true, false, true];

  it('splits several overfull sheets, on both papers and with a page of strip after one, as the batch drawn with them wrapped', async () => {
    const list = mixed();
    expect(list.map((d) => sheetStripColumns(d).page.length > 0)).toEqual([false, true, false, false]);
    laidOut.length = 0;
    const spliced = await renderCutSheets(list, ['Ticket 3105']);
    expect(laidOut).toHaveLength(0);
    const whole = await renderPdf(cutSheetDocument(list, overfull, ['Ticket 3105']));
    // Each overfull sheet took a second page: 4 sheets + 3 second pages + a page of strip + the skipped page.
    expect(pageInfo(pdfFile(spliced)).pages).toBe(9);
    expect(comparable(spliced)).toEqual(comparable(whole));
  });

  it('with the split patch off, lays the overfull sheets out again, wrapped, to the same pages', async () => {
    const list = mixed();
    uninstallPdfPlatform();
    try {
      laidOut.length = 0;
      const spliced = await renderCutSheets(list, ['Ticket 3105']);
      expect(laidOut.map(wraps)).toEqual([[true], [true], [true]]);
      const whole = await renderPdf(cutSheetDocument(list, overfull, ['Ticket 3105']));
      expect(comparable(spliced)).toEqual(comparable(whole));
    } finally {
      installPdfPlatform();
    }
  });
});
