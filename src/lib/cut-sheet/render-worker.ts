// The worker thread that renders strangers' cut sheets (render-off-thread.ts starts it): the same
// rendering code as the server's own thread, with its own react-pdf root, fonts and memos, so a
// render here never holds up a member's request on the main thread. Nothing but rendering: no
// database, no settings. Posts 'ready' once loaded, then answers each { id, sheet } in turn.
import { parentPort } from 'node:worker_threads';
import { renderCutSheet } from './render';
import type { CutSheetData } from './types';

/** A request from the main thread. */
export interface RenderJob {
  id: number;
  sheet: CutSheetData;
}

/** The answer: the PDF (its buffer transferred, not copied) or why it failed. */
export type RenderReply = { id: number; bytes: Uint8Array } | { id: number; error: string };

const port = parentPort;
if (port) {
  port.on('message', async ({ id, sheet }: RenderJob) => {
    try {
      const bytes = await renderCutSheet(sheet);
      port.postMessage({ id, bytes } satisfies RenderReply, [bytes.buffer]);
    } catch (e) {
      port.postMessage({ id, error: e instanceof Error ? e.message : String(e) } satisfies RenderReply);
    }
  });
  port.postMessage('ready');
}
