// Cut sheets to PDF bytes. Server only: react-pdf and the font files never reach a browser.
import { renderPdf } from '../render-pdf';
import { cutSheetDocument, PAGE_PT, sheetStripColumns } from './CutSheet';
import { typeset } from './fonts';
import type { CutSheetData } from './types';

/** Renders one garment's cut sheet: a one-page PDF. */
export function renderCutSheet(data: CutSheetData): Promise<Uint8Array<ArrayBuffer>> {
  return renderCutSheets([data]);
}

/** Renders a batch: one page per garment, in the order given, then a page naming any garments skipped. */
export async function renderCutSheets(list: CutSheetData[], skipped: string[] = []): Promise<Uint8Array<ArrayBuffer>> {
  if (list.length === 0) throw new Error('No cut sheets to render.');
  // Free text (shop, garment, assignee, skipped garments' labels) may be in any script.
  const { family, print } = await typeset([list, skipped]);
  const sheets = print(list);
  const notes = print(skipped);
  const fast = await renderPdf(cutSheetDocument(sheets, false, notes, family));
  // A sheet too full for its paper came out as a taller page, which a printer would shrink and
  // the chalk guide would no longer be 1:1: render again with that sheet (and only that one)
  // spilling onto a second page; the others keep the one-pass layout.
  const over = overflowing(fast, list);
  const bytes = over.some(Boolean) ? await renderPdf(cutSheetDocument(sheets, over, notes, family)) : fast;
  // A copy owns a plain ArrayBuffer, which a Response body accepts as it is.
  return new Uint8Array(bytes);
}

/** For each sheet of an unwrapped render, whether its page came out taller than its paper. */
export function overflowing(pdf: Uint8Array, list: CutSheetData[]): boolean[] {
  const heights = [...Buffer.from(pdf).toString('latin1').matchAll(/\/MediaBox \[0 0 [\d.]+ ([\d.]+)\]/g)].map((m) => Number(m[1]));
  // Unwrapped, each sheet is one page in order (two when its strip goes on over a page of strip);
  // the skipped-garments page (if any) comes last.
  let page = 0;
  return list.map((d) => {
    const h = heights[page];
    page += sheetStripColumns(d).page.length > 0 ? 2 : 1;
    return h === undefined || Math.abs(h - PAGE_PT[d.pageSize ?? 'LETTER'].height) >= 0.01;
  });
}
