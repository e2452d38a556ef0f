// Unwashed cloth on a plain hem: the shrink lines as the sheet and the garment page print them. The
// rule is derived (a length shrinking by p ends at L when made L/(1 − p): edge L·p/(1 − p) below the
// mark, hem H/(1 − p); docs/KINDS.md). Each figure is rounded to whole steps down the leg (never
// short) and the sums are made of the printed figures, so they add up as printed.
import { describe, expect, it } from 'vitest';
import { create, all } from 'mathjs';
import { shrinkNoteOf } from '@/lib/shared/fitting/shrink-note';
import { buildCutSheet } from '@/lib/server/cut-sheet/build';
import { sheetContent } from '@/lib/server/cut-sheet/content';
import { savedLegOrder, type StoredLeg } from '@/lib/server/fitting/saved-leg';

const math = create(all!, { number: 'Fraction' });
// The exact allowance and unwashed hem in eighths/sixteenths, by mathjs's fractions (a cross-check of the hand figures below).
const inSteps = (x: string, per: number) => Number(math.evaluate(`ceil((${x}) * ${per})`));

// Invented leg: a 30 in inseam pinned at 31 1/2 in, 1 1/2 in hem (the engine's default too).
const rawDenim = { backPin: '31 1/2', hemAllowance: '1 1/2', shrinkCloth: 'raw-denim', lengthToMark: '30' };

// "a + b = c" as printed, read back and added in the sheet's steps: the sum holds on the page.
function addsUp(a: string, b: string, c: string, per: number) {
  const steps = (s: string) => Number(math.evaluate(`(${s.replace(/ in$/, '').replace(/(\d+) (\d+\/\d+)/, '$1 + $2')}) * ${per}`));
  expect(steps(a) + steps(b)).toBe(steps(c));
}

describe('shrinkNoteOf (raw denim, 10 %: SHRINKAGE_PERCENT, from memory: the top of the 7–10 % range)', () => {
  it('at eighths: edge 30·0.1/0.9 = 3 1/3 in → 3 3/8 (up), hem 1 1/2/0.9 = 1 2/3 → 1 3/4 (up); 31 1/2 + 3 3/8 = 34 7/8; + 1 3/4 = 36 5/8', () => {
    // By hand from the derived rule; mathjs (fractions) agrees on the step counts: 27 and 14 eighths.
    expect(inSteps('30 * 1/10 / (9/10)', 8)).toBe(27);
    expect(inSteps('3/2 / (9/10)', 8)).toBe(14);
    const note = shrinkNoteOf(rawDenim, 'plain', 'in', 8)!;
    expect(note).toMatchObject({ code: 'shrink', cloth: 'raw-denim', percent: '10', length: '30 in' });
    expect(note).toMatchObject({ allowance: '3 3/8 in', hem: '1 3/4 in', pin: '31 1/2 in', edge: '34 7/8 in', cut: '36 5/8 in', cutBelow: '5 1/8 in' });
    expect(note.source).toMatch(/^from memory: raw/);
    addsUp(note.pin, note.allowance, note.edge, 8);
    addsUp(note.edge, note.hem, note.cut, 8);
    addsUp(note.allowance, note.hem, note.cutBelow, 8);
  });

  it('at sixteenths: 3 1/3 → 3 3/8 (54/16), 1 2/3 → 1 11/16 (27/16); edge 34 7/8, cut 36 9/16', () => {
    // By hand: 53.33 sixteenths up to 54, 26.67 up to 27; mathjs agrees.
    expect(inSteps('30 * 1/10 / (9/10)', 16)).toBe(54);
    expect(inSteps('3/2 / (9/10)', 16)).toBe(27);
    const note = shrinkNoteOf(rawDenim, 'slope', 'in', 16)!;
    expect(note).toMatchObject({ allowance: '3 3/8 in', hem: '1 11/16 in', edge: '34 7/8 in', cut: '36 9/16 in' });
    addsUp(note.edge, note.hem, note.cut, 16);
  });

  it('in mm (0.5 mm steps): 760 mm → edge 84.44 → 84.5 mm, hem 40 → 44.44 → 44.5 mm; 800 + 84.5 = 884.5; + 44.5 = 929 mm', () => {
    // By hand: 760 × 0.1/0.9 = 84.44…; 40/0.9 = 44.44…; each up to the next half millimetre.
    const note = shrinkNoteOf({ backPin: '800', hemAllowance: '40', shrinkCloth: 'raw-denim', lengthToMark: '760' }, 'plain', 'mm', 8)!;
    expect(note).toMatchObject({ allowance: '84.5 mm', hem: '44.5 mm', edge: '884.5 mm', cut: '929 mm', cutBelow: '129 mm' });
  });

  it('adds no step to an exact figure: unwashed cotton 5 % over 19 in is 19·0.05/0.95 = 1 in exactly (not 1 1/8)', () => {
    // By hand: 0.95/0.95 = 1; hem 1.5/0.95 = 1.5789 → 1 5/8.
    const note = shrinkNoteOf({ hemAllowance: '1 1/2', shrinkCloth: 'unwashed-cotton', lengthToMark: '19' }, 'plain', 'in', 8)!;
    expect(note).toMatchObject({ percent: '5', allowance: '1 in', hem: '1 5/8 in', pin: '', edge: '1 in', cut: '2 5/8 in' });
  });

  it('takes the back pin as the length that shrinks when none is typed, and the shop’s own percent only with “other”', () => {
    // By hand: 31 1/2 × 0.06/0.94 = 2.0106 in → 17 eighths up = 2 1/8 in.
    const own = shrinkNoteOf({ backPin: '31 1/2', shrinkCloth: 'other', shrinkPercent: '6' }, 'plain', 'in', 8)!;
    expect(own).toMatchObject({ percent: '6', source: "the shop's own figure", length: '31 1/2 in', allowance: '2 1/8 in' });
    expect(shrinkNoteOf({ ...rawDenim, shrinkPercent: '6' }, 'plain', 'in', 8)?.percent).toBe('10');
    expect(shrinkNoteOf({ backPin: '31 1/2', shrinkCloth: 'other' }, 'plain', 'in', 8)).toBeNull();
  });

  it('says no shrinkage for prewashed cloth, and nothing on a cuff, a kept factory hem, or with no cloth chosen', () => {
    expect(shrinkNoteOf({ ...rawDenim, shrinkCloth: 'prewashed' }, 'plain', 'in', 8)?.code).toBe('none');
    expect(shrinkNoteOf(rawDenim, 'cuff', 'in', 8)).toBeNull();
    expect(shrinkNoteOf(rawDenim, 'original', 'in', 8)).toBeNull();
    expect(shrinkNoteOf({ ...rawDenim, shrinkCloth: '' }, 'plain', 'in', 8)).toBeNull();
  });
});

