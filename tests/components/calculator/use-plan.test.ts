// askPlan, the calculator's one call to POST /api/plan through the shared fetchJson: a plan, the
// API's field messages for 400/422 (answers about the input, shown beside the fields), and a
// failure for anything else. fetch is stubbed with the API's own answer shapes.
import { afterEach, describe, expect, it, vi } from 'vitest';
import { askPlan } from '@/components/calculator/use-plan';

function answer(status: number, body: unknown) {
  return vi.fn(async () => new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } }));
}

afterEach(() => vi.unstubAllGlobals());

const REQUEST = { kind: 'cuff', unit: 'in', cuffDepth: '1 1/2' };

describe('askPlan', () => {
  it('posts the request as JSON to /api/plan and hands back the plan', async () => {
    const plan = { kind: 'cuff', lines: [] };
    const fetch = answer(200, plan);
    vi.stubGlobal('fetch', fetch);
    expect(await askPlan(REQUEST)).toEqual({ ok: true, plan });
    const [url, init] = fetch.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/plan');
    expect(init.method).toBe('POST');
    expect(JSON.parse(String(init.body))).toEqual(REQUEST);
  });

  it('turns a 422 into the message and the per-field messages', async () => {
    vi.stubGlobal('fetch', answer(422, { error: 'The cuff depth must be more than 0.', fields: { cuffDepth: 'The cuff depth must be more than 0.' } }));
    expect(await askPlan({ ...REQUEST, cuffDepth: '0' })).toEqual({ ok: false, error: 'The cuff depth must be more than 0.', fields: { cuffDepth: 'The cuff depth must be more than 0.' } });
  });

  it('turns a 400 into field messages too', async () => {
    vi.stubGlobal('fetch', answer(400, { error: 'Cuff depth: type a length such as 1 1/2 or 38.', fields: { cuffDepth: 'Cuff depth: type a length such as 1 1/2 or 38.' } }));
    const got = await askPlan({ ...REQUEST, cuffDepth: 'zz' });
    expect(got.ok).toBe(false);
    expect(got.ok === false && got.fields.cuffDepth).toMatch(/type a length/);
  });

  it('fails with the server’s own message on a 500', async () => {
    vi.stubGlobal('fetch', answer(500, { error: 'The calculator hit a problem on our side. Your entries are kept; try again.', fields: {} }));
    await expect(askPlan(REQUEST)).rejects.toThrow('The calculator hit a problem on our side.');
  });

  it('fails saying entries are kept when the network does not answer', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => Promise.reject(new TypeError('Failed to fetch'))));
    await expect(askPlan(REQUEST)).rejects.toThrow('The calculator did not answer. Your entries are kept; try again.');
  });
});
