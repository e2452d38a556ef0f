// A worker thread of the sheet pool (render-off-thread.ts starts them): the same rendering code as
// the server's own thread, with its own react-pdf root, fonts and memos, so a render here never
// holds up a request on the main thread. Nothing but rendering: no database, no settings. Posts
// 'ready' once loaded; then, for each { id, sheets, skipped }, posts the PDF in pieces as its
// parts are drawn ({ id, bytes, done }), at most `credit` pieces ahead of what the main thread
// has asked for ({ id, pull }), so a slow reader holds back the drawing, not the memory.
import { parentPort } from 'node:worker_threads';
import { streamCutSheets } from './render';
import type { CutSheetData } from '../../shared/cut-sheet-types';

/** A request from the main thread: a batch (one sheet or many), or more credit for one running. */
export type RenderJob = { id: number; sheets: CutSheetData[]; skipped: string[] } | { id: number; pull: number } | { id: number; cancel: true };

/** A piece of the PDF (its buffer transferred, not copied), the last one with done, or why it failed. */
export type RenderReply = { id: number; bytes: Uint8Array; done: boolean } | { id: number; error: string };

/** Pieces a job may post before the main thread asks for more. */
export const FIRST_CREDIT = 2;

interface Running {
  credit: number;
  wake: (() => void) | null;
  cancelled: boolean;
}

const port = parentPort;
if (port) {
  const running = new Map<number, Running>();
  const post = (reply: RenderReply, transfer: ArrayBuffer[] = []) => port.postMessage(reply, transfer);

  async function draw(id: number, sheets: CutSheetData[], skipped: string[]) {
    const job: Running = { credit: FIRST_CREDIT, wake: null, cancelled: false };
    running.set(id, job);
    try {
      let held: Buffer | null = null;
      for await (const piece of streamCutSheets(sheets, skipped)) {
        if (job.cancelled) return;
        // One piece held back, so the last can say done.
        if (held) await send(id, job, held, false);
        held = piece;
      }
      if (held && !job.cancelled) await send(id, job, held, true);
    } catch (e) {
      post({ id, error: e instanceof Error ? e.message : String(e) });
    } finally {
      running.delete(id);
    }
  }

  async function send(id: number, job: Running, piece: Buffer, done: boolean) {
    while (job.credit <= 0 && !job.cancelled) await new Promise<void>((resolve) => (job.wake = resolve));
    job.credit -= 1;
    // A copy the size of the piece owns its buffer, which is moved, not copied again.
    const bytes = new Uint8Array(piece);
    post({ id, bytes, done }, [bytes.buffer]);
  }

  port.on('message', (m: RenderJob) => {
    if ('sheets' in m) return void draw(m.id, m.sheets, m.skipped);
    const job = running.get(m.id);
    if (!job) return;
    if ('pull' in m) job.credit += m.pull;
    else job.cancelled = true;
    const wake = job.wake;
    job.wake = null;
    wake?.();
  });
  port.postMessage('ready');
}
