// askPlan, the calculator's one call to POST /api/plan through the shared fetchJson: a plan, the
// API's field messages for 400/422 (answers about the input, shown beside the fields), and a
// failure for anything else. fetch is stubbed with the API's own answer shapes.
import { afterEach, describe, expect, it, vi } from 'vitest';
import { refusalWords } from '@/components/calculator/refusal-words';
import { askPlan, planState, type PlanAnswer } from '@/components/calculator/use-plan';
import { translator } from '@/lib/server/i18n/catalog';

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
    vi.stubGlobal('fetch', answer(422, { error: 'The cuff depth must be more than 0.', issues: { cuffDepth: 'The cuff depth must be more than 0.' } }));
    expect(await askPlan({ ...REQUEST, cuffDepth: '0' })).toEqual({
      ok: false,
      error: 'The cuff depth must be more than 0.',
      issues: { cuffDepth: 'The cuff depth must be more than 0.' },
    });
  });

  it('keeps the refusal codes of a 422, and the page says them in its own language (English as the server wrote it)', async () => {
    const sent = 'Cuff depth must be at least 1 in: a shallower cuff cannot be turned, pressed and tacked.';
    const values = { label: 'Cuff depth', least: '1 in', why: 'shallowest-cuff' };
    vi.stubGlobal(
      'fetch',
      answer(422, {
        error: sent,
        issues: { cuffDepth: sent },
        refusal: { code: 'out-of-range', values },
        refusals: { cuffDepth: { code: 'out-of-range', values } },
      }),
    );
    const got = await askPlan({ ...REQUEST, cuffDepth: '1/2' });
    expect(got).toMatchObject({ ok: false, refusals: { cuffDepth: { code: 'out-of-range', values } } });
    if (got.ok) throw new Error('refused');
    expect(refusalWords(translator('en'), got, 'en')).toEqual({ error: sent, issues: { cuffDepth: sent } });
    const fr = 'Hauteur du revers : au moins 1 in ; un revers moins haut ne se retourne, ne se presse ni ne se bâtit.';
    expect(refusalWords(translator('fr'), got, 'fr')).toEqual({ error: fr, issues: { cuffDepth: fr } });
  });

  it('turns a 400 into field messages too', async () => {
    vi.stubGlobal(
      'fetch',
      answer(400, { error: 'Cuff depth: type a length such as 1 1/2 or 38.', issues: { cuffDepth: 'Cuff depth: type a length such as 1 1/2 or 38.' } }),
    );
    const got = await askPlan({ ...REQUEST, cuffDepth: 'zz' });
    expect(got.ok).toBe(false);
    expect(got.ok === false && got.issues.cuffDepth).toMatch(/type a length/);
  });

  it('fails with the server’s own message on a 500', async () => {
    vi.stubGlobal('fetch', answer(500, { error: 'The calculator hit a problem on our side. Your entries are kept; try again.', issues: {} }));
    await expect(askPlan(REQUEST)).rejects.toThrow('The calculator hit a problem on our side.');
  });

  it('fails saying entries are kept when the network does not answer', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => Promise.reject(new TypeError('Failed to fetch'))),
    );
    await expect(askPlan(REQUEST)).rejects.toThrow('The calculator did not answer. Your entries are kept; try again.');
  });
});

describe('planState: what the plan hook shows for the request typed now', () => {
  const a: PlanAnswer = { ok: true, plan: { kind: 'cuff' } as never };
  const b: PlanAnswer = { ok: false, error: 'x', issues: {} };
  it('shows the kept answer for this request as fresh', () => {
    expect(planState('k2', b, { key: 'k1', data: a })).toEqual({ data: b, isPlaceholderData: false, error: null, asked: true });
  });
  it('shows the previous request’s answer as a placeholder while this one is on its way', () => {
    expect(planState('k2', undefined, { key: 'k1', data: a })).toEqual({ data: a, isPlaceholderData: true, error: null, asked: true });
  });
  it('keeps the previous answer, as a placeholder, while nothing can be asked', () => {
    expect(planState(null, undefined, { key: 'k1', data: a })).toEqual({ data: a, isPlaceholderData: true, error: null, asked: false });
  });
  it('tells a failure of this request, not of an earlier one', () => {
    const error = new Error('The calculator did not answer. Your entries are kept; try again.');
    expect(planState('k1', undefined, { key: 'k1', error })).toEqual({ data: undefined, isPlaceholderData: false, error, asked: true });
    expect(planState('k2', undefined, { key: 'k1', error }).error).toBeNull();
  });
});
