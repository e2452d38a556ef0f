// Payment receipts to PDF bytes with the claim slip's PDF stack and fonts. Server only.
import { typeset } from '@/lib/server/cut-sheet/fonts';
import { renderPdf } from '@/lib/server/render-pdf';
import { receiptDocument } from './Receipt';
import type { ReceiptData } from './types';

/** Renders one payment receipt: an A6 PDF. */
export async function renderReceipt(data: ReceiptData): Promise<Uint8Array<ArrayBuffer>> {
  // Names, lines and the shop's details may be in any script.
  const { family, print } = await typeset(data);
  return new Uint8Array(await renderPdf(receiptDocument(print(data), family)));
}
