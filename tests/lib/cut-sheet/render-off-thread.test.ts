// The sheet pool's client: renders go to a fixed number of worker threads, each started on first
// use, a job to the least busy; a refused or lost render fails alone and the next one gets a fresh
// worker; a batch streams piece by piece, no further ahead of its reader than the worker's credit;
// a worker that cannot start leaves the sheets to the main thread, said once in the log. The real
// worker (the built server's chunk) is proven in tests/http/limits.spec.ts and cut-sheets.spec.ts;
// here a stand-in speaks the same protocol.
import { threadId } from 'node:worker_threads';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { offThreadRenderer, type OffThreadRenderer } from '@/lib/server/cut-sheet/render-off-thread';
import type { CutSheetData } from '@/lib/shared/cut-sheet-types';

const fake = new URL('./fixtures/fake-render-worker.mjs', import.meta.url);
const broken = new URL('./fixtures/broken-render-worker.mjs', import.meta.url);

const sheet = (garment: string) => ({ garment }) as unknown as CutSheetData;
const text = (bytes: Uint8Array) => new TextDecoder().decode(bytes);
async function* inProcess(sheets: CutSheetData[]) {
  for (const s of sheets) yield new TextEncoder().encode(`drawn in process: ${s.garment}`);
}

let renderer: OffThreadRenderer | undefined;
afterEach(() => renderer?.close());

describe('rendering strangers’ sheets off the main thread', () => {
  it('renders every sheet in one thread other than this one (a pool of one)', async () => {
    const log = vi.fn();
    renderer = offThreadRenderer(fake, { inProcess, log, size: 1 });
    const answers = await Promise.all(['grey flannel', 'navy twill', 'tan chino'].map((g) => renderer!.render(sheet(g))));
    expect(answers.map((a) => a.by)).toEqual(['worker', 'worker', 'worker']);
    const drawn = answers.map((a) => /^drawn in thread (\d+): (.+)$/.exec(text(a.bytes))!.slice(1));
    expect(drawn.map(([, garment]) => garment)).toEqual(['grey flannel', 'navy twill', 'tan chino']);
    expect(new Set(drawn.map(([thread]) => thread)).size).toBe(1);
    expect(Number(drawn[0]![0])).not.toBe(threadId);
    expect(log).not.toHaveBeenCalled();
  });

  it('fails a render the worker refuses with its message, and keeps rendering', async () => {
    renderer = offThreadRenderer(fake, { inProcess, log: vi.fn() });
    await expect(renderer.render(sheet('refuse'))).rejects.toThrow('A part of the document failed.');
    expect(text((await renderer.render(sheet('after'))).bytes)).toMatch(/: after$/);
  });

  it('fails the render a dying worker held, and starts a new worker for the next', async () => {
    renderer = offThreadRenderer(fake, { inProcess, log: vi.fn() });
    await expect(renderer.render(sheet('die'))).rejects.toThrow(/worker stopped: exited with code 3/);
    const next = await renderer.render(sheet('next'));
    expect(next).toMatchObject({ by: 'worker' });
    expect(text(next.bytes)).toMatch(/^drawn in thread \d+: next$/);
  });

  it('fails the batch a worker over its heap limit held, with its reason, and starts a new worker for the next', async () => {
    renderer = offThreadRenderer(fake, { inProcess, log: vi.fn(), size: 1 });
    await expect(renderer.stream([sheet('hog'), sheet('never drawn')])).rejects.toThrow(/worker stopped: .*memory/i);
    const next = await renderer.render(sheet('next'));
    expect(next).toMatchObject({ by: 'worker' });
    expect(text(next.bytes)).toMatch(/^drawn in thread \d+: next$/);
  });

  it('fails a render not answered in time, and starts a new worker for the next', async () => {
    renderer = offThreadRenderer(fake, { inProcess, log: vi.fn(), timeoutMs: 300, startTimeoutMs: 60_000 });
    await expect(renderer.render(sheet('hang'))).rejects.toThrow(/no answer in 300 ms/);
    expect(text((await renderer.render(sheet('next'))).bytes)).toMatch(/^drawn in thread \d+: next$/);
  });

  it('renders in process when the worker cannot start, and logs it once', async () => {
    const log = vi.fn();
    renderer = offThreadRenderer(broken, { inProcess, log });
    const first = await renderer.render(sheet('first'));
    const second = await renderer.render(sheet('second'));
    expect([first.by, second.by]).toEqual(['main', 'main']);
    expect(text(second.bytes)).toBe('drawn in process: second');
    expect(log).toHaveBeenCalledOnce();
    expect(log.mock.calls[0]![0]).toMatch(/no render worker \(Cannot find module .*render on the main thread/);
  });

  it('renders in process where there is no worker entry (astro dev, vitest)', async () => {
    const log = vi.fn();
    renderer = offThreadRenderer(null, { inProcess, log });
    expect(await renderer.render(sheet('dev'))).toMatchObject({ by: 'main' });
    expect(log).toHaveBeenCalledOnce();
  });

  it('spreads sheets asked for together over the pool’s workers', async () => {
    renderer = offThreadRenderer(fake, { inProcess, log: vi.fn(), size: 2 });
    const answers = await Promise.all(['a', 'b', 'c', 'd'].map((g) => renderer!.render(sheet(g))));
    const threads = answers.map((a) => /^drawn in thread (\d+):/.exec(text(a.bytes))![1]);
    expect(new Set(threads).size).toBe(2);
    expect(threads).not.toContain(String(threadId));
  });

  it('streams a batch piece by piece, in order, to a reader that pauses', async () => {
    renderer = offThreadRenderer(fake, { inProcess, log: vi.fn(), size: 1 });
    const names = Array.from({ length: 7 }, (_, i) => `pair ${i + 1}`);
    const { body, by } = await renderer.stream(names.map(sheet));
    expect(by).toBe('worker');
    const reader = body.getReader();
    const first = await reader.read();
    expect(text(first.value!)).toMatch(/: pair 1\n$/);
    // Not read on for a while: the worker holds the rest rather than sending it all.
    await new Promise((r) => setTimeout(r, 100));
    const rest: string[] = [];
    for (let r = await reader.read(); !r.done; r = await reader.read()) rest.push(text(r.value));
    expect(
      [text(first.value!), ...rest]
        .join('')
        .split('\n')
        .map((l) => l.replace(/^drawn in thread \d+: /, '')),
    ).toEqual(names);
  });

  it('fails a batch whose worker stops answering part way, its stream erroring', async () => {
    renderer = offThreadRenderer(fake, { inProcess, log: vi.fn(), size: 1, timeoutMs: 300, startTimeoutMs: 60_000 });
    const { body } = await renderer.stream([sheet('stall-after-one'), sheet('never')]);
    const reader = body.getReader();
    expect(text((await reader.read()).value!)).toMatch(/stall-after-one/);
    await expect(reader.read()).rejects.toThrow(/no answer in 300 ms/);
  });

  it('rejects a batch the worker refuses before any byte is sent', async () => {
    renderer = offThreadRenderer(fake, { inProcess, log: vi.fn(), size: 1 });
    await expect(renderer.stream([sheet('refuse')])).rejects.toThrow('A part of the document failed.');
  });

  it('streams a batch in process where no worker can start, said as main', async () => {
    renderer = offThreadRenderer(null, { inProcess, log: vi.fn() });
    const { body, by } = await renderer.stream([sheet('x'), sheet('y')]);
    expect(by).toBe('main');
    expect(await new Response(body).text()).toBe('drawn in process: xdrawn in process: y');
  });
});
