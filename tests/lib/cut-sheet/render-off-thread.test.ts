// The sheet worker's client: renders go to one worker thread started on first use; a refused or
// lost render fails alone and the next one gets a fresh worker; a worker that cannot start leaves
// the sheets to the main thread, said once in the log. The real worker (the built server's chunk)
// is proven in tests/http/limits.spec.ts; here a stand-in speaks the same protocol.
import { threadId } from 'node:worker_threads';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { offThreadRenderer, type OffThreadRenderer } from '@/lib/cut-sheet/render-off-thread';
import type { CutSheetData } from '@/lib/cut-sheet/types';

const fake = new URL('./fixtures/fake-render-worker.mjs', import.meta.url);
const broken = new URL('./fixtures/broken-render-worker.mjs', import.meta.url);

const sheet = (garment: string) => ({ garment }) as unknown as CutSheetData;
const text = (bytes: Uint8Array) => new TextDecoder().decode(bytes);
const inProcess = async (s: CutSheetData) => new TextEncoder().encode(`drawn in process: ${s.garment}`);

let renderer: OffThreadRenderer | undefined;
afterEach(() => renderer?.close());

describe('rendering strangers’ sheets off the main thread', () => {
  it('renders every sheet in one thread other than this one', async () => {
    const log = vi.fn();
    renderer = offThreadRenderer(fake, { inProcess, log });
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

  it('fails a render not answered in time, and starts a new worker for the next', async () => {
    renderer = offThreadRenderer(fake, { inProcess, log: vi.fn(), timeoutMs: 300 });
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
});
