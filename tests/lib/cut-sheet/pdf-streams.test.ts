// Streams compressed by the fast path: every one marked, complete and readable.
import { describe, expect, it } from 'vitest';
import { keepStreamText } from '@/lib/server/pdf-platform/pdf-streams';
import { renderCutSheet, renderCutSheets } from '@/lib/server/cut-sheet/render';
import { comparable, pdfObjects } from './pdf-objects';
import { flatText, pdfFile } from './poppler';
import { busyLegs, cuffInch, cuffMetric, hemSloped, sheet } from './sheets';

describe('PDF streams', () => {
  it('writes every stream compressed and readable, and poppler reads the pages', async () => {
    const pdf = await renderCutSheets([sheet([cuffMetric]), sheet(busyLegs, { ticket: '1044' })]);
    const streams = pdfObjects(pdf).filter((o) => o.stream);
    expect(streams.length).toBeGreaterThan(5);
    for (const o of streams) {
      expect(o.dict).toContain('/Filter /FlateDecode');
      expect(o.stream!.length).toBeGreaterThan(0);
    }
    const text = flatText(pdfFile(pdf));
    expect(text).toContain('Ticket 1042');
    expect(text).toContain('Ticket 1044');
  });

  it('writes the same streams whether commands are kept as text until the end or turned into bytes one by one', async () => {
    const sheets = [sheet([cuffInch]), sheet([cuffMetric]), sheet(busyLegs, { ticket: '1044' }), sheet([hemSloped], { garment: 'Crêpe trousers' })];
    const kept = [];
    for (const d of sheets) kept.push(comparable(await renderCutSheet(d)));
    keepStreamText(false);
    try {
      for (let i = 0; i < sheets.length; i++) expect(kept[i]).toEqual(comparable(await renderCutSheet(sheets[i]!)));
    } finally {
      keepStreamText(true);
    }
  });
});
