// Every call from react-pdf's yoga pass into yoga's wasm goes through embind's generic invoker,
// and a sheet made some 3,300 of them: eight style setters on every node whatever its style, a
// child count asked before each insert, and freeRecursive's walk asking each node for its
// children's count and a new handle to each. About half set what a new node already holds or
// ask what the pass already knows. Our patch of @react-pdf/layout (patches/@react-pdf+layout+*.patch)
// adds a lean pass that leaves those out, building the same yoga tree (same boxes); this turns it
// on. It is written against yoga-layout's node defaults and methods as well as react-pdf's layout,
// so both versions are checked before it is installed (PDF_PATCHES in index.ts).
import * as reactPdfLayout from '@react-pdf/layout';

/** Turns react-pdf's lean yoga pass on; throws if the layout lacks it (our patch not applied). Returns how to turn it off. */
export function leanYoga(layoutModule: object = reactPdfLayout): () => void {
  // Read from the namespace: a missing export is then a clear error here, not a failed import.
  const set = (layoutModule as { setLeanYoga?: (on: boolean) => void }).setLeanYoga;
  if (typeof set !== 'function') throw new Error('@react-pdf/layout has no setLeanYoga: patches/@react-pdf+layout+*.patch is not applied');
  set(true);
  return () => set(false);
}
