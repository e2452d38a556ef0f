// The cut sheet's trade advice in words: what the engine's plans become on paper.
import { describe, expect, it } from 'vitest';
import { buildCutSheet, type LegOrder } from '@/lib/cut-sheet/build';
import { sheetContent } from '@/lib/cut-sheet/content';

const HEADER = { shop: 'Invented Alterations', ticket: '7', garment: 'Grey flannel trousers', due: null, assignee: null };

/** The sheet's words for one order standing for both legs. */
function sheet(order: Omit<LegOrder, 'side'>) {
  return sheetContent(buildCutSheet(HEADER, [{ side: 'left', ...order } as LegOrder]));
}

describe('cut sheet: cloth options', () => {
  it("offers the customer's cuff depth on a shorter third section before a shallower cuff (arithmetic: 4 1/4 in − 3 in)", () => {
    const c = sheet({ finish: 'cuff', input: { unit: 'in', cuffDepth: '1 1/2', available: '4 1/4' } });
    const options = c.groups[0]!.cloth.options;
    expect(options[0]).toBe('Keep the 1 1/2 in cuff with a shorter third section: 1 1/4 in fits.');
    expect(options[1]).toMatch(/^A shallower cuff: 1 3\/8 in deep fits\.$/);
  });
});
