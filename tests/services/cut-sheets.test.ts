// Cut sheets of saved garments: the numbers and units printed are the engine's plan of the saved
// fitting, in inches and in mm; the QR opens the garment's page; the drawing is on the page;
// another shop's garment and an apprentice's invisible one are refused; the batch follows the
// queue's filters with one page per garment.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import jsQR from 'jsqr';
import type { Shop } from './fixtures';

vi.mock('@/db', () => import('../db/db-mock'));

const { handle } = await import('@/db');
const { moveGarment } = await import('@/services/garments');
const { saveBenchSettings } = await import('@/services/shop-settings');
const { addLine } = await import('@/services/counter/prices');
const { garmentSheet, queueSheets, NO_FITTING } = await import('@/services/cut-sheets');
const { ServiceError } = await import('@/services/errors');
const { planCuff, planHem } = await import('@/lib/allowance');
const { DEFAULT_QUEUE_FILTER } = await import('@/lib/shared/queue-filter');
const { makeShop } = await import('./fixtures');
const { fittingRequest, openTicket, saveFitting } = await import('./garment-fixtures');
const { flatText, gray, layoutText, pageInfo, pdfFile, words } = await import('../lib/cut-sheet/poppler');

const BASE = 'https://bench.cuffwright.test';
const TODAY = '2026-12-01';

let a: Shop;
let b: Shop;

beforeAll(async () => {
  a = await makeShop('Sheet Shop A');
  b = await makeShop('Sheet Shop B');
});
afterAll(() => handle.close());

async function garment(shop = a, extra: { description?: string; dueOn?: string; assigneeId?: string | null } = {}) {
  const { ticket, garment: g } = await openTicket(shop, {
    customer: { name: 'Wren Halloway' },
    garments: [{ description: extra.description ?? 'Navy suit trousers', dueOn: extra.dueOn, assigneeId: extra.assigneeId ?? null }],
  });
  return { ticket, g };
}

async function fitLegs(shop: Shop, garmentId: string, finish: 'cuff' | 'plain', left: Record<string, string>, right = left, unit: 'in' | 'cm' | 'mm' = 'in') {
  await saveFitting(shop.tailor, garmentId, fittingRequest(left, right, unit, finish));
}

const esc = (s: string) => s.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&');

/** Every chalk line of the plan as the sheet's table (or cut box) must print it. */
function expectPlanPrinted(text: string, plan: ReturnType<typeof planCuff>) {
  for (const line of plan.lines) {
    if (line.name === 'cut') {
      // The cut box's caption may wrap under a value, with the guide column's words between.
      expect(text).toMatch(new RegExp(`${esc(line.belowMark.text)}\\s+below the pin`));
      if (line.aboveRawEdge) expect(text).toMatch(new RegExp(`\\n\\s*${esc(line.aboveRawEdge.text.replace(/^-/, ''))}\\s[\\s\\S]{0,300}?(above the|PAST the)`));
    } else {
      const name = { 'finished-edge': 'Finished edge', 'cuff-top': 'Cuff top', 'inner-fold': 'Inner fold' }[line.name];
      expect(text).toMatch(new RegExp(`${line.n} ${name}\\s+${esc(line.belowMark.text)}\\s+${esc(line.aboveRawEdge?.text ?? '—')}`));
    }
  }
}

async function sheetOf(actor: typeof a.tailor, id: string, opts: Parameters<typeof garmentSheet>[2] = {}) {
  const file = await garmentSheet(actor, id, opts, BASE);
  return { ...file, path: pdfFile(file.bytes) };
}

