// Anonymous sheets render one at a time per process, at most 8 waiting: a crowd of strangers queues
// behind itself, and the queue refuses more rather than growing without end.
import { describe, expect, it, vi } from 'vitest';
import { inAnonymousQueue } from '@/services/anonymous-sheets';
import { memberRequestStarted } from '@/lib/server/member-activity';

vi.mock('@/db', () => import('../db/db-mock'));

describe('the anonymous render queue', () => {
  it('runs one render at a time, keeps 8 waiting and refuses the next', async () => {
    let running = 0;
    let most = 0;
    const gates: (() => void)[] = [];
    const work = () =>
      new Promise<number>((resolve) => {
        running += 1;
        most = Math.max(most, running);
        gates.push(() => {
          running -= 1;
          resolve(running);
        });
      });
    const queued = Array.from({ length: 9 }, () => inAnonymousQueue(work));
    expect(queued.every(Boolean)).toBe(true);
    expect(inAnonymousQueue(work)).toBeUndefined();
    await vi.waitFor(() => expect(gates).toHaveLength(1));
    for (let i = 0; i < 9; i += 1) {
      await vi.waitFor(() => expect(gates).toHaveLength(i + 1));
      expect(running).toBe(1);
      gates[i]!();
    }
    await Promise.all(queued);
    expect(most).toBe(1);
    expect(inAnonymousQueue(async () => 'again')).toBeDefined();
  });

  it("starts no anonymous render while a member's request is in flight", async () => {
    const member = memberRequestStarted(new Request('http://localhost/api/garments', { headers: { cookie: 'better-auth.session_token=abc' } }));
    const stranger = memberRequestStarted(new Request('http://localhost/api/plan/sheet'));
    let started = false;
    const render = inAnonymousQueue(async () => {
      started = true;
    });
    await new Promise((r) => setTimeout(r, 20));
    expect(started).toBe(false);
    stranger();
    member();
    await render;
    expect(started).toBe(true);
  });
});
