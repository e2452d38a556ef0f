// What is drawn rather than written: the leg drawing to scale, and the chalk guide at 1:1.
import { beforeAll, describe, expect, it } from 'vitest';
import { buildCutSheet } from '@/lib/server/cut-sheet/build';
import { renderCutSheet } from '@/lib/server/cut-sheet/render';
import { gray, pdfFile, words, type Gray, type Word } from './poppler';
import { cuffInch, cuffMetric, sheet, UNSAVED } from './sheets';

const MM = 72 / 25.4;

/** Rows (in px) of horizontal lines darker than `dark` covering at least `minRun` px of a box. */
function horizontalLines(g: Gray, box: { x0: number; x1: number; y0: number; y1: number }, dark: number, minRun: number): number[] {
  const rows: number[] = [];
  for (let y = box.y0; y < box.y1; y++) {
    let n = 0;
    for (let x = box.x0; x < box.x1; x++) if (g.px[y * g.width + x]! < dark) n++;
    if (n >= minRun) rows.push(y);
  }
  // One line is a few consecutive rows: keep the middle of each run.
  const lines: number[] = [];
  let start = rows[0];
  for (let i = 1; i <= rows.length; i++) {
    if (i === rows.length || rows[i]! !== rows[i - 1]! + 1) {
      lines.push((start! + rows[i - 1]!) / 2);
      start = rows[i];
    }
  }
  return rows.length ? lines : [];
}

/** The strip's line-number labels: same x as the "1" before "finished", top to bottom. */
function stripNumbers(w: Word[]): Word[] {
  const i = w.findIndex((x) => x.text === 'finished');
  const one = w[i - 1]!;
  expect(one.text).toBe('1');
  const names = new Set(['finished', 'cuff', 'inner', 'CUT']);
  return w.filter((x, j) => /^[1-4]$/.test(x.text) && Math.abs(x.xMin - one.xMin) < 0.5 && names.has(w[j + 1]?.text ?? '')).sort((a, b) => a.yMin - b.yMin);
}

describe('the leg drawing', () => {
  let g: Gray;
  let w: Word[];
  beforeAll(async () => {
    const file = pdfFile(await renderCutSheet(sheet([cuffInch])));
    g = gray(file, 100);
    w = words(file);
  });

  it('is there: a filled, non-blank leg above its scale caption', () => {
    const cap = w.find((x) => x.text === 'Scale')!;
    const px = (pt: number) => Math.round((pt * g.dpi) / 72);
    let inked = 0;
    let total = 0;
    for (let y = px(cap.yMin - 100); y < px(cap.yMin - 4); y++)
      for (let x = px(cap.xMin); x < px(cap.xMin + 120); x++, total++) if (g.px[y * g.width + x]! < 245) inked++;
    expect(inked / total).toBeGreaterThan(0.3);
  });

  it('draws the four chalk lines to the scale it states', () => {
    // Plan (TRADE.md): lines 1 1/2 in apart for a 1 1/2 in cuff; on paper 1.5 in ÷ scale.
    const capIdx = w.findIndex((x) => x.text === 'Scale');
    const cap = w[capIdx]!;
    const scale = Number(/1:(\d+)/.exec(w[capIdx + 1]!.text)?.[1]);
    expect(scale).toBeGreaterThanOrEqual(2);
    // The drawing's own labels: "1", "2", "3", "4 CUT" to the right of the leg, above the caption.
    const labels = w.filter((x) => /^[1-4]$/.test(x.text) && x.xMin > cap.xMin + 60 && x.xMin < cap.xMin + 165 && x.yMax < cap.yMin && x.yMin > cap.yMin - 140);
    expect(labels.map((x) => x.text)).toEqual(['1', '2', '3', '4']);
    const px = (pt: number) => Math.round((pt * g.dpi) / 72);
    // Down to just past the cut line's label middle: the raw edge, 1/2 in below, stays out even at 1:10.
    const box = { x0: px(cap.xMin + 5), x1: px(labels[0]!.xMin - 4), y0: px(labels[0]!.yMin - 2), y1: px((labels[3]!.yMin + labels[3]!.yMax) / 2 + 3) };
    const lines = horizontalLines(g, box, 120, Math.round((box.x1 - box.x0) * 0.5));
    expect(lines).toHaveLength(4);
    const step = (1.5 / scale) * g.dpi;
    for (let i = 1; i < 4; i++) expect(Math.abs(lines[i]! - lines[i - 1]! - step)).toBeLessThan(1.5);
  });
});

