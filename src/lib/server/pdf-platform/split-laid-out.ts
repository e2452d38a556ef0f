// A page laid out whole (react-pdf's wrap={false}: one pass, the page grows with its content) that
// turns out taller than its paper has to be split over pages. Laying its document out again with
// the page wrapped repeats all the work of the first layout (styles, the yoga pass, text) before
// react-pdf's pagination even starts, and was two thirds of an overfull sheet's time. A wrapped
// page's first pass gives the very tree the whole page's did (a page's size never reaches its
// content: height and min-height only let the page box grow), so the split starts from the
// first layout's page instead: react-pdf's own pagination and the steps after it, reached through
// an export our patch adds (patches/@react-pdf+layout+*.patch). Without that export, or with the
// patch off, splitLaidOut() answers null and the caller lays the document out again.
import { Font } from '@react-pdf/renderer';
import * as reactPdfLayout from '@react-pdf/layout';
import type { SafeDocumentNode, SafePageNode } from '@react-pdf/layout';

type Paginate = (root: SafeDocumentNode, page: SafePageNode, fontStore: unknown) => Promise<SafePageNode[] | null>;

let paginate: Paginate | null = null;

/** Turns splitting from the first layout on; throws if react-pdf's layout lacks the export (our patch not applied). Returns how to turn it off. */
export function splitFromFirstLayout(layoutModule: object = reactPdfLayout): () => void {
  // Read from the namespace: a missing export is then a clear error here, not a failed import.
  const found = (layoutModule as { paginateLaidOutPage?: Paginate }).paginateLaidOutPage;
  if (typeof found !== 'function') throw new Error('@react-pdf/layout has no paginateLaidOutPage: patches/@react-pdf+layout+*.patch is not applied');
  paginate = found;
  return () => {
    paginate = null;
  };
}

/**
 * The pages `page` (from `root`, a finished layout) comes out as when wrapped, or null when this
 * patch is off or the page has content that depends on the whole document (render props).
 * `page` must already look as the wrapped page would before pagination (the caller knows how its
 * unwrapped page differs; see cut-sheet/CutSheet.tsx asWrapped).
 */
export async function splitLaidOut(root: SafeDocumentNode, page: SafePageNode): Promise<SafePageNode[] | null> {
  if (!paginate) return null;
  return paginate(root, page, Font);
}
