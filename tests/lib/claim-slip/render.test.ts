// The claim slip read back with poppler: an A6 page carrying the ticket number, the customer,
// the garments, the due date, each line and the money, in the shop's currency; its dates in the
// screens' style ("Tue 8 Dec", never ISO); tear-off garment tags; 1–3 slips and 0–3 tags each.
import { describe, expect, it } from 'vitest';
import { renderClaimSlip } from '@/lib/server/claim-slip/render';
import { dueText } from '@/lib/shared/due-date';
import { flatText, layoutText, pageInfo, pdfFile } from '../cut-sheet/poppler';
import { SLIP } from './slip';

describe('claim slip', () => {
  it('is one A6 page (105 × 148 mm = 297.64 × 419.53 pt at 72 pt to 25.4 mm)', async () => {
    const info = pageInfo(pdfFile(await renderClaimSlip(SLIP, { slips: 1, tags: 0 })));
    expect(info.pages).toBe(1);
    expect(info.width).toBeCloseTo(297.64, 1);
    expect(info.height).toBeCloseTo(419.53, 1);
  });

  it('carries the ticket number, customer, garments, due date and every amount', async () => {
    const file = pdfFile(await renderClaimSlip(SLIP));
    const text = flatText(file);
    for (const words of ['PH 1007', 'Perrin Loame', '1. Charcoal flannel', '2. Brown moleskin', 'Hours: Tue–Fri 9:00–18:00']) {
      expect(text).toContain(words);
    }
    const rows = layoutText(file);
    expect(rows).toMatch(/Cuff from a plain hem\s+€24\.00/);
    expect(rows).toMatch(/Regular customer \(second pair\)\s+-€4\.00/);
    expect(rows).toMatch(/Total\s+€20\.00/);
    expect(rows).toMatch(/Paid\s+€5\.00/);
    expect(rows).toMatch(/Balance due\s+€15\.00/);
  });

  it('says the shop will let the customer know when no date is set', async () => {
    const text = flatText(pdfFile(await renderClaimSlip({ ...SLIP, dueOn: null })), 1);
    expect(text).toContain('Ready by we will let you know');
  });

  it('prints its dates the way every screen does ("Tue 8 Dec", dueText), never as ISO dates', async () => {
    // 1 and 8 December 2026 are Tuesdays (calendar; the shop's date style from src/lib/shared/due-date.ts).
    const text = flatText(pdfFile(await renderClaimSlip(SLIP)));
    expect(text).toContain('Received Tue 1 Dec');
    expect(text).toContain('Ready by Tue 8 Dec');
    expect(text).toContain(`Ready by ${dueText('2026-12-08')}`);
    expect(text).not.toMatch(/\d{4}-\d{2}-\d{2}/);
  });

  it('adds a tear-off tag per garment with the ticket number, the garment and the due date', async () => {
    const file = pdfFile(await renderClaimSlip(SLIP));
    expect(pageInfo(file).pages).toBe(2);
    const tags = flatText(file, 2);
    // pdftotext may read a tag's corner note before or after its lines: each part is checked.
    expect(tags.match(/PH 1007/g)).toHaveLength(2);
    for (const words of ['Garment 1 of 2', 'Garment 2 of 2', 'Charcoal flannel Ready by Tue 8 Dec', 'Brown moleskin Ready by Tue 8 Dec'])
      expect(tags).toContain(words);
    expect(tags).not.toContain('Balance due');
  });

  it('prints the copies asked for: 3 slips and 3 tags for each of 2 garments is 3 + 2 pages (4 tags a page)', async () => {
    const file = pdfFile(await renderClaimSlip(SLIP, { slips: 3, tags: 3 }));
    expect(pageInfo(file).pages).toBe(5);
    for (const page of [1, 2, 3]) expect(flatText(file, page)).toContain('CLAIM SLIP');
    const tagText = flatText(file, 4) + flatText(file, 5);
    expect(tagText.match(/Charcoal flannel/g)).toHaveLength(3);
    expect(tagText.match(/Brown moleskin/g)).toHaveLength(3);
    expect(pageInfo(pdfFile(await renderClaimSlip(SLIP, { slips: 2, tags: 0 }))).pages).toBe(2);
  });
});
