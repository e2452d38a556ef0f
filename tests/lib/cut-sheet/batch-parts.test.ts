// A big batch is laid out and drawn in parts (BATCH_PART sheets at a time) into one PDF streamed as
// it goes: the parts must make exactly the document the batch made in one piece, object for
// object (pages, fonts subset once over the whole batch, the skipped page last), and the stream
// must hand bytes on before the last part is drawn.
import { describe, expect, it } from 'vitest';
import { renderCutSheets, streamCutSheets } from '@/lib/server/cut-sheet/render';
import { comparable } from './pdf-objects';
import { flatText, pageInfo, pdfFile } from './poppler';
import { busyLegs, cuffInch, cuffMetric, hemSloped, sheet } from './sheets';

// Seven garments, two overfull (each spills onto a second page), one with non-Latin free text.
const list = [
  sheet([cuffInch], { ticket: '4001' }),
  { ...sheet(busyLegs, { ticket: '4002' }), pageSize: 'LETTER' as const, existingFinish: 'cuff' as const },
  sheet([cuffMetric], { ticket: '4003' }),
  sheet([hemSloped], { ticket: '4004', garment: 'Grey flannel (Ελένη)' }),
  sheet([cuffInch], { ticket: '4005' }),
  { ...sheet(busyLegs, { ticket: '4006' }), pageSize: 'LETTER' as const, existingFinish: 'cuff' as const },
  sheet([cuffMetric], { ticket: '4007' }),
];
const skipped = ['PH 4010 Unfitted pair: no fitting measurements yet'];

describe('a batch drawn in parts', () => {
  it('comes out object for object as the batch drawn in one part', async () => {
    const whole = await renderCutSheets(list, skipped, 1000);
    for (const part of [1, 2, 3]) expect(comparable(await renderCutSheets(list, skipped, part))).toEqual(comparable(whole));
  });

  it('has every garment on its pages in order, the overfull ones on two, and the skipped ones named last', async () => {
    const file = pdfFile(await renderCutSheets(list, skipped, 2));
    expect(pageInfo(file).pages).toBe(list.length + 2 + 1);
    const tickets = [1, 2, 4, 5, 6, 7, 9].map((p) => /Ticket (\d+)/.exec(flatText(file, p))?.[1]);
    expect(tickets).toEqual(['4001', '4002', '4003', '4004', '4005', '4006', '4007']);
    expect(flatText(file, 3)).toContain('AT THE BENCH');
    expect(flatText(file, 10)).toContain('Not in this batch');
    expect(flatText(file, 10)).toContain('PH 4010 Unfitted pair');
  });

  it('hands on bytes part by part, not all at the end', async () => {
    const pieces: Buffer[] = [];
    for await (const piece of streamCutSheets(list, skipped, 2)) pieces.push(piece);
    // Four parts: each but the first sends the pages before it; the end sends the last and the fonts.
    expect(pieces.length).toBeGreaterThanOrEqual(4);
    expect(pieces[0]!.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(pieces.at(-1)!.toString('latin1').trimEnd().endsWith('%%EOF')).toBe(true);
  });
});