describe('one garment with a 1 1/2 in cuff and 5 in of cloth, fitted in inches', () => {
  let id = '';
  let number = 0;
  beforeAll(async () => {
    const { g, ticket } = await garment(a, { dueOn: '2026-12-04', assigneeId: a.tailor.userId });
    id = g.id;
    number = ticket.number;
    await fitLegs(a, id, 'cuff', { backPin: '31 1/4', cuffDepth: '1 1/2', available: '5' });
  });

  it('prints the engine plan in inches to 1/8 by default, cut 4 1/2 in below the mark (three cuff depths)', async () => {
    const { path, filename } = await sheetOf(a.tailor, id);
    const text = layoutText(path);
    const plan = planCuff({ unit: 'in', precision: 8, cuffDepth: '1 1/2', available: '5' });
    expectPlanPrinted(text, plan);
    // TRADE.md: "cut three cuff depths below the mark: 1½ in cuff → 4½ in" (Seam2Seam 2014; Permanent Style 2020).
    expect(text).toMatch(/4 1\/2 in\s+below the pin/);
    expect(text).toMatch(/2 Cuff top\s+1 1\/2 in\s+3 1\/2 in/);
    expect(flatText(path)).toContain('All lengths in inches, to 1/8.');
    // The shop's initials (Sheet Shop A) and the number, as on its ticket book; ASCII for the header.
    expect(filename).toBe(`ssa-${number}-navy-suit-trousers.pdf`);
    expect(pageInfo(path)).toMatchObject({ pages: 1, width: 612, height: 792 });
  });

  it('prints the same saved fitting in mm: the engine plan of 1 1/2 in read exactly (cut 114.3 mm = 3 × 38.1 mm)', async () => {
    const { path } = await sheetOf(a.tailor, id, { unit: 'mm', pageSize: 'A4' });
    const text = layoutText(path);
    const plan = planCuff({ unit: 'mm', cuffDepth: '1 1/2 in', available: '5 in' });
    // 1 in = 25.4 mm exactly (TRADE.md, NBS 1959); the cut is three cuff depths (TRADE.md).
    expect(plan.lines.find((l) => l.name === 'cut')!.belowMark.mm).toBeCloseTo(114.3, 9);
    expectPlanPrinted(text, plan);
    expect(text).toMatch(/mm\s+below the pin/);
    // No planned length is in inches (the check ruler is in mm too).
    expect(text).not.toMatch(/\d\/\d+ in\b|\b[2-9]\d* in\b/);
    expect(flatText(path)).toContain('All lengths in millimetres.');
    expect(pageInfo(path)).toMatchObject({ pages: 1, width: 595.28, height: 841.89 });
  });

  it('follows the shop scale when no unit is asked for (sixteenths)', async () => {
    await saveBenchSettings(a.lead, { scale: 'in16', stepLabels: {} });
    try {
      const { path } = await sheetOf(a.tailor, id);
      expect(flatText(path)).toContain('All lengths in inches, to 1/16.');
    } finally {
      await saveBenchSettings(a.lead, { scale: 'in8', stepLabels: {} });
    }
  });

  it('heads the sheet with shop, ticket, garment, due date and assignee', async () => {
    const text = flatText((await sheetOf(a.tailor, id)).path);
    expect(text).toContain('Sheet Shop A');
    expect(text).toContain(`Ticket SSA ${number}`);
    expect(text).toContain('Navy suit trousers (Wren Halloway)');
    expect(text).toMatch(/Due [^·]*4[^·]*Dec/);
    expect(text).toContain('For tailor of Sheet Shop A');
  });

  it("carries a QR code that decodes to the garment's page at the app's address", async () => {
    const { path } = await sheetOf(a.tailor, id);
    const g = gray(path, 150);
    const rgba = new Uint8ClampedArray(g.width * g.height * 4);
    for (let i = 0; i < g.px.length; i++) rgba.set([g.px[i]!, g.px[i]!, g.px[i]!, 255], i * 4);
    expect(jsQR(rgba, g.width, g.height)?.data).toBe(`${BASE}/garments/${id}`);
  });

  it('draws the leg: a non-blank region above the drawing’s scale caption (pdftoppm)', async () => {
    const { path } = await sheetOf(a.tailor, id);
    const g = gray(path, 100);
    const cap = words(path).find((w) => w.text === 'Scale')!;
    expect(cap).toBeDefined();
    const px = (pt: number) => Math.round((pt * g.dpi) / 72);
    let inked = 0;
    let total = 0;
    for (let y = px(cap.yMin - 100); y < px(cap.yMin - 4); y++)
      for (let x = px(cap.xMin); x < px(cap.xMin + 120); x++, total++) if (g.px[y * g.width + x]! < 245) inked++;
    expect(inked / total).toBeGreaterThan(0.3);
  });

  it('is refused to another shop (404), with no PDF', async () => {
    const err = await garmentSheet(b.lead, id, {}, BASE).catch((e) => e);
    expect(err).toBeInstanceOf(ServiceError);
    expect(err.status).toBe(404);
  });

  it("is refused to an apprentice when it is someone else's work (404)", async () => {
    const err = await garmentSheet(a.apprentice, id, {}, BASE).catch((e) => e);
    expect(err).toBeInstanceOf(ServiceError);
    expect(err.status).toBe(404);
  });
});

