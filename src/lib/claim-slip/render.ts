// Claim slips to PDF bytes with the cut sheets' PDF stack and fonts. Server only.
import { typeset } from '@/lib/cut-sheet/fonts';
import { renderPdf } from '@/lib/render-pdf';
import { claimSlipDocument } from './ClaimSlip';
import type { ClaimSlipData } from './types';

/** Renders one claim slip: a one-page A6 PDF. */
export async function renderClaimSlip(data: ClaimSlipData): Promise<Uint8Array<ArrayBuffer>> {
  // Names, garments and the shop's details may be in any script.
  const { family, print } = await typeset(data);
  return new Uint8Array(await renderPdf(claimSlipDocument(print(data), family)));
}
