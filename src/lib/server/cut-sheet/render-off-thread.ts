// Cut sheets are rendered in a small, fixed pool of worker threads, each started on first use: a
// render takes the CPU for 15-250 ms a sheet (seconds for a batch), and on the main thread every
// other request waited behind it. Every sheet goes through the pool: a member's, a stranger's
// (the public calculator) and the morning batch, which comes back in pieces as its parts are
// drawn, so the response streams and the server never holds a whole big batch. A job goes to the
// worker with the fewest jobs. Where no worker can start (astro dev and vitest run TypeScript
// sources, or a broken build), sheets render in process as before, said once in the log. A worker
// that dies or stops answering fails the jobs it held (500, or a cut-off stream) and a fresh one
// starts for the next.
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import workerUrl from './render-worker.ts?node-worker';
import { streamCutSheets } from './render';
import type { RenderJob, RenderReply } from './render-worker';
import type { CutSheetData } from '../../shared/cut-sheet-types';

/** A rendered sheet and the thread that drew it. */
export interface Rendered {
  bytes: Uint8Array<ArrayBuffer>;
  by: 'worker' | 'main';
}

/** A PDF arriving in pieces as it is drawn, and the thread drawing it. */
export interface Streamed {
  body: ReadableStream<Uint8Array>;
  by: 'worker' | 'main';
}

/** Renders cut sheets off the main thread. */
export interface OffThreadRenderer {
  /** One sheet, whole. */
  render(sheet: CutSheetData): Promise<Rendered>;
  /** A batch as a stream; resolves once its first piece is drawn, so a batch that cannot be drawn at all rejects. */
  stream(sheets: CutSheetData[], skipped?: string[]): Promise<Streamed>;
  /** Stops the workers (tests). */
  close(): Promise<void>;
}

/** Draws a batch in pieces, in this thread (where no worker can start). */
export type InProcess = (sheets: CutSheetData[], skipped: string[]) => AsyncIterable<Uint8Array>;

interface Options {
  /** renders when no worker can start */
  inProcess?: InProcess;
  /** workers in the pool */
  size?: number;
  /** a job with no piece in this long fails and its worker is replaced */
  timeoutMs?: number;
  /** a worker not ready in this long is given up on (timeoutMs unless said) */
  startTimeoutMs?: number;
  log?: (line: string) => void;
}

/** Where one job's pieces go. */
interface Job {
  piece: (bytes: Uint8Array<ArrayBuffer>, done: boolean) => void;
  fail: (e: Error) => void;
  timer: NodeJS.Timeout | null;
}

interface Slot {
  starting: Promise<Worker | null> | null;
  current: Worker | null;
  jobs: Map<number, Job>;
  /** jobs given to this slot and not yet over, counted from the moment it is picked */
  busy: number;
}

const reason = (e: unknown) => (e instanceof Error ? e.message : String(e)).split('\n')[0] ?? '';

/**
 * A worker's old generation is capped: left to V8's defaults (a quarter of the machine's memory)
 * a worker let a 500-sheet batch's garbage pile up to hundreds of MB before collecting it. Its live
 * set (fonts, memos, one part's layout) is far smaller (under 90 MB after 100-sheet batches,
 * measured in process); a worker that still runs out fails its
 * jobs and is replaced, like one that dies.
 */
export const WORKER_HEAP_MB = 128;

/** The pool's size on this machine: one worker a core beyond the main thread's, at least one and at most four. */
export function poolSize(cores = availableParallelism()): number {
  return Math.max(1, Math.min(4, cores - 1));
}

