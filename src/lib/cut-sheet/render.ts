// Cut sheets to PDF bytes. Server only: react-pdf and the font files never reach a browser.
import { renderToBuffer } from '@react-pdf/renderer';
import { cutSheetDocument } from './CutSheet';
import { registerFonts } from './fonts';
import type { CutSheetData } from './types';

/** Renders one garment's cut sheet: a one-page PDF. */
export function renderCutSheet(data: CutSheetData): Promise<Uint8Array<ArrayBuffer>> {
  return renderCutSheets([data]);
}

/** Renders a batch: one page per garment, in the order given. */
export async function renderCutSheets(list: CutSheetData[]): Promise<Uint8Array<ArrayBuffer>> {
  if (list.length === 0) throw new Error('No cut sheets to render.');
  await registerFonts();
  // A copy owns a plain ArrayBuffer, which a Response body accepts as it is.
  return new Uint8Array(await renderToBuffer(cutSheetDocument(list)));
}
