// Drawing a sheet's text, react-pdf parses the run's colour text afresh for every run (a sheet
// names the same few colours hundreds of times), passes every run through its attachment step
// (inline images), which copies the run's glyphs, looks up two glyphs and writes an empty save
// and restore even when the run has no attachment, and encodes every glyph and position again
// though most runs are the very same objects as on the last sheet (kept paragraph layouts, see
// text-layout-memo.ts). Our patch of @react-pdf/render (patches/@react-pdf+render+*.patch) keeps
// parsed colours, skips that step for runs without an attachment, and replays a run's text
// commands while every glyph has the same number in this document's subset (seeded: see
// subset-memo.ts) and the face, font, size and page are the same; this turns it on. The page
// looks the same (tests/lib/pdf-platform/same-output.test.ts, kept-styles-runs.test.ts).
import * as reactPdfRender from '@react-pdf/render';

/** Turns react-pdf's faster text runs on; throws if the render lacks them (our patch not applied). Returns how to turn them off. */
export function fastRuns(renderModule: object = reactPdfRender): () => void {
  // Read from the namespace: a missing export is then a clear error here, not a failed import.
  const set = (renderModule as { setFastRuns?: (on: boolean) => void }).setFastRuns;
  if (typeof set !== 'function') throw new Error('@react-pdf/render has no setFastRuns: patches/@react-pdf+render+*.patch is not applied');
  set(true);
  return () => set(false);
}
