// A let-down pair's width measured at the cutting line, on the printed sheet: the taper note says
// which width was measured and works from it. Base leg: TRADE.md's tapered example (7 in flat at the
// edge, 8 in higher up: Fit For A Queen 2012); the let-down figures are arithmetic on it.
import { describe, expect, it } from 'vitest';
import { buildCutSheet, type LegOrder } from '@/lib/server/cut-sheet/build';
import { sheetContent } from '@/lib/server/cut-sheet/content';

const HEADER = { shop: 'Invented Alterations', ticket: '8', garment: 'Fawn twill trousers', due: null, assignee: null, existingFinish: 'plain-hem' as const };

function sheet(order: Omit<LegOrder, 'side'>) {
  return sheetContent(buildCutSheet(HEADER, [{ side: 'left', ...order } as LegOrder]));
}

describe('cut sheet: a let-down cuff measured at the cutting line', () => {
  // 1 1/2 in cuff, old fold 3 in below the mark, 7 3/8 in measured at the cut: the cuff top is
  // 7 1/16 in, so 5/16 in comes in at line 4, where followed down 1/4 in would go out.
  const c = sheet({
    finish: 'cuff',
    input: { unit: 'in', precision: 16, cuffDepth: '1 1/2', oldCrease: '3' },
    taper: { widthAtEdge: '7', widthAbove: '8', heightAbove: '24', widthAtCut: '7 3/8' },
  });

  it('says the width at the cut was measured, and takes in from it', () => {
    const taper = c.groups[0]!.taper!;
    expect(taper.summary).toContain('Width at the cutting line measured on the let-down leg: 7 3/8 in flat (not followed down from the taper).');
    expect(taper.rows.map((r) => r.width)).toEqual(['7 in', '6 15/16 in', '6 7/8 in', '7 3/8 in (measured)']);
    expect(taper.work).toContain('take in 5/16 in at line 4');
  });

  it('follows the taper down when nothing was measured at the cut', () => {
    const followed = sheet({
      finish: 'cuff',
      input: { unit: 'in', precision: 16, cuffDepth: '1 1/2', oldCrease: '3' },
      taper: { widthAtEdge: '7', widthAbove: '8', heightAbove: '24' },
    });
    expect(followed.groups[0]!.taper!.summary).not.toContain('measured');
    expect(followed.groups[0]!.taper!.work).toContain('let out 1/4 in at line 4');
  });
});

describe('cut sheet: a let-down plain hem measured at the cutting line', () => {
  const hem = (widthAtCut: string) =>
    sheet({ finish: 'hem', input: { unit: 'in', precision: 8 }, taper: { widthAtEdge: '7', widthAbove: '8', heightAbove: '12', widthAtCut } });

  it('an old hem flared to 7 1/8 in at the cut lies flat under a 1 1/2 in hem: no seam work, and the measured width said', () => {
    const c = hem('7 1/8');
    const taper = c.groups[0]!.taper!;
    expect(taper.summary).toBe(
      'Taper within tolerance: the hem lies flat, no seam work needed. Width at the cutting line measured on the let-down leg: 7 1/8 in flat (not followed down from the taper).',
    );
    expect(taper.work).toBeNull();
    expect(c.steps[0]!.items.join(' ')).not.toMatch(/unpick both leg seams/);
  });

  it('flared past the leg above (7 1/2 in): the seams come in, never "flare out"', () => {
    const c = hem('7 1/2');
    const taper = c.groups[0]!.taper!;
    expect(taper.summary).toContain('take the seams in below the finished edge to it at the cutting line');
    expect(taper.work).toContain('take in 3/8 in at line 2');
    const step = c.steps[0]!.items.find((i) => /unpick both leg seams below the finished edge/.test(i))!;
    expect(step).toContain('re-stitch them on the new line to the cutting line');
    expect(step).not.toContain('flaring out');
  });
});
