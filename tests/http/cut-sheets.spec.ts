// Cut sheets of saved garments against the built server: the demo garment's sheet in inches and
// in mm carries the engine's plan of its saved fitting; the QR decodes to the garment's page at
// the app's address; the drawing is on the page; the batch has one page per fitted garment of the
// queue as the screen filters it; refusals are JSON (401, 403, 404, 400, 422).
import jsQR from 'jsqr';
import { beforeAll, describe, expect, inject, it } from 'vitest';
import { planCuff } from '../../src/lib/allowance/index';
import type { QueueRow } from '../../src/lib/shared/bench-types';
import { DEFAULT_QUEUE_FILTER, filterQueue } from '../../src/lib/shared/queue-filter';
import { flatText, gray, layoutText, pageInfo, pdfFile, words } from '../lib/cut-sheet/poppler';
import { call, DEMO, newShop, signIn } from './client';

const cookie = {} as Record<keyof typeof DEMO, string>;
let navy = '';
let navyFitting: { leg: string; values: Record<string, { text: string }> }[] = [];

/** GETs a path as raw bytes with its status and headers. */
async function raw(path: string, who?: string) {
  const res = await fetch(inject('baseURL') + path, { headers: who ? { cookie: who } : {} });
  return { status: res.status, type: res.headers.get('content-type'), headers: res.headers, bytes: new Uint8Array(await res.arrayBuffer()) };
}

const esc = (s: string) => s.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&');

beforeAll(async () => {
  for (const role of Object.keys(DEMO) as (keyof typeof DEMO)[]) cookie[role] = await signIn(DEMO[role]);
  const queue = (await call('GET', '/api/garments', { cookie: cookie.lead })).body as QueueRow[];
  navy = queue.find((g) => g.description === 'Navy suit trousers')!.id;
  navyFitting = (await call('GET', `/api/garments/${navy}/measurements`, { cookie: cookie.lead })).body.legs;
});

/** The engine's plan of one saved leg of the demo garment, in the unit asked for. */
function planOf(leg: 'left' | 'right', unit: 'in' | 'mm') {
  const v = navyFitting.find((l) => l.leg === leg)!.values;
  const typed = (f: string) => (unit === 'in' ? v[f]!.text : `${v[f]!.text} in`);
  return planCuff({ unit, precision: 8, cuffDepth: typed('cuffDepth'), available: typed('available') });
}

