// A document as the renderer lays it out just before drawing it, for tests that read the layout.
import type { SafeDocumentNode } from '@react-pdf/layout';
import type { DocumentProps } from '@react-pdf/renderer';
import type { ReactElement } from 'react';
import { renderPdfParts } from '@/lib/server/render-pdf';

/** Draws `doc` as the renderer does and answers its layout as it stood before drawing. */
export async function laidOutDocument(doc: ReactElement<DocumentProps>): Promise<SafeDocumentNode> {
  let kept: SafeDocumentNode | null = null;
  for await (const _ of renderPdfParts([{ doc, adjust: async (layout) => (kept = layout) }]));
  return kept!;
}
