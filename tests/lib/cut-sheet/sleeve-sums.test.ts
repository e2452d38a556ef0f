// A sleeve's cut sheet adds up as printed: every figure read back from the sheet's words is a whole
// number of display steps, and new edge − hem depth = cut, now + move = new centre, new centre − the
// shortening = height above the new edge, vent now − shortening = vent after, vent after − top button
// − margin = room, lining = shortening + fold change − pleat change; and each is rounded to the side
// that keeps cloth (never shorter, never cut higher, never more lining off than the exact figures).
// Properties over the sleeve sheet's words (the strings the PDF prints); examples name their sources.
import fc from 'fast-check';
import { unit as mathUnit } from 'mathjs';
import convert from 'convert-units';
import { describe, expect, it } from 'vitest';
import { parseLength, shortenSleeve, type SleeveInput } from '@/lib/allowance';
import type { Unit } from '@/lib/allowance/types';
import { translator } from '@/lib/server/i18n/catalog';
import { type SleeveBlockWords, sleeveSheetContent } from '@/lib/server/cut-sheet/kinds/sleeve-sheet';

const EN = translator('en');

/** The sleeve sheet's words for an engine input: its block, its steps, its strip, and the engine's plan (throws what the engine refuses). */
function sheetWords(input: SleeveInput) {
  const fit = { input, plan: shortenSleeve(input) };
  const k = sleeveSheetContent({ kind: 'sleeves', plan: fit }, EN, fit.plan.unit, fit.plan.precision);
  return { ...(k.block as SleeveBlockWords), steps: k.steps, strip: k.guide[0]!, plan: fit.plan };
}

const scale = fc.constantFrom<[Unit, 8 | 16]>(['in', 8], ['in', 16], ['cm', 8], ['mm', 8]);

// Typed in mm or inches whatever the sheet's unit (a fitting in one unit printed in another).
const length = (inchSixtyFourths: [number, number], mmTenths: [number, number]) =>
  fc.oneof(
    fc.integer({ min: inchSixtyFourths[0], max: inchSixtyFourths[1] }).map((k) => `${k}/64 in`),
    fc.integer({ min: mmTenths[0], max: mmTenths[1] }).map((k) => `${k / 10} mm`),
  );

const opt = <T>(a: fc.Arbitrary<T>) => fc.option(a, { nil: undefined });

const sleeve = fc.record({
  scale,
  shortenBy: length([4, 384], [10, 1000]),
  buttonholes: fc.constantFrom<SleeveInput['buttonholes']>('none', 'decorative', 'working'),
  buttons: opt(fc.integer({ min: 0, max: 5 })),
  bottomButtonAboveEdge: opt(length([32, 160], [80, 400])),
  buttonSpacing: opt(length([24, 64], [60, 160])),
  ventLength: opt(length([128, 512], [300, 1300])),
  hemDepth: opt(length([32, 160], [80, 400])),
  liningFoldNow: opt(length([0, 96], [0, 250])),
  liningPleatNow: opt(length([0, 96], [0, 250])),
  liningFoldAboveEdge: opt(length([0, 96], [0, 250])),
  liningEasePleat: opt(length([0, 96], [0, 250])),
  workingButtonholeSlack: opt(length([0, 64], [0, 160])),
});

type Order = typeof sleeve extends fc.Arbitrary<infer T> ? T : never;

function input(o: Order): SleeveInput {
  const [unit, precision] = o.scale;
  const { scale: _s, ...rest } = o;
  return Object.fromEntries(Object.entries({ unit, precision, ...rest }).filter(([, v]) => v !== undefined)) as unknown as SleeveInput;
}

/** The display step of a sheet in mm (1/8 or 1/16 in; 0.5 mm for cm and mm). */
const stepMm = (unit: Unit, precision: number) => (unit === 'in' ? 25.4 / precision : 0.5);

/** A printed length read back as a whole number of steps (fails when it is not one). */
function steps(text: string, unit: Unit, step: number): number {
  const n = parseLength(text.replace(/^-/, ''), unit).mm / step;
  expect(Math.abs(n - Math.round(n)), `${text} is a whole number of steps`).toBeLessThan(1e-6);
  return Math.round(n) * (text.startsWith('-') ? -1 : 1);
}

