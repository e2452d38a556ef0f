// Cut sheets to PDF bytes. Server only: react-pdf and the font files never reach a browser.
import type { SafeDocumentNode } from '@react-pdf/layout';
import { renderPdfParts, wholePdf, type PdfPart, type Relayout } from '../render-pdf';
import { splitLaidOut } from '../pdf-platform/split-laid-out';
import { asWrapped, cutSheetDocument, PAGE_PT, sheetStripColumns } from './CutSheet';
import { typeset } from './fonts';
import type { CutSheetData } from '../../shared/cut-sheet-types';

/** Sheets laid out at a time in a batch: a part's layout is what a batch holds in memory at once. */
export const BATCH_PART = 25;

/** Renders one garment's cut sheet: a one-page PDF. */
export function renderCutSheet(data: CutSheetData): Promise<Uint8Array<ArrayBuffer>> {
  return renderCutSheets([data]);
}

/** Renders a batch: one page per garment, in the order given, then a page naming any garments skipped. */
export async function renderCutSheets(list: CutSheetData[], skipped: string[] = [], part = BATCH_PART): Promise<Uint8Array<ArrayBuffer>> {
  // A copy owns a plain ArrayBuffer, which a Response body accepts as it is.
  return new Uint8Array(await wholePdf(streamCutSheets(list, skipped, part)));
}

/**
 * A batch as one PDF, yielded in pieces as it is drawn: `part` sheets are laid out at a time (the
 * skipped-garments page with the last), drawn into the one document and sent on, so 500 sheets
 * never hold 500 layouts, and the fonts are subset once over the whole batch.
 */
export async function* streamCutSheets(list: CutSheetData[], skipped: string[] = [], part = BATCH_PART): AsyncGenerator<Buffer> {
  if (list.length === 0) throw new Error('No cut sheets to render.');
  // Free text (shop, garment, assignee, skipped garments' labels) may be in any script; the
  // family is decided once over the batch, so every part is set alike.
  const { family, print } = await typeset([list, skipped]);
  const notes = print(skipped);
  const props = cutSheetDocument(print(list.slice(0, 2)), false, [], family).props;
  function* parts(): Generator<PdfPart> {
    for (let from = 0; from < list.length; from += part) {
      const own = list.slice(from, from + part);
      const sheets = print(own);
      const last = from + part >= list.length;
      yield { doc: cutSheetDocument(sheets, false, last ? notes : [], family), adjust: wrapOverfull(own, sheets, family) };
    }
  }
  yield* renderPdfParts(parts(), props);
}

// Laid out in one pass (unwrapped) first. A sheet too full for its paper comes out as a taller
// page, which a printer would shrink and the chalk guide would no longer be 1:1: that page alone
// is split to spill onto a second page, its pages put in place of the tall one, and the
// part is drawn once (drawing it twice took 100 sheets from 1.4 s to 2.6 s).
function wrapOverfull(list: CutSheetData[], sheets: CutSheetData[], family: string | string[]): Relayout {
  return async (layout: SafeDocumentNode, layOut) => {
    const pages = [...(layout.children ?? [])];
    const spans = pageSpans(list);
    const over = spans.filter(([start], i) => Math.abs((pages[start]?.box?.height ?? 0) - PAGE_PT[list[i]!.pageSize ?? 'LETTER'].height) >= 0.01);
    if (over.length === 0) return layout;
    // From the last, so the earlier spans keep their places. The tall page is split as laid out
    // (splitLaidOut: the first layout already holds what a wrapped page's would); only with that
    // patch off is the sheet laid out again from its elements, wrapped.
    for (const [start, count, i] of over.reverse()) {
      const split = await splitLaidOut(layout, asWrapped(pages[start]!));
      if (split) {
        // A page of strip after the sheet (never wrapped) stays as first laid out.
        pages.splice(start, 1, ...split);
        continue;
      }
      const again = await layOut(cutSheetDocument([sheets[i]!], true, [], family));
      pages.splice(start, count, ...(again.children ?? []));
    }
    return { ...layout, children: pages };
  };
}

// Each sheet's first page and page count in an unwrapped layout: one page, two when its strip
// goes on over a page of strip; the skipped-garments page (if any) comes last.
function pageSpans(list: CutSheetData[]): [start: number, count: number, sheet: number][] {
  let page = 0;
  return list.map((d, i) => {
    const count = sheetStripColumns(d).page.length > 0 ? 2 : 1;
    page += count;
    return [page - count, count, i];
  });
}
