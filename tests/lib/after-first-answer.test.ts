// The server's first answer goes out whole before the deferred start-up work (loading better-auth) runs, once.
import { describe, expect, it, vi } from 'vitest';
import { afterFirstAnswer } from '@/lib/server/after-first-answer';

describe('afterFirstAnswer', () => {
  it('runs the work once, after the first body has been read to its end, and leaves later answers alone', async () => {
    const work = vi.fn();
    const first = afterFirstAnswer(new Response('<p>calculator</p>', { status: 200, headers: { 'content-type': 'text/html' } }), work);
    expect(first.status).toBe(200);
    expect(first.headers.get('content-type')).toBe('text/html');
    await new Promise((r) => setImmediate(r));
    expect(work).not.toHaveBeenCalled();
    expect(await first.text()).toBe('<p>calculator</p>');
    await new Promise((r) => setImmediate(r));
    expect(work).toHaveBeenCalledTimes(1);
    const second = new Response('again');
    expect(afterFirstAnswer(second, work)).toBe(second);
    await new Promise((r) => setImmediate(r));
    expect(work).toHaveBeenCalledTimes(1);
  });
});