// A typed length in mm, as the engine reads it.
const mmOf = (typed: string | undefined, fallbackMm: number) => (typed === undefined ? fallbackMm : parseLength(typed, typed.endsWith('mm') ? 'mm' : 'in').mm);

describe('a sleeve adds up as printed', () => {
  it('every figure in whole steps; the cut, buttons, vent and lining sums hold; each rounded to keep cloth', () => {
    const seen = { sheets: 0, cuff: 0, shoulder: 0, tooShort: 0 };
    fc.assert(
      fc.property(sleeve, (o) => {
        const typed = input(o);
        let c: ReturnType<typeof sheetWords>;
        try {
          c = sheetWords(typed);
        } catch {
          return; // the engine refused it (buttons past the vent): no sheet
        }
        const data = c;
        const pp = c.printed;
        seen.sheets++;
        seen[pp.method]++;
        if (pp.vent && !pp.vent.fits) seen.tooShort++;
        const [unit, precision] = o.scale;
        const step = stepMm(unit, precision);
        const n = (t: string) => steps(t, unit, step);
        const S = n(pp.shortenBy.text);
        const H = n(pp.hemDepth.text);
        const exact = (typedLen: string | undefined, fallbackMm: number) => mmOf(typedLen, fallbackMm) / step;
        // Never shortened more than asked (a step at least), never a shallower hem than asked.
        expect(S).toBeGreaterThanOrEqual(1);
        expect(S <= exact(o.shortenBy, 0) + 1e-6 || S === 1).toBe(true);
        expect(H * step).toBeGreaterThanOrEqual(data.plan.hemDepth.mm - 1e-6);
        const cuff = pp.method === 'cuff';
        const E = cuff ? S : 0;
        if (cuff) {
          // new edge − hem depth = cut, as printed and as the sum says.
          expect(n(pp.cut!.belowNewEdge.text)).toBe(H);
          expect(n(pp.cut!.abovePresentEdge.text)).toBe(S - H);
          const where =
            S > H
              ? `${pp.shortenBy.text} − ${pp.hemDepth.text} = ${pp.cut!.abovePresentEdge.text} above`
              : S < H
                ? `${pp.hemDepth.text} − ${pp.shortenBy.text} = ${pp.cut!.abovePresentEdge.text.slice(1)} below`
                : '= 0';
          expect(c.sum).toContain(where);
        } else expect(pp.cut).toBeNull();
        // Each button: now + move = new centre; new centre − the edge's rise = above the new edge; spacing between them.
        pp.buttons.forEach((b, k) => {
          expect(n(b.now.text) + n(b.moveUp.text)).toBe(n(b.newCentre.text));
          expect(n(b.newCentre.text) - E).toBe(n(b.aboveNewEdge.text));
          if (k > 0) expect(n(b.now.text) - n(pp.buttons[k - 1]!.now.text)).toBe(n(pp.spacing!.text));
          // Buttons move as far as the sleeve is shortened, on a cuff without working buttonholes; else they stay.
          expect(n(b.moveUp.text)).toBe(cuff && o.buttonholes !== 'working' ? S : 0);
        });
        if (pp.vent) {
          const v = pp.vent;
          expect(n(v.before.text) - E).toBe(n(v.after.text));
          expect(n(v.before.text) * step).toBeLessThanOrEqual(mmOf(o.ventLength, 0) + 1e-6);
          if (v.topButton) {
            expect(n(v.after.text) - n(v.topButton.text) - n(v.margin.text)).toBe(n(v.room.text));
            // Fits as printed means fits with the figures as measured (the sleeve shortened as printed).
            if (v.fits) {
              // The exact top button now and margin, from the engine's plan (the margin is the shop's default).
              const plan = data.plan;
              const last = plan.buttons.at(-1)!.aboveNewEdge.mm;
              const working = cuff && o.buttonholes === 'working';
              const nowTop = last + (working ? plan.shortenBy.mm : 0);
              const margin = plan.ventAfter!.mm - last - plan.ventRoom!.mm;
              const M = cuff && !working ? S : 0;
              expect(mmOf(o.ventLength, 0) - E * step - (nowTop + (M - E) * step) - margin).toBeGreaterThanOrEqual(-1e-6);
            } else expect(c.notes.some((t) => t.includes(v.shortBy!.text))).toBe(true);
          }
        }
        // Lining: shortening + (fold − fold now) − (pleat − pleat now) = lining, never more off than exact.
        const l = pp.lining;
        expect(n(l.fold.text) - n(l.foldNow.text)).toBe(n(l.foldChange.text));
        expect(n(l.pleat.text) - n(l.pleatNow.text)).toBe(n(l.pleatChange.text));
        expect(S + n(l.foldChange.text) - n(l.pleatChange.text)).toBe(n(l.shortenBy.text));
        const exactLiningSteps = S + (data.plan.lining.shortenBy.mm - data.plan.shortenBy.mm) / step;
        expect(n(l.shortenBy.text)).toBeLessThanOrEqual(exactLiningSteps + 1e-6);
        // The strip: 1:1 from its highest line, each line where the table says it is.
        const top = pp.strip[0]!;
        expect(top.belowTop.mm).toBe(0);
        for (const line of pp.strip) {
          expect(n(line.belowTop.text)).toBe(n(top.fromPresent.text) * (cuff ? 1 : -1) - n(line.fromPresent.text) * (cuff ? 1 : -1));
          expect(c.strip.lines.find((g) => g.n === line.n && g.belowMark === line.belowTop)).toBeDefined();
        }
      }),
      { numRuns: 400 },
    );
    // Not vacuous: most inputs make a sheet, and each way of working (and a vent too short) comes up.
    expect(seen.sheets).toBeGreaterThan(200);
    expect(Math.min(seen.cuff, seen.shoulder, seen.tooShort)).toBeGreaterThan(10);
  });
});

