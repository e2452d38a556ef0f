// react-pdf's asset pass (run twice a layout, before and after pagination) asks the font store to
// load the font of every node that names a family: two hundred asks and awaited promises a sheet
// for the four or five fonts it uses, the tree walked with shift(). A load is idempotent (a font
// source keeps its one load), so our patch of @react-pdf/layout (patches/@react-pdf+layout+*.patch)
// asks once per font (same family, style and weight) in each walk, in the order react-pdf first
// asked; images and emoji as before. This turns it on.
import * as reactPdfLayout from '@react-pdf/layout';

/** Turns react-pdf's lean asset pass on; throws if the layout lacks it (our patch not applied). Returns how to turn it off. */
export function leanAssets(layoutModule: object = reactPdfLayout): () => void {
  // Read from the namespace: a missing export is then a clear error here, not a failed import.
  const set = (layoutModule as { setLeanAssets?: (on: boolean) => void }).setLeanAssets;
  if (typeof set !== 'function') throw new Error('@react-pdf/layout has no setLeanAssets: patches/@react-pdf+layout+*.patch is not applied');
  set(true);
  return () => set(false);
}
