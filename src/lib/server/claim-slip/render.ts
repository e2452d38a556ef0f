// Claim slips to PDF bytes with the cut sheets' PDF stack and fonts. Server only.
import { typeset } from '@/lib/server/cut-sheet/fonts';
import { renderPdf } from '@/lib/server/render-pdf';
import { claimSlipDocument } from './ClaimSlip';
import { DEFAULT_COPIES, type ClaimSlipData, type SlipCopies } from './types';

/** Renders a claim slip as A6 pages: the slip (1–3 copies), then its tear-off garment tags. */
export async function renderClaimSlip(data: ClaimSlipData, copies: SlipCopies = DEFAULT_COPIES): Promise<Uint8Array<ArrayBuffer>> {
  // Names, garments and the shop's details may be in any script.
  const { family, print } = await typeset(data);
  return new Uint8Array(await renderPdf(claimSlipDocument(print(data), family, copies)));
}
