// The cut sheet's trade advice in words: what the engine's plans become on paper.
import { describe, expect, it } from 'vitest';
import { buildCutSheet, type LegOrder } from '@/lib/server/cut-sheet/build';
import { sheetContent } from '@/lib/server/cut-sheet/content';

const HEADER = { shop: 'Invented Alterations', ticket: '7', garment: 'Grey flannel trousers', due: null, assignee: null };

/** The sheet's words for one order standing for both legs. */
function sheet(order: Omit<LegOrder, 'side'>) {
  return sheetContent(buildCutSheet(HEADER, [{ side: 'left', ...order } as LegOrder]));
}

describe('cut sheet: cloth options', () => {
  it("offers the customer's cuff depth on a shorter third section before a shallower cuff (arithmetic: 4 1/4 in − 3 in)", () => {
    const c = sheet({ finish: 'cuff', input: { unit: 'in', cuffDepth: '1 1/2', available: '4 1/4' } });
    const options = c.groups[0]!.cloth.options;
    expect(options[0]).toBe('Same cuff, third section 1 1/4 in: fits.');
    expect(options[1]).toMatch(/^A shallower cuff: 1 3\/8 in deep fits\.$/);
  });
});

describe('cut sheet: the taper work', () => {
  // 7 in flat at the edge, 8 in 24 in up, 1½ in cuff: ¼ in to let out at the cut (TRADE.md: Fit For A Queen 2012)
  const tapered = sheet({ finish: 'cuff', input: { unit: 'in', cuffDepth: '1 1/2' }, taper: { widthAtEdge: '7', widthAbove: '8', heightAbove: '24' } });

  it('names where the let-out starts by its distance from the finished edge, not "the cuff top" (TRADE.md fold plan)', () => {
    const taper = tapered.groups[0]!.taper!;
    expect(taper.summary).toContain('keep the width 1 1/2 in above the finished edge (7 1/16 in flat) straight down to the cutting line');
    const warnings = tapered.groups[0]!.warnings.join(' ');
    expect(warnings).not.toMatch(/from the cuff top/);
  });

  it('says unpick, re-stitch on the new line and press the seam open, before cutting, with the iron caution deferring to the shop (TRADE.md cautions)', () => {
    const items = tapered.steps[0]!.items;
    const step = items.findIndex((i) => /unpick both leg seams/.test(i));
    expect(step).toBeGreaterThan(0);
    expect(items[step]).toContain('Before cutting, unpick both leg seams from 1 1/2 in above the finished edge to the cut line');
    expect(items[step]).toMatch(/re-stitch straight down \(taper note\), press open/);
    expect(items[step]).toMatch(/hot iron: your shop's way/);
    expect(step).toBeLessThan(items.findIndex((i) => i.startsWith('Cut on line 4')));
    expect(items.join(' ')).not.toMatch(/^Re-chalk/m);
  });
});

describe('cut sheet: stitch lengths', () => {
  it('on an inch sheet in stitches per inch with mm beside; on a metric sheet in mm (TRADE.md: 2.5–3 mm = 8–10 per inch; 4 mm ≈ 6, 2 mm ≈ 13 per inch by 25.4 mm/in)', () => {
    const inch = sheet({ finish: 'cuff', input: { unit: 'in', cuffDepth: '1 1/2' } }).steps[0]!.items.join(' ');
    expect(inch).toContain('long stitch (about 6 per inch, 4 mm)');
    expect(inch).toContain('short stitch (about 13 per inch, 2 mm)');
    const hem = sheet({ finish: 'hem', input: { unit: 'in' } }).steps[0]!.items.join(' ');
    expect(hem).toContain('standard stitch (8–10 per inch, 2.5–3 mm)');
    const metric = sheet({ finish: 'hem', input: { unit: 'mm' } }).steps[0]!.items.join(' ');
    expect(metric).toContain('standard stitch (about 2.5–3 mm)');
    expect(metric).not.toContain('per inch');
  });
});

describe('cut sheet: a plain hem on a tapered leg', () => {
  // 7 in flat at the edge, 8 in 12 in up, 1½ in hem: the hem's top lies against 7 1/8 in of leg, the cut
  // is 6 7/8 in: let out 1/4 in at the cut (arithmetic on the mirror rule; TRADE.md: Fit For A Queen 2012)
  const c = sheet({ finish: 'hem', input: { unit: 'in', precision: 8 }, taper: { widthAtEdge: '7', widthAbove: '8', heightAbove: '12' } });

  it('gets a taper check, so the hem turned up lies flat', () => {
    const taper = c.groups[0]!.taper!;
    expect(taper.summary).toContain('the hem must match the leg 1 1/2 in above the edge (7 1/8 in flat)');
    expect(taper.work).toContain('let out 1/4 in at line 2');
    expect(taper.rows.map((r) => r.work)).toEqual(['as it is', 'let out 1/4 in at each seam (1/8 in each side)']);
    const items = c.steps[0]!.items;
    const step = items.findIndex((i) => /unpick both leg seams below the finished edge/.test(i));
    expect(step).toBeGreaterThan(0);
    expect(step).toBeLessThan(items.findIndex((i) => i.startsWith('Cut on line 2')));
  });
});
