// The width measured at the cutting line of a let-down pair, against the built server: PUT saves it
// with the fitting, refuses a width of 0 with 422 naming the field (and saves nothing), and the
// garment's cut sheet says which width was measured. Base leg: TRADE.md's tapered example (7 in flat
// at the edge, 8 in 12 in up: Fit For A Queen 2012); the let-down figures are arithmetic on it.
import { beforeAll, describe, expect, inject, it } from 'vitest';
import { flatText, pdfFile } from '../lib/cut-sheet/poppler';
import { call, DEMO, signIn } from './client';

const cookie = {} as Record<'counter' | 'tailor', string>;

beforeAll(async () => {
  cookie.counter = await signIn(DEMO.counter);
  cookie.tailor = await signIn(DEMO.tailor);
});

/** A pair taken in with a plain hem (let down first), and its garment id. */
async function letDownPair(): Promise<string> {
  const t = await call('POST', '/api/tickets', {
    cookie: cookie.counter,
    body: { customer: { name: 'Rosalind Ferrow' }, garments: [{ description: 'Fawn twill trousers', existingFinish: 'plain-hem' }] },
  });
  expect(t.status).toBe(201);
  return (await call('GET', `/api/tickets/${t.body.id}`, { cookie: cookie.counter })).body.garments[0].id as string;
}

const leg = (widthAtCut: string) => ({ finish: 'plain', backPin: '32', widthAtEdge: '7', widthAbove: '8', heightAbove: '12', widthAtCut });

describe('PUT /api/garments/[id]/measurements with a width at the cutting line', () => {
  it('saves it as typed and in exact mm (7 1/2 in = 190.5 mm: TRADE.md, NBS 1959), and the sheet says it was measured', async () => {
    const id = await letDownPair();
    const r = await call('PUT', `/api/garments/${id}/measurements`, {
      cookie: cookie.tailor,
      body: { unit: 'in', legs: { left: leg('7 1/2'), right: leg('7 1/2') } },
    });
    expect(r.status).toBe(200);
    expect(r.body.legs[0].values.widthAtCut).toEqual({ text: '7 1/2', mm: 190.5 });
    const sheet = await fetch(`${inject('baseURL')}/api/garments/${id}/sheet`, { headers: { cookie: cookie.tailor } });
    expect(sheet.status).toBe(200);
    const text = flatText(pdfFile(new Uint8Array(await sheet.arrayBuffer())));
    // The leg 1 1/2 in above the edge is 7 1/8 in; 7 1/2 in measured at the cut: take in 3/8 in.
    expect(text).toContain('measured on the let-down leg: 7 1/2 in flat');
    expect(text).toContain('take in 3/8 in at line 2');
  });

  it('answers 422 naming the field for a width of 0, and saves nothing', async () => {
    const id = await letDownPair();
    const r = await call('PUT', `/api/garments/${id}/measurements`, {
      cookie: cookie.tailor,
      body: { unit: 'in', legs: { left: leg('0'), right: leg('7 1/2') } },
    });
    expect(r.status).toBe(422);
    expect(r.body.issues).toEqual({ 'legs.left.widthAtCut': 'Width at the cutting line must be more than 0.' });
    expect((await call('GET', `/api/garments/${id}/measurements`, { cookie: cookie.tailor })).body.legs).toEqual([]);
  });
});
