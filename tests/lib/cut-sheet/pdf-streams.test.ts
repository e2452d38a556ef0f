// Streams compressed by the fast path: every one marked, complete and readable.
import { describe, expect, it } from 'vitest';
import { renderCutSheets } from '@/lib/cut-sheet/render';
import { pdfObjects } from './pdf-objects';
import { flatText, pdfFile } from './poppler';
import { busyLegs, cuffMetric, sheet } from './sheets';

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
});