describe('a metric fitting printed in inches', () => {
  it('reads the typed mm exactly and prints the engine plan in inches (plain hem, 40 mm allowance)', async () => {
    const { g } = await garment(a, { description: 'Grey chinos' });
    await fitLegs(a, g.id, 'plain', { backPin: '790', hemAllowance: '40', available: '60' }, undefined, 'mm');
    const text = layoutText((await sheetOf(a.tailor, g.id, { unit: 'in', precision: 16 })).path);
    const plan = planHem({ unit: 'in', precision: 16, hemAllowance: '40 mm', available: '60 mm' });
    const cut = plan.lines.find((l) => l.name === 'cut')!;
    // 40 mm = 1.5748 in (1 in = 25.4 mm, TRADE.md, NBS 1959): the sheet cuts no higher than the
    // exact line, so it prints the next sixteenth up, 1 5/8 in (the engine's nearest is 1 9/16 in).
    expect(cut.belowMark.mm).toBeCloseTo(40, 9);
    expect(text).toMatch(/1 5\/8 in\s+below the pin/);
    expect(flatText((await sheetOf(a.tailor, g.id, { unit: 'in', precision: 16 })).path)).toContain('Plain hem, 1 5/8 in allowance');
  });
});

describe('a fitting saved before save-time checks, with a taper that cannot be planned', () => {
  it('is refused with 422 naming the field, never a 500 (arithmetic: 1.5 mm at the edge, 220 mm 150 mm up)', async () => {
    const { g } = await garment(a, { description: 'Impossible taper trousers' });
    const { saveMeasurements } = await import('@/services/measurements');
    const input = fittingRequest({ cuffDepth: '38', widthAtEdge: '1.5', widthAbove: '220', heightAbove: '150' }, { cuffDepth: '38' }, 'mm');
    const mm = (text: string) => ({ text, mm: Number(text) });
    const left = { cuffDepth: mm('38'), widthAtEdge: mm('1.5'), widthAbove: mm('220'), heightAbove: mm('150') };
    // Saved straight through the service, as a row from before the check would be.
    await saveMeasurements(a.tailor, g.id, input, { left, right: { cuffDepth: mm('38') } });
    const err = await garmentSheet(a.tailor, g.id, {}, BASE).catch((e) => e);
    expect(err).toBeInstanceOf(ServiceError);
    expect(err.status).toBe(422);
    expect(err.message).toMatch(/widthAbove/);
  });
});

describe('a garment without a fitting', () => {
  it('is refused with 422 "no fitting measurements yet"', async () => {
    const { g } = await garment(a, { description: 'Olive chinos' });
    const err = await garmentSheet(a.tailor, g.id, {}, BASE).catch((e) => e);
    expect(err).toBeInstanceOf(ServiceError);
    expect(err.status).toBe(422);
    expect(err.message).toBe(NO_FITTING);
  });
});

