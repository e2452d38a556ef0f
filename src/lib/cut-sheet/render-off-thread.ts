// Strangers' cut sheets (the public calculator) are rendered in one worker thread, started on the
// first one: a render takes the CPU for 15-250 ms, and on the main thread every member's request
// waited behind it. Members' own sheets stay on the main thread. Where the worker cannot start
// (astro dev and vitest run TypeScript sources, or a broken build), sheets render in process as
// before, said once in the log. A worker that dies or hangs fails the render it held (500) and a
// fresh one starts for the next.
import { Worker } from 'node:worker_threads';
import workerUrl from './render-worker.ts?node-worker';
import { renderCutSheet } from './render';
import type { RenderJob, RenderReply } from './render-worker';
import type { CutSheetData } from './types';

/** A rendered sheet and the thread that drew it. */
export interface Rendered {
  bytes: Uint8Array<ArrayBuffer>;
  by: 'worker' | 'main';
}

/** Renders cut sheets off the main thread. */
export interface OffThreadRenderer {
  render(sheet: CutSheetData): Promise<Rendered>;
  /** Stops the worker (tests). */
  close(): Promise<void>;
}

interface Options {
  /** renders when no worker can start */
  inProcess?: (sheet: CutSheetData) => Promise<Uint8Array<ArrayBuffer>>;
  /** a render not answered by then fails and its worker is replaced */
  timeoutMs?: number;
  log?: (line: string) => void;
}

interface Job {
  resolve: (bytes: Uint8Array<ArrayBuffer>) => void;
  reject: (e: Error) => void;
  timer: NodeJS.Timeout;
}

const reason = (e: unknown) => (e instanceof Error ? e.message : String(e)).split('\n')[0] ?? '';

/** One worker from `url` (the built `?node-worker` entry, or null), started on first use. */
export function offThreadRenderer(url: string | URL | null, options: Options = {}): OffThreadRenderer {
  const { inProcess = renderCutSheet, timeoutMs = 60_000, log = console.warn } = options;
  let starting: Promise<Worker | null> | null = null;
  let current: Worker | null = null;
  let unavailable = false;
  const jobs = new Map<number, Job>();
  let nextId = 0;

  function giveUp(why: string): null {
    if (!unavailable) log(`[sheets] no render worker (${why}): strangers' cut sheets render on the main thread`);
    unavailable = true;
    return null;
  }

  // Fails every render the worker held and lets the next render start another.
  function lose(w: Worker, why: string) {
    if (w !== current) return;
    current = null;
    starting = null;
    void w.terminate();
    for (const [id, job] of jobs) {
      clearTimeout(job.timer);
      job.reject(new Error(`The cut sheet worker stopped: ${why}`));
      jobs.delete(id);
    }
  }

  function start(): Promise<Worker | null> {
    if (!url) return Promise.resolve(giveUp('this server runs from sources, not a build'));
    return new Promise((resolve) => {
      let w: Worker;
      try {
        w = new Worker(typeof url === 'string' ? new URL(url) : url);
      } catch (e) {
        resolve(giveUp(reason(e)));
        return;
      }
      let ready = false;
      const notReady = setTimeout(() => {
        void w.terminate();
        resolve(giveUp(`not ready in ${timeoutMs} ms`));
      }, timeoutMs);
      // Idle, the worker does not keep the process alive; it is held while a render is out.
      w.unref();
      w.on('message', (m: 'ready' | RenderReply) => {
        if (m === 'ready') {
          ready = true;
          clearTimeout(notReady);
          current = w;
          resolve(w);
          return;
        }
        const job = jobs.get(m.id);
        if (!job) return;
        jobs.delete(m.id);
        clearTimeout(job.timer);
        if (jobs.size === 0) w.unref();
        if ('error' in m) job.reject(new Error(m.error));
        else job.resolve(new Uint8Array(m.bytes.buffer as ArrayBuffer, m.bytes.byteOffset, m.bytes.byteLength));
      });
      const stopped = (why: string) => {
        if (ready) return lose(w, why);
        clearTimeout(notReady);
        resolve(giveUp(why));
      };
      w.on('error', (e) => stopped(reason(e)));
      w.on('exit', (code) => stopped(`exited with code ${code}`));
    });
  }

  async function render(sheet: CutSheetData): Promise<Rendered> {
    const w = unavailable ? null : await (starting ??= start());
    if (!w) return { bytes: await inProcess(sheet), by: 'main' };
    const id = (nextId += 1);
    const bytes = await new Promise<Uint8Array<ArrayBuffer>>((resolve, reject) => {
      // Posted first: a sheet that cannot be copied to the worker throws here, leaving nothing behind.
      w.postMessage({ id, sheet } satisfies RenderJob);
      w.ref();
      jobs.set(id, { resolve, reject, timer: setTimeout(() => lose(w, `no answer in ${timeoutMs} ms`), timeoutMs) });
    });
    return { bytes, by: 'worker' };
  }

  async function close() {
    const w = await starting;
    if (w) lose(w, 'closed');
  }

  return { render, close };
}

/** Renders a stranger's cut sheet in the shared worker (in process where there is none). */
export const renderForStranger = offThreadRenderer(workerUrl).render;