describe('sleeve sheet examples', () => {
  it('1 in off at the cuff, hem 1 1/2 in: cut 1/2 in below the present edge, buttons up 1 in (docs/KINDS.md; defaults common practice (no source))', () => {
    const c = sheetWords({ unit: 'in', precision: 8, shortenBy: '1', buttonholes: 'decorative', ventLength: '4 1/2' });
    // Cut h below the new edge: 1 1/2 − 1 = 1/2 below the present edge (docs/KINDS.md, derived).
    expect(c.sum).toBe('Cut 1 1/2 in below the new edge: 1 1/2 in − 1 in = 1/2 in below the present edge, inside the let-down hem.');
    // Lowest button 1 1/4 in, 5/8 in apart (kind-defaults, common practice (no source)), moved up 1 in.
    expect(c.buttons!.rows.map((r) => [r.line, r.now, r.move, r.newCentre, r.after])).toEqual([
      [3, '1 1/4 in', '1 in', '2 1/4 in', '1 1/4 in'],
      [4, '1 7/8 in', '1 in', '2 7/8 in', '1 7/8 in'],
      [5, '2 1/2 in', '1 in', '3 1/2 in', '2 1/2 in'],
      [6, '3 1/8 in', '1 in', '4 1/8 in', '3 1/8 in'],
    ]);
    // Vent 4 1/2 − 1 = 3 1/2; top button 3 1/8 + margin 1/2 (common practice (no source)) = 3 5/8: 1/8 too high.
    expect(c.vent).toEqual([
      'Vent: 4 1/2 in now − 1 in = 3 1/2 in after (its top stays).',
      "Above the top button: 3 1/2 in − 3 1/8 in − 1/2 in kept below the vent's top = -1/8 in.",
    ]);
    // 3 1/2 − 1/2 − 1 1/4 = 1 3/4 of room from the lowest: 3 buttons at 5/8 (0, 5/8, 1 1/4), or 4 at 1 3/4 / 3 = 7/12, floored to 1/2.
    expect(c.notes).toEqual(['The shortened vent is 1/8 in too short for the buttons: sew 3 of them, or set them all 1/2 in apart.']);
    expect(c.steps).toContain('The buttonholes are decorative: stitch them again 1 in higher.');
    expect(c.lining).toBe('Lining: shorten it 1 in, as the sleeve; fold 1/2 in above the new edge, ease pleat 1/2 in.');
  });

  it('the lining loses s + (f′ − f) − (p′ − p): 1 in + (1/2 − 3/8) − (1/2 − 1/4) = 7/8 in (docs/KINDS.md, derived)', () => {
    const c = sheetWords({ unit: 'in', precision: 8, shortenBy: 1, buttonholes: 'none', liningFoldNow: '3/8', liningPleatNow: '1/4' });
    expect(c.lining).toContain('shorten it 7/8 in: 1 in + (1/2 in − 3/8 in) fold − (1/2 in − 1/4 in) pleat = 7/8 in');
  });

  it('rounds to keep cloth: 1 3/16 in off on a 1/8 sheet prints 1 1/8 in, a 1 7/16 in hem prints 1 1/2 in (common practice (no source): cloth cut away cannot be put back)', () => {
    const pp = sheetWords({ unit: 'in', precision: 8, shortenBy: '1 3/16', hemDepth: '1 7/16', buttonholes: 'none', buttons: 0 }).printed;
    expect([pp.shortenBy.text, pp.hemDepth.text, pp.cut!.abovePresentEdge.text]).toEqual(['1 1/8 in', '1 1/2 in', '-3/8 in']);
  });

  it('on a 1/16 sheet and in mm the same sleeve prints its own steps (convert-units and mathjs: 1 in = 25.4 mm)', () => {
    const inch = sheetWords({ unit: 'in', precision: 16, shortenBy: '13/16', buttonholes: 'none', buttons: 3 }).printed;
    expect([inch.shortenBy.text, inch.cut!.abovePresentEdge.text]).toEqual(['13/16 in', '-11/16 in']);
    // 13/16 in typed on a mm sheet: 20.6375 mm, down to the 0.5 mm step: 20.5 mm.
    const typedMm = convert(13 / 16)
      .from('in')
      .to('mm');
    // convert-units uses 3.28084 ft/m: it agrees to about 1e-7 (DEVELOPERS.md), a cross-check, not the source.
    expect(typedMm).toBeCloseTo(mathUnit(13 / 16, 'inch').toNumber('mm'), 5);
    const mm = sheetWords({ unit: 'mm', shortenBy: '13/16 in', buttonholes: 'none', buttons: 3 }).printed;
    expect(mm.shortenBy.text).toBe(`${Math.floor(typedMm * 2) / 2} mm`);
    // Hem 40 mm by default in metric (kind-defaults, common practice (no source)): cut 40 − 20.5 = 19.5 mm below the present edge.
    expect(mm.cut!.abovePresentEdge.text).toBe('-19.5 mm');
  });

  it('working buttonholes: from the shoulder, the head lowered, no cut at the cuff (docs/KINDS.md: common practice (no source))', () => {
    const c = sheetWords({ unit: 'mm', shortenBy: 25, buttonholes: 'working' });
    expect(c.printed.method).toBe('shoulder');
    expect(c.heading).toBe('Shortened 25 mm from the shoulder');
    expect(c.lines.map((l) => [l.n, l.fromEdge])).toEqual([
      [0, '0'],
      [1, '25 mm below'],
    ]);
    expect(c.notes).toEqual([
      'Working (cut) buttonholes cannot be moved: shorten the sleeve 25 mm from the shoulder instead.',
      'Take the sleeve out, lower its head 25 mm, recut it and set it in again; check the hang at a fitting.',
    ]);
    expect(c.buttons).toBeNull();
  });

  it('says every engine note: checks beside the figures, advice among the steps (catalog words)', () => {
    const c = sheetWords({ unit: 'in', precision: 8, shortenBy: '1/4', buttonholes: 'working', workingButtonholeSlack: '1/4' });
    expect(c.notes).toEqual(['Working buttonholes cannot move: each one comes 1/4 in nearer the new edge.']);
    expect(c.steps).toContain("Unpick the vent's corners (mitres) and make them again at the new edge.");
    // Working buttonholes stay: the buttons too, 1/4 in nearer the new edge (1 1/4 − 1/4 = 1 in).
    expect(c.buttons!.rows[0]).toMatchObject({ line: null, move: '0 in', after: '1 in' });
  });
});