describe('the batch for the queue', () => {
  let shop: Shop;
  const fitted: string[] = [];
  beforeAll(async () => {
    shop = await makeShop('Batch Shop');
    for (const [i, depth] of ['1 1/4', '1 1/2', '1 3/4'].entries()) {
      const { g } = await garment(shop, {
        description: `Fitted pair ${i + 1}`,
        dueOn: `2026-12-0${i + 1}`,
        assigneeId: i === 2 ? shop.lead.userId : shop.tailor.userId,
      });
      await fitLegs(shop, g.id, 'cuff', { cuffDepth: depth, available: '6' });
      fitted.push(g.id);
    }
    await garment(shop, { description: 'Unfitted pair', dueOn: '2026-12-01' });
    // A collected garment is not in the open queue.
    const { g: done, ticket: doneTicket } = await garment(shop, { description: 'Collected pair', dueOn: '2026-11-20' });
    await fitLegs(shop, done.id, 'cuff', { cuffDepth: '2', available: '7' });
    // A ticket is handed over only priced (the counter's rule): this one goes out with no charge.
    await addLine(shop.counter, doneTicket.id, { source: 'no-charge', reason: 'batch fixture' });
    for (const step of ['marked', 'cut', 'stitched', 'pressed', 'ready', 'collected'] as const) await moveGarment(shop.lead, done.id, step);
  });

  it('prints one page per fitted garment of the open queue, in queue order, and lists the unfitted one on a last page', async () => {
    const batch = await queueSheets(shop.tailor, DEFAULT_QUEUE_FILTER, TODAY, {}, BASE);
    expect(batch.sheets).toBe(3);
    expect(batch.skipped).toEqual([expect.stringMatching(/^BS \d+ Unfitted pair: no fitting measurements yet$/)]);
    const path = pdfFile(batch.bytes);
    expect(pageInfo(path).pages).toBe(4);
    // Own work first (the tailor's two, earliest due first), then someone else's.
    expect(flatText(path, 1)).toContain('Fitted pair 1');
    expect(flatText(path, 2)).toContain('Fitted pair 2');
    expect(flatText(path, 3)).toContain('Fitted pair 3');
    // TRADE.md: three cuff depths: 1 1/4 → 3 3/4 in, 1 1/2 → 4 1/2 in, 1 3/4 → 5 1/4 in.
    expect(flatText(path, 1)).toMatch(/3 3\/4 in below the pin/);
    expect(flatText(path, 2)).toMatch(/4 1\/2 in below the pin/);
    expect(flatText(path, 3)).toMatch(/5 1\/4 in below the pin/);
    expect(flatText(path, 4)).toContain('Not in this batch');
    expect(flatText(path)).not.toContain('Collected pair');
  });

  it('follows the filters as on screen: "mine" leaves out the lead’s garment and the unassigned one', async () => {
    const batch = await queueSheets(shop.tailor, { ...DEFAULT_QUEUE_FILTER, who: 'mine' }, TODAY, { unit: 'cm' }, BASE);
    expect(batch.sheets).toBe(2);
    expect(batch.skipped).toEqual([]);
    const path = pdfFile(batch.bytes);
    expect(pageInfo(path).pages).toBe(2);
    expect(flatText(path)).toContain('All lengths in centimetres.');
  });

  it('answers 422 when nothing matches, and never reaches another shop', async () => {
    const none = await queueSheets(shop.tailor, { ...DEFAULT_QUEUE_FILTER, search: 'nobody-by-this-name' }, TODAY, {}, BASE).catch((e) => e);
    expect(none.status).toBe(422);
    const other = await queueSheets(b.lead, DEFAULT_QUEUE_FILTER, TODAY, {}, BASE).catch((e) => e);
    expect(other.status).toBe(422);
  });
});