/** A pool of `size` workers from `url` (the built `?node-worker` entry, or null), each started on first use. */
export function offThreadRenderer(url: string | URL | null, options: Options = {}): OffThreadRenderer {
  const { inProcess = streamCutSheets, size = poolSize(), timeoutMs = 60_000, log = console.warn } = options;
  const startTimeoutMs = options.startTimeoutMs ?? timeoutMs;
  const slots: Slot[] = Array.from({ length: Math.max(1, size) }, () => ({ starting: null, current: null, jobs: new Map(), busy: 0 }));
  let unavailable = false;
  let nextId = 0;

  function giveUp(why: string): null {
    if (!unavailable) log(`[sheets] no render worker (${why}): cut sheets render on the main thread`);
    unavailable = true;
    return null;
  }

  // Fails every job the worker held and lets the next job start another.
  function lose(slot: Slot, w: Worker, why: string) {
    if (w !== slot.current) return;
    slot.current = null;
    slot.starting = null;
    void w.terminate();
    for (const [id, job] of slot.jobs) {
      if (job.timer) clearTimeout(job.timer);
      job.fail(new Error(`The cut sheet worker stopped: ${why}`));
      slot.jobs.delete(id);
    }
  }

  function start(slot: Slot): Promise<Worker | null> {
    if (!url) return Promise.resolve(giveUp('this server runs from sources, not a build'));
    return new Promise((resolve) => {
      let w: Worker;
      try {
        w = new Worker(typeof url === 'string' ? new URL(url) : url, { resourceLimits: { maxOldGenerationSizeMb: WORKER_HEAP_MB } });
      } catch (e) {
        resolve(giveUp(reason(e)));
        return;
      }
      let ready = false;
      const notReady = setTimeout(() => {
        void w.terminate();
        resolve(giveUp(`not ready in ${startTimeoutMs} ms`));
      }, startTimeoutMs);
      // Idle, the worker does not keep the process alive; it is held while a job is out.
      w.unref();
      w.on('message', (m: 'ready' | RenderReply) => {
        if (m === 'ready') {
          ready = true;
          clearTimeout(notReady);
          slot.current = w;
          resolve(w);
          return;
        }
        const job = slot.jobs.get(m.id);
        if (!job) return;
        if (job.timer) clearTimeout(job.timer);
        job.timer = null;
        const finished = 'error' in m || m.done;
        if (finished) {
          slot.jobs.delete(m.id);
          if (slot.jobs.size === 0) w.unref();
        }
        if ('error' in m) job.fail(new Error(m.error));
        else job.piece(new Uint8Array(m.bytes.buffer as ArrayBuffer, m.bytes.byteOffset, m.bytes.byteLength), m.done);
      });
      const stopped = (why: string) => {
        if (ready) return lose(slot, w, why);
        clearTimeout(notReady);
        resolve(giveUp(why));
      };
      w.on('error', (e) => stopped(reason(e)));
      w.on('exit', (code) => stopped(`exited with code ${code}`));
    });
  }

  // The slot with the fewest jobs (an idle running worker before one yet to start).
  function pick(): Slot {
    const load = (x: Slot) => x.busy * 2 + (x.current ? 0 : 1);
    return slots.reduce((best, s) => (load(s) < load(best) ? s : best));
  }

  /** Sends a job to a worker; `pieces` receives its answer; null when no worker can start. */
  async function send(sheets: CutSheetData[], skipped: string[], job: Omit<Job, 'timer'>): Promise<{ pull: () => void; cancel: () => void } | null> {
    const slot = pick();
    slot.busy += 1;
    let over = false;
    const end = () => {
      if (!over) slot.busy -= 1;
      over = true;
    };
    const w = unavailable ? null : await (slot.starting ??= start(slot));
    if (!w) {
      end();
      return null;
    }
    const id = (nextId += 1);
    const armed: Job = {
      piece: (bytes, done) => {
        if (done) end();
        job.piece(bytes, done);
      },
      fail: (e) => {
        end();
        job.fail(e);
      },
      timer: null,
    };
    const arm = () => {
      if (!armed.timer && slot.jobs.has(id)) armed.timer = setTimeout(() => lose(slot, w, `no answer in ${timeoutMs} ms`), timeoutMs);
    };
    // Posted first: data that cannot be copied to the worker throws here, leaving nothing behind.
    w.postMessage({ id, sheets, skipped } satisfies RenderJob);
    w.ref();
    slot.jobs.set(id, armed);
    arm();
    return {
      pull: () => {
        if (!slot.jobs.has(id)) return;
        w.postMessage({ id, pull: 1 } satisfies RenderJob);
        arm();
      },
      cancel: () => {
        const held = slot.jobs.get(id);
        if (!held) return;
        if (held.timer) clearTimeout(held.timer);
        end();
        slot.jobs.delete(id);
        if (slot.jobs.size === 0) w.unref();
        w.postMessage({ id, cancel: true } satisfies RenderJob);
      },
    };
  }

  async function render(sheet: CutSheetData): Promise<Rendered> {
    const pieces: Uint8Array[] = [];
    let control: Awaited<ReturnType<typeof send>> = null;
    const whole = new Promise<Uint8Array<ArrayBuffer>>((resolve, reject) => {
      const piece = (bytes: Uint8Array, done: boolean) => {
        pieces.push(bytes);
        if (done) resolve(new Uint8Array(Buffer.concat(pieces)));
        else control?.pull();
      };
      void send([sheet], [], { piece, fail: reject }).then((c) => {
        control = c;
        if (!c) resolve(inProcessWhole(sheet));
      });
    });
    const bytes = await whole;
    return { bytes, by: control ? 'worker' : 'main' };
  }

  async function inProcessWhole(sheet: CutSheetData): Promise<Uint8Array<ArrayBuffer>> {
    const pieces: Uint8Array[] = [];
    for await (const p of inProcess([sheet], [])) pieces.push(p);
    return new Uint8Array(Buffer.concat(pieces));
  }

  async function stream(sheets: CutSheetData[], skipped: string[] = []): Promise<Streamed> {
    // Pieces that arrived before the reader asked for them (at most the worker's FIRST_CREDIT plus the pulls sent).
    const ready: Uint8Array[] = [];
    let finished = false;
    let failure: Error | null = null;
    let wake: (() => void) | null = null;
    const poke = () => {
      const w = wake;
      wake = null;
      w?.();
    };
    let first!: () => void;
    let firstFailed!: (e: Error) => void;
    const firstPiece = new Promise<void>((resolve, reject) => ((first = resolve), (firstFailed = reject)));
    const control = await send(sheets, skipped, {
      piece: (bytes, done) => {
        ready.push(bytes);
        finished = done;
        first();
        poke();
      },
      fail: (e) => {
        failure = e;
        firstFailed(e);
        poke();
      },
    });
    if (!control) return { body: await inProcessStreamOf(inProcess(sheets, skipped)[Symbol.asyncIterator]()), by: 'main' };
    await firstPiece;
    const body = new ReadableStream<Uint8Array>(
      {
        async pull(controller) {
          while (ready.length === 0 && !finished && !failure) await new Promise<void>((resolve) => (wake = resolve));
          const next = ready.shift();
          if (next) {
            controller.enqueue(next);
            // One piece taken: the worker may draw one more.
            if (!finished) control.pull();
          } else if (failure) controller.error(failure);
          if (finished && ready.length === 0) controller.close();
        },
        cancel() {
          control.cancel();
        },
      },
      { highWaterMark: 0 },
    );
    return { body, by: 'worker' };
  }

  async function close() {
    await Promise.all(
      slots.map(async (slot) => {
        const w = await slot.starting;
        if (w) lose(slot, w, 'closed');
      }),
    );
  }

  return { render, stream, close };
}

// In this thread: the first piece is drawn before answering, as from a worker.
async function inProcessStreamOf(pieces: AsyncIterator<Uint8Array>): Promise<ReadableStream<Uint8Array>> {
  const head = await pieces.next();
  let held: IteratorResult<Uint8Array> | null = head;
  return new ReadableStream<Uint8Array>(
    {
      async pull(controller) {
        const r = held ?? (await pieces.next());
        held = null;
        if (r.done) controller.close();
        else controller.enqueue(r.value);
      },
      async cancel() {
        await pieces.return?.(undefined);
      },
    },
    { highWaterMark: 0 },
  );
}

const pool = offThreadRenderer(workerUrl);

/** Renders one cut sheet in the sheet pool (in process where there is none). */
export const renderInPool = pool.render;

/** Streams a batch of cut sheets from the sheet pool (in process where there is none). */
export const streamInPool = pool.stream;
