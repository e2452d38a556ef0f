// GET /api/health answers 200 only once this server's start-up work is done (migrations and the
// demo seed): a load balancer must not send members to a server still seeding (issue 16's leftover).
import { describe, expect, it, vi } from 'vitest';

const state = vi.hoisted(() => ({ started: false }));
vi.mock('@/services/startup', () => ({ startedUp: () => state.started }));
vi.mock('@/services/health', () => ({
  health: async () => ({ ok: true, database: 'reachable', kind: 'pglite', migrations: 'current', shipped: 3, applied: 3 }),
}));
const { GET } = await import('@/pages/api/health');

const call = async () => {
  const res = await (GET as (ctx: unknown) => Promise<Response>)({});
  return { status: res.status, body: (await res.json()) as { ok: boolean; started: boolean }, cache: res.headers.get('cache-control') };
};

describe('GET /api/health', () => {
  it('is 503 with started: false while start-up is still running, though migrations are current', async () => {
    state.started = false;
    expect(await call()).toMatchObject({ status: 503, body: { ok: false, started: false, migrations: 'current' }, cache: 'no-store' });
  });

  it('is 200 once start-up is done', async () => {
    state.started = true;
    expect(await call()).toMatchObject({ status: 200, body: { ok: true, started: true } });
  });
});