describe("the demo garment's cut sheet", () => {
  it('prints each leg’s engine plan in inches: cut 4 1/2 in below the mark (three cuff depths of 1 1/2 in)', async () => {
    const r = await raw(`/api/garments/${navy}/sheet?unit=in&precision=8`, cookie.tailor);
    expect(r.status).toBe(200);
    expect(r.type).toBe('application/pdf');
    // A member's sheet is drawn in the sheet pool too, off the thread serving requests.
    expect(r.headers.get('x-rendered-by')).toBe('worker');
    expect(r.headers.get('content-disposition')).toMatch(/^inline; filename="ph-\d+-navy-suit-trousers\.pdf"$/);
    const file = pdfFile(r.bytes);
    const text = layoutText(file);
    // The legs differ (5 in and 4 3/4 in of cloth): each is printed with its own plan.
    expect(text).toContain('LEFT LEG');
    expect(text).toContain('RIGHT LEG');
    for (const leg of ['left', 'right'] as const) {
      const plan = planOf(leg, 'in');
      const cut = plan.lines.find((l) => l.name === 'cut')!;
      // TRADE.md: "cut three cuff depths below the mark: 1½ in cuff → 4½ in".
      expect(cut.belowMark.text).toBe('4 1/2 in');
      expect(text).toMatch(new RegExp(`${esc(cut.belowMark.text)}\\s+below the pin`));
      expect(flatText(file)).toContain(`has ${plan.lines[0]!.aboveRawEdge!.text}, ${cut.aboveRawEdge!.text} to spare`);
      const top = plan.lines.find((l) => l.name === 'cuff-top')!;
      expect(text).toMatch(new RegExp(`2 Cuff top\\s+${esc(top.belowMark.text)}\\s+${esc(top.aboveRawEdge!.text)}`));
    }
    expect(flatText(file)).toContain('All lengths in inches, to 1/8.');
  });

  it('prints the same fitting in mm, read exactly from the inches typed (cut 114.3 mm, shown to the half mm)', async () => {
    const r = await raw(`/api/garments/${navy}/sheet?unit=mm&page=A4`, cookie.lead);
    expect(r.status).toBe(200);
    const file = pdfFile(r.bytes);
    const text = layoutText(file);
    for (const leg of ['left', 'right'] as const) {
      const plan = planOf(leg, 'mm');
      const cut = plan.lines.find((l) => l.name === 'cut')!;
      // 1 in = 25.4 mm exactly (TRADE.md): 3 × 38.1 mm = 114.3 mm.
      expect(cut.belowMark.mm).toBeCloseTo(114.3, 9);
      expect(text).toMatch(new RegExp(`${esc(cut.belowMark.text)}\\s+below the pin`));
      const fold = plan.lines.find((l) => l.name === 'inner-fold')!;
      expect(text).toMatch(new RegExp(`3 Inner fold\\s+${esc(fold.belowMark.text)}\\s+${esc(fold.aboveRawEdge!.text)}`));
    }
    expect(flatText(file)).toContain('All lengths in millimetres.');
    expect(pageInfo(file)).toMatchObject({ pages: 1, width: 595.28, height: 841.89 });
  });

  it("carries a QR code that opens the garment's page at the app's address", async () => {
    const file = pdfFile((await raw(`/api/garments/${navy}/sheet`, cookie.apprentice)).bytes);
    const g = gray(file, 150);
    const rgba = new Uint8ClampedArray(g.width * g.height * 4);
    for (let i = 0; i < g.px.length; i++) rgba.set([g.px[i]!, g.px[i]!, g.px[i]!, 255], i * 4);
    const link = jsQR(rgba, g.width, g.height)?.data;
    expect(link).toBe(`${inject('baseURL')}/garments/${navy}`);
    // The link opens the garment's page for a signed-in member of the shop.
    const page = await fetch(link!, { headers: { cookie: cookie.tailor }, redirect: 'manual' });
    expect(page.status).toBe(200);
  });

  it('has the leg drawing on its first page (pdftoppm: inked region above the scale caption)', async () => {
    const file = pdfFile((await raw(`/api/garments/${navy}/sheet`, cookie.lead)).bytes);
    const g = gray(file, 100);
    const caps = words(file).filter((w) => w.text === 'Scale');
    expect(caps.length).toBe(2);
    const px = (pt: number) => Math.round((pt * g.dpi) / 72);
    for (const cap of caps) {
      let inked = 0;
      let total = 0;
      for (let y = px(cap.yMin - 100); y < px(cap.yMin - 4); y++)
        for (let x = px(cap.xMin); x < px(cap.xMin + 120); x++, total++) if (g.px[y * g.width + x]! < 245) inked++;
      expect(inked / total).toBeGreaterThan(0.3);
    }
  });
});