describe('the chalk guide is full size', () => {
  /** The check ruler's tick centres (px) on a 300 dpi raster, found from its numbers: the row just under its edge with the most ticks. */
  async function rulerTicks(order: Parameters<typeof buildCutSheet>[1], numbers: string[]): Promise<{ ticks: number[]; dpi: number }> {
    const file = pdfFile(await renderCutSheet(buildCutSheet(UNSAVED, order)));
    const g = gray(file, 300);
    const w = words(file);
    // The ruler's numbers stand in one row, in order, below the check sentence's "ruler".
    const said = w.find((x) => x.text === 'ruler')!;
    const row = w.filter((x) => x.yMin < said.yMin && x.xMin > said.xMin - 160 && numbers.includes(x.text));
    const zero = row.find((x) => x.text === '0')!;
    const inRow = row.filter((x) => Math.abs(x.yMin - zero.yMin) < 1).sort((p, q) => p.xMin - q.xMin);
    expect(inRow.map((x) => x.text)).toEqual(numbers);
    const px = (pt: number) => Math.round((pt * g.dpi) / 72);
    const x0 = px(inRow[0]!.xMin - 8);
    const x1 = px(inRow.at(-1)!.xMax + 8);
    let best: number[] = [];
    for (let y = px(zero.yMin - 14); y < px(zero.yMin); y++) {
      const centres: number[] = [];
      for (let x = x0; x < x1; x++) {
        if (g.px[y * g.width + x]! >= 100) continue;
        const s0 = x;
        while (x < x1 && g.px[y * g.width + x]! < 100) x++;
        centres.push((s0 + x - 1) / 2);
      }
      if (centres.length > best.length) best = centres;
    }
    return { ticks: best, dpi: g.dpi };
  }

  it('prints a 2 in check ruler by eighths at its true size', async () => {
    // 72 pt to the inch: at 300 dpi, 1/8 in = 37.5 px and 2 in = 600 px (TRADE.md, NBS 1959).
    const { ticks } = await rulerTicks([cuffInch], ['0', '1', '2']);
    expect(ticks).toHaveLength(17);
    expect(Math.abs(ticks.at(-1)! - ticks[0]! - 600)).toBeLessThanOrEqual(2);
    for (let i = 1; i < ticks.length; i++) expect(Math.abs(ticks[i]! - ticks[i - 1]! - 37.5)).toBeLessThanOrEqual(1.5);
  });

  it('prints a 50 mm check ruler by millimetres at its true size on a metric sheet', async () => {
    // 1 in = 25.4 mm exactly (TRADE.md, NBS 1959): at 300 dpi, 1 mm = 11.81 px and 50 mm = 590.6 px.
    const { ticks } = await rulerTicks([cuffMetric], ['0', '10', '20', '30', '40', '50']);
    expect(ticks).toHaveLength(51);
    expect(Math.abs(ticks.at(-1)! - ticks[0]! - (50 / 25.4) * 300)).toBeLessThanOrEqual(2);
    for (let i = 1; i < ticks.length; i++) expect(Math.abs(ticks[i]! - ticks[i - 1]! - 300 / 25.4)).toBeLessThanOrEqual(1.5);
  });

  it('spaces the strip lines as planned, in points: 1 1/2 in cuff → 108, 216, 324 pt', async () => {
    // TRADE.md: lines at 0, 1 1/2, 3 and 4 1/2 in below the mark; 72 pt to the inch.
    const nums = stripNumbers(words(pdfFile(await renderCutSheet(sheet([cuffInch])))));
    expect(nums.map((x) => x.text)).toEqual(['1', '2', '3', '4']);
    const gaps = nums.map((x) => x.yMin - nums[0]!.yMin);
    [0, 108, 216, 324].forEach((pt, i) => expect(gaps[i]).toBeCloseTo(pt, 1));
  });

  it('spaces a 40 mm cuff at 40, 80 and 120 mm in points', async () => {
    // TRADE.md: three cuff depths; 25.4 mm to the inch.
    const nums = stripNumbers(words(pdfFile(await renderCutSheet(buildCutSheet(UNSAVED, [cuffMetric])))));
    const gaps = nums.map((x) => x.yMin - nums[0]!.yMin);
    [0, 40, 80, 120].forEach((mm, i) => expect(gaps[i]).toBeCloseTo(mm * MM, 1));
  });
});
