// The existing finish on the printed sheet, against the built server: a pair taken in with cuffs
// prints "let down the old cuffs" as its first bench step, alone and in the batch; the demo's
// charcoal pair (seeded with cuffs) too; a plain-hemmed pair and the calculator's sheet do not.
import { beforeAll, describe, expect, inject, it } from 'vitest';
import { LET_DOWN_OLD_CUFF } from '../../src/lib/server/cut-sheet/content';
import type { QueueRow } from '../../src/lib/shared/bench-types';
import { flatText, pageInfo, pdfFile } from '../lib/cut-sheet/poppler';
import { call, DEMO, signIn } from './client';

const cookie = {} as Record<keyof typeof DEMO, string>;

/** GETs (or POSTs JSON to) a path and keeps the PDF it answers. */
async function pdf(path: string, who?: string, body?: unknown) {
  const res = await fetch(inject('baseURL') + path, {
    method: body === undefined ? 'GET' : 'POST',
    headers: { ...(who ? { cookie: who } : {}), ...(body === undefined ? {} : { 'content-type': 'application/json', origin: inject('baseURL') }) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  expect(res.status).toBe(200);
  expect(res.headers.get('content-type')).toBe('application/pdf');
  return pdfFile(new Uint8Array(await res.arrayBuffer()));
}

/** The bench steps as printed, from their heading to the cautions. */
const benchOf = (text: string) => text.slice(text.indexOf('AT THE BENCH'), text.indexOf('TAKE CARE'));

/** Takes in one pair with the given finish and saves a 1 1/2 in cuff fitting for it (invented figures). */
async function takenIn(description: string, existingFinish: 'cuff' | 'plain-hem', customer: string) {
  const t = await call('POST', '/api/tickets', { cookie: cookie.counter, body: { customer: { name: customer }, garments: [{ description, existingFinish }] } });
  expect(t.status).toBe(201);
  const id = (await call('GET', `/api/tickets/${t.body.id}`, { cookie: cookie.lead })).body.garments[0].id as string;
  const leg = { finish: 'cuff', backPin: '31', cuffDepth: '1 1/2', available: '5' };
  const fit = await call('PUT', `/api/garments/${id}/measurements`, { cookie: cookie.tailor, body: { unit: 'in', legs: { left: leg, right: leg } } });
  expect(fit.status).toBe(200);
  return { id, number: t.body.number as number };
}

beforeAll(async () => {
  for (const role of Object.keys(DEMO) as (keyof typeof DEMO)[]) cookie[role] = await signIn(DEMO[role]);
});

describe('GET /api/garments/[id]/sheet', () => {
  it('a pair taken in with cuffs: step 1 lets the old cuffs down, step 2 chalks, on one page', async () => {
    const { id } = await takenIn('Slate serge trousers', 'cuff', 'Corwin Ashdale');
    const file = await pdf(`/api/garments/${id}/sheet`, cookie.tailor);
    const bench = benchOf(flatText(file));
    expect(bench).toContain(`1. ${LET_DOWN_OLD_CUFF}`);
    expect(bench.indexOf(LET_DOWN_OLD_CUFF)).toBeLessThan(bench.indexOf('2. Chalk the four lines'));
    expect(pageInfo(file).pages).toBe(1);
  });

  it('a pair taken in with a plain hem starts at the chalk', async () => {
    const { id } = await takenIn('Sand drill trousers', 'plain-hem', 'Corwin Ashdale');
    const text = flatText(await pdf(`/api/garments/${id}/sheet`, cookie.tailor));
    expect(text).not.toContain('Let down');
    // Step 1 is the chalk. (Text beside the heading in the guide column may come between them in
    // the extracted text, so the first numbered step is looked for, not the heading's neighbour.)
    expect(benchOf(text)).toMatch(/^AT THE BENCH, IN THIS ORDER\D*?1\. Chalk the four lines/);
  });

  it("the demo's charcoal pair, seeded with cuffs, prints the step", async () => {
    const queue = (await call('GET', '/api/garments', { cookie: cookie.lead })).body as QueueRow[];
    const charcoal = queue.find((g) => g.description === 'Charcoal wool trousers')!;
    expect((await call('GET', `/api/garments/${charcoal.id}`, { cookie: cookie.lead })).body.existingFinish).toBe('cuff');
    expect(flatText(await pdf(`/api/garments/${charcoal.id}/sheet`, cookie.lead))).toContain(LET_DOWN_OLD_CUFF);
  });
});

describe('the batch and the calculator', () => {
  it("GET /api/queue/sheets prints the step on the cuffed pair's page", async () => {
    const { number } = await takenIn('Moss cord trousers', 'cuff', 'Ysolde Brackwater');
    const file = await pdf(`/api/queue/sheets?search=PH%20${number}`, cookie.lead);
    expect(pageInfo(file).pages).toBe(1);
    expect(flatText(file)).toContain('Moss cord trousers (Ysolde Brackwater)');
    expect(flatText(file)).toContain(LET_DOWN_OLD_CUFF);
  });

  it('POST /api/plan/sheet (no garment, so no finish known) has no let-down step', async () => {
    const text = flatText(await pdf('/api/plan/sheet', undefined, { kind: 'cuff', unit: 'in', cuffDepth: '1 1/2', available: '5' }));
    expect(text).toContain('AT THE BENCH');
    expect(text).not.toContain('Let down');
  });
});
