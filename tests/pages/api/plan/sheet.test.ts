// POST /api/plan/sheet called as Astro calls it: a real Request in, a PDF or a 400 out.
import type { APIContext } from 'astro';
import { describe, expect, it, vi } from 'vitest';
import { POST } from '@/pages/api/plan/sheet';
import { flatText, layoutText, pageInfo, pdfFile } from '../../../lib/cut-sheet/poppler';

// The anonymous limit counts in the database.
vi.mock('@/db', () => import('../../../db/db-mock'));

let calls = 0;
async function post(body: unknown): Promise<Response> {
  const request = new Request('http://localhost/api/plan/sheet', {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: typeof body === 'string' ? body : JSON.stringify(body),
  });
  // Signed out, so counted against the anonymous limit (tests/http/limits.spec.ts): an address per call.
  return POST({ request, locals: { member: null }, clientAddress: `192.0.2.${(calls += 1)}` } as unknown as APIContext);
}

async function pdfOf(res: Response): Promise<string> {
  return pdfFile(new Uint8Array(await res.arrayBuffer()));
}

describe('POST /api/plan/sheet', () => {
  it('answers the calculator plan as an inline PDF with the lines of a 1 1/2 in cuff', async () => {
    const res = await post({ kind: 'cuff', unit: 'in', precision: 8, cuffDepth: '1 1/2', available: '5' });
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    expect(res.headers.get('content-disposition')).toMatch(/^inline; filename=".+\.pdf"$/);
    const file = await pdfOf(res);
    expect(pageInfo(file)).toEqual({ pages: 1, width: 612, height: 792 });
    // TRADE.md: cut three cuff depths below the mark, 1 1/2 in cuff → 4 1/2 in; 5 − 4 1/2 = 1/2 in.
    expect(layoutText(file)).toMatch(/4 1\/2 in\s+below the pin/);
    expect(flatText(file)).toContain('Unsaved plan from the calculator');
  });

  it('prints on A4 in millimetres, with a different right leg and a taper', async () => {
    const res = await post({
      kind: 'cuff',
      unit: 'mm',
      cuffDepth: 40,
      available: 150,
      pageSize: 'A4',
      taper: { widthAtEdge: 190, widthAbove: 215, heightAbove: 150, seamAllowance: 20 },
      right: { kind: 'cuff', unit: 'mm', cuffDepth: 45, available: 160 },
    });
    expect(res.status).toBe(200);
    const file = await pdfOf(res);
    expect(pageInfo(file)).toEqual({ pages: 1, width: 595.28, height: 841.89 });
    const text = flatText(file);
    // TRADE.md: three cuff depths: 3 × 40 = 120 mm, 3 × 45 = 135 mm.
    expect(text).toContain('LEFT LEG');
    expect(text).toContain('RIGHT LEG');
    expect(layoutText(file)).toMatch(/120 mm\s+below the pin/);
    expect(layoutText(file)).toMatch(/135 mm\s+below the pin/);
    expect(text).toContain('Taper');
  });

  it('prints a plain hem', async () => {
    const res = await post({ kind: 'hem', unit: 'in', hemAllowance: '1 1/2' });
    expect(res.status).toBe(200);
    expect(flatText(await pdfOf(res))).toContain('Plain hem, 1 1/2 in allowance');
  });

  it('answers 422 with a message per field for a missing cuff depth', async () => {
    const res = await post({ kind: 'cuff', unit: 'in' });
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(body.issues.cuffDepth).toMatch(/cuff depth/i);
  });

  it('answers 422 for a length the engine cannot read, on the leg and field at fault', async () => {
    const res = await post({ kind: 'cuff', unit: 'in', cuffDepth: '1 1/2', right: { kind: 'cuff', unit: 'in', cuffDepth: 'deep' } });
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(Object.keys(body.issues)).toEqual(['right.cuffDepth']);
    expect(typeof body.error).toBe('string');
  });

  it('answers 422 for an unreadable taper width', async () => {
    const res = await post({ kind: 'cuff', unit: 'in', cuffDepth: 1.5, taper: { widthAtEdge: 'wide', widthAbove: 8.5, heightAbove: 6 } });
    expect(res.status).toBe(422);
    expect(Object.keys((await res.json()).issues)).toContain('taper.widthAtEdge');
  });

  it('answers 422 for legs in different units, a bad page size and an unknown kind; 400 for broken JSON', async () => {
    const mixed = await post({ kind: 'cuff', unit: 'in', cuffDepth: 1.5, right: { kind: 'hem', unit: 'mm' } });
    expect(mixed.status).toBe(422);
    expect((await mixed.json()).issues['right.unit']).toMatch(/same unit/);

    const paper = await post({ kind: 'hem', unit: 'in', pageSize: 'A3' });
    expect(paper.status).toBe(422);
    expect((await paper.json()).issues.pageSize).toMatch(/Letter or A4/);

    const kind = await post({ kind: 'taper', unit: 'in' });
    expect(kind.status).toBe(422);

    const broken = await post('{"kind":');
    expect(broken.status).toBe(400);
    expect((await broken.json()).error).toMatch(/JSON/);
  });

  it('answers 422, never 500, for taper widths each sound but giving no leg at the cuff top, on the leg at fault', async () => {
    // 8 in flat at the edge and 1 in one inch higher: followed up 1 1/2 in there is no leg left.
    const taper = { widthAtEdge: 8, widthAbove: 1, heightAbove: 1 };
    const left = await post({ kind: 'cuff', unit: 'in', cuffDepth: 1.5, taper });
    expect(left.status).toBe(422);
    const body = await left.json();
    expect(body.error).toMatch(/no leg/);
    expect(Object.keys(body.issues)).toEqual(['taper.widthAbove']);
    const right = await post({ kind: 'cuff', unit: 'in', cuffDepth: 1.5, right: { kind: 'cuff', unit: 'in', cuffDepth: 1.5, taper } });
    expect(right.status).toBe(422);
    expect(Object.keys((await right.json()).issues)).toEqual(['right.taper.widthAbove']);
  });
});
