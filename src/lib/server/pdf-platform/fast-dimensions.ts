// react-pdf's yoga pass sets some forty style values on every node through a closure each (a
// percent test and method names spelt out per value, even for the usual plain number), then
// copies the whole laid-out tree twice: once to add the boxes, once to drop the yoga nodes. With
// a sheet's two to three hundred nodes that was about a tenth of a sheet. Our patch of
// @react-pdf/layout (patches/@react-pdf+layout+*.patch) adds a faster path making the very same
// yoga calls in the same order and one copy of the tree; this turns it on.
import * as reactPdfLayout from '@react-pdf/layout';

/** Turns react-pdf's faster yoga pass on; throws if the layout lacks it (our patch not applied). Returns how to turn it off. */
export function fastDimensions(layoutModule: object = reactPdfLayout): () => void {
  // Read from the namespace: a missing export is then a clear error here, not a failed import.
  const set = (layoutModule as { setFastDimensions?: (on: boolean) => void }).setFastDimensions;
  if (typeof set !== 'function') throw new Error('@react-pdf/layout has no setFastDimensions: patches/@react-pdf+layout+*.patch is not applied');
  set(true);
  return () => set(false);
}