describe('refusals', () => {
  it('signed out 401, counter 403, another shop 404, each as JSON', async () => {
    const other = await newShop('Sheet Refusal Shop');
    const out = await call('GET', `/api/garments/${navy}/sheet`);
    const counter = await call('GET', `/api/garments/${navy}/sheet`, { cookie: cookie.counter });
    const foreign = await call('GET', `/api/garments/${navy}/sheet`, { cookie: other.cookie });
    expect([out.status, counter.status, foreign.status]).toEqual([401, 403, 404]);
    for (const r of [out, counter, foreign]) expect(typeof r.body.error).toBe('string');
    expect(foreign.body.error).toMatch(/No such garment/);
  });

  it('a bad unit, precision or paper is 422 with the field named', async () => {
    const r = await call('GET', `/api/garments/${navy}/sheet?unit=furlong&precision=3&page=B5`, { cookie: cookie.lead });
    expect(r.status).toBe(422);
    expect(Object.keys(r.body.issues).sort()).toEqual(['page', 'precision', 'unit']);
  });

  it('a garment with no fitting yet is 422 "no fitting measurements yet"', async () => {
    const t = await call('POST', '/api/tickets', { cookie: cookie.counter, body: { garments: [{ description: 'Sheetless trousers' }] } });
    const id = (await call('GET', `/api/tickets/${t.body.id}`, { cookie: cookie.lead })).body.garments[0].id;
    const r = await call('GET', `/api/garments/${id}/sheet`, { cookie: cookie.tailor });
    expect(r.status).toBe(422);
    expect(r.body.error).toMatch(/no fitting measurements yet/);
  });
});

describe("the morning's batch", () => {
  it('has one page per fitted garment of the queue as filtered on screen, the unfitted ones named on a last page', async () => {
    const today = new Date().toISOString().slice(0, 10);
    const filter = { ...DEFAULT_QUEUE_FILTER, due: 'today' as const };
    const r = await raw(`/api/queue/sheets?step=open&who=all&due=today&today=${today}`, cookie.lead);
    expect(r.status).toBe(200);
    expect(r.type).toBe('application/pdf');
    // What the queue screen shows with the same filter, from the same rows and the same function.
    const staff = (await call('GET', '/api/staff', { cookie: cookie.lead })).body.members as { userId: string; email: string }[];
    const leadId = staff.find((m) => m.email === DEMO.lead)!.userId;
    const rows = filterQueue((await call('GET', '/api/garments', { cookie: cookie.lead })).body as QueueRow[], filter, leadId, today);
    let fitted = 0;
    for (const row of rows) if ((await call('GET', `/api/garments/${row.id}/measurements`, { cookie: cookie.lead })).body.legs.length > 0) fitted++;
    expect(fitted).toBeGreaterThan(0);
    expect(Number(r.headers.get('x-sheets'))).toBe(fitted);
    expect(Number(r.headers.get('x-skipped'))).toBe(rows.length - fitted);
    // Drawn in the sheet pool and streamed (the test server sets SHEET_RENDER_TRACE).
    expect(r.headers.get('x-rendered-by')).toBe('worker');
    const file = pdfFile(r.bytes);
    expect(pageInfo(file).pages).toBe(fitted + (rows.length > fitted ? 1 : 0));
    for (let p = 1; p <= fitted; p++) expect(flatText(file, p)).toMatch(/CUT SHEET/);
    if (rows.length > fitted) expect(flatText(file, fitted + 1)).toContain('Not in this batch');
  });

  it('narrows by search like the screen: one ticket, one sheet', async () => {
    const navyRow = ((await call('GET', '/api/garments', { cookie: cookie.lead })).body as QueueRow[]).find((g) => g.id === navy)!;
    const r = await raw(`/api/queue/sheets?search=PH%20${navyRow.ticketNumber}&unit=cm`, cookie.tailor);
    expect(r.status).toBe(200);
    const file = pdfFile(r.bytes);
    expect(pageInfo(file).pages).toBe(1);
    expect(flatText(file)).toContain(`Ticket PH ${navyRow.ticketNumber}`);
    expect(flatText(file)).toContain('All lengths in centimetres.');
  });

  it('refuses the counter (403) and a bad filter (422)', async () => {
    expect((await call('GET', '/api/queue/sheets', { cookie: cookie.counter })).status).toBe(403);
    const bad = await call('GET', '/api/queue/sheets?due=someday&today=tomorrow', { cookie: cookie.lead });
    expect(bad.status).toBe(422);
    expect(Object.keys(bad.body.issues).sort()).toEqual(['due', 'today']);
  });
});