describe('the shrink lines on the sheet', () => {
  const leg: StoredLeg = {
    leg: 'left',
    unit: 'in',
    finish: 'plain',
    values: Object.fromEntries(Object.entries(rawDenim).map(([k, text]) => [k, { text }])),
  };
  const lines = (language: 'en' | 'fr') =>
    sheetContent(buildCutSheet({ shop: null, ticket: null, garment: null, due: null, assignee: null, language }, [savedLegOrder(leg, 'in', 8)!])).groups[0]!
      .shrink;

  it('prints the cloth, percent and source, the two sums as printed, and the hot-wash caution', () => {
    const en = lines('en')!;
    expect(en[0]).toContain('Unwashed cloth: Raw denim, 10% shrinkage in length expected at the first wash (source: from memory: raw');
    expect(en[1]).toBe('Pin mark 31 1/2 in + shrink allowance 3 3/8 in = finished edge (line 1) chalked at 34 7/8 in.');
    expect(en[2]).toBe('Finished edge 34 7/8 in + unwashed hem allowance 1 3/4 in = cut (line 2) at 36 5/8 in, 5 1/8 in below the pin mark.');
    expect(en[3]).toMatch(/hot wash or the dryer/);
  });

  it('prints the same figures in French', () => {
    const fr = lines('fr')!;
    expect(fr[1]).toBe('Repère d’épingle 31 1/2 in + réserve de retrait 3 3/8 in = bord fini (ligne 1) tracé à 34 7/8 in.');
    expect(fr[2]).toBe('Bord fini 34 7/8 in + réserve d’ourlet avant lavage 1 3/4 in = coupe (ligne 2) à 36 5/8 in, 5 1/8 in sous le repère.');
    expect(fr[3]).toMatch(/lavage chaud ou le sèche-linge/);
  });
});
