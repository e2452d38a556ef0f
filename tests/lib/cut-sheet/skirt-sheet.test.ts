// Skirts and dresses on the cut sheet: every figure of the block adds up as printed (hem depth +
// turn-under = cloth kept; round − fullness = landing round; at each place pins − below-pins = new
// line, new line − cloth kept = cut, cloth + cut = spare), in inches to 1/8 and 1/16 and in mm, and
// each is rounded to the safe side of the cloth (the cut never above the exact one, the spare never
// more); the PDF carries the figures, the table, the notes, the cautions and the 1:1 strip.
import fc from 'fast-check';
import { evaluate } from 'mathjs';
import convert from 'convert-units';
import { describe, expect, it } from 'vitest';
import { parseLength } from '@/lib/allowance';
import type { Precision, Unit } from '@/lib/allowance/types';
import { buildKindSheet } from '@/lib/server/cut-sheet/kinds/build-kind';
import { sheetContent } from '@/lib/server/cut-sheet/content';
import { sheetStripColumns } from '@/lib/server/cut-sheet/CutSheet';
import { renderCutSheet } from '@/lib/server/cut-sheet/render';
import type { SkirtBlockWords } from '@/lib/server/cut-sheet/kinds/skirt-sheet';
import { SKIRT_ADAPTER, type SkirtPlan } from '@/lib/shared/fitting/skirt-fitting';
import type { KindFittingView } from '@/lib/shared/kind-fitting-request';
import type { CutSheetData } from '@/lib/shared/cut-sheet-types';
import { crowdedRuns, textRuns } from './pdf-runs';
import { flatText, pdfFile } from './poppler';
import { SHOP } from './sheets';

const HEADER = { ...SHOP, garment: 'Rust half-circle skirt' };

/** A saved skirt fitting (texts as typed in `unit`) for the sheet's builder. */
function saved(fields: Record<string, string>, unit: Unit = 'in'): KindFittingView {
  const values: KindFittingView['values'] = {};
  const choices: Record<string, string> = {};
  for (const f of SKIRT_ADAPTER.fields) {
    const v = fields[f.key];
    if (!v) continue;
    if (f.type === 'length') values[f.key] = { text: v, mm: parseLength(v, unit).mm };
    else choices[f.key] = v;
  }
  return { kind: 'skirt', unit, values, choices, takenAt: null, takenBy: null };
}

function sheet(fields: Record<string, string>, unit: Unit, precision: Precision, typedIn: Unit = 'in'): CutSheetData {
  return buildKindSheet(HEADER, saved(fields, typedIn), unit, precision)!;
}

const block = (data: CutSheetData) => sheetContent(data).kind!.block as SkirtBlockWords;

// The worked example (invented skirt): a half circle 110 in round, hemmed 1 in, levelled from the floor.
const HALF_CIRCLE = {
  hemRound: '110',
  flare: 'circle',
  circleFraction: '1/2',
  hemDepth: '1',
  markerHeight: '16',
  hemFromFloor: '15',
  'pin-centre-front': '2 1/4',
  'pin-centre-back': '2 3/4',
  'cloth-centre-front': '1 1/2',
  'cloth-centre-back': '1 1/4',
};

describe('the worked example, as printed', () => {
  it('prints the deepest flat hem, the fullness, the cloth kept and each place from the figures of docs/KINDS.md', () => {
    const b = block(sheet(HALF_CIRCLE, 'in', 8));
    const p = b.printed;
    // θ = π (a half circle), R = C/θ = 110/π in; deepest flat hem e·R/(1 + e) with e = 3 % (docs/KINDS.md,
    // our own figure), floored to 1/8: mathjs gives 1.0198… in, so 1 in.
    const flat = Number(evaluate('0.03 * (110 / pi) / 1.03'));
    expect(flat).toBeCloseTo(1.0198, 4);
    expect(p.liesFlatTo!.text).toBe('1 in');
    // Fullness θ·d = π × 1 in = 3.1416 in (docs/KINDS.md), up to the 1/8: 3 1/4 in; landing 110 − 3 1/4 = 106 3/4.
    expect(p.fullness!.text).toBe('3 1/4 in');
    expect(p.landing!.text).toBe('106 3/4 in');
    // Turn-under default 1/4 in (TRADE.md via docs/KINDS.md): cloth kept 1 + 1/4 = 1 1/4 in.
    expect([p.depth.text, p.turnUnder.text, p.keep.text]).toEqual(['1 in', '1/4 in', '1 1/4 in']);
    // New line below the pins s = marker − (floor − rise) = 16 − 15 = 1 in (docs/KINDS.md, derived).
    expect(p.level!.belowPins.text).toBe('1 in');
    expect(b.points.map((r) => [r.place, r.pin, r.newLine, r.cut, r.cloth, r.spare])).toEqual([
      // 2 1/4 − 1 = 1 1/4 shorter; cut 1 1/4 − 1 1/4 = 0; spare 1 1/2 + 0.
      ['Centre front', '2 1/4 in', '1 1/4 in', '0 in', '1 1/2 in', '1 1/2 in'],
      // 2 3/4 − 1 = 1 3/4; cut 1 3/4 − 1 1/4 = 1/2 above the edge; spare 1 1/4 + 1/2.
      ['Centre back', '2 3/4 in', '1 3/4 in', '1/2 in', '1 1/4 in', '1 3/4 in'],
    ]);
  });

  it('gives the same fullness in mm, up to the 0.5 mm step (cross-check: convert-units)', () => {
    const p = block(sheet(HALF_CIRCLE, 'mm', 8)).printed;
    // π × 25.4 mm = 79.80 mm (1 in = 25.4 mm exactly, NBS 1959); convert-units agrees to about 1e-7.
    expect(Math.PI * convert(1).from('in').to('mm')).toBeCloseTo(79.796, 2);
    expect(p.fullness!.text).toBe('80 mm');
    expect(p.depth.text).toBe('25.5 mm'); // 25.4 mm up to the 0.5 mm step: a deeper hem, never a short one
  });
});

// Random skirts typed in inches or mm, printed in every unit.
const scale = fc.constantFrom<[Unit, Precision]>(['in', 8], ['in', 16], ['mm', 8], ['cm', 8]);
const inch = (lo: number, hi: number) => fc.integer({ min: lo, max: hi }).map((k) => `${k}/16`);
const skirts = fc.record({
  scale,
  flare: fc.oneof(
    fc.constant({ flare: 'straight' }),
    fc.constantFrom('1', '1/2', '1/4', '3/4').map((f) => ({ flare: 'circle', circleFraction: f })),
    fc.integer({ min: 10, max: 120 }).map((d) => ({ flare: 'angle', flareDegrees: String(d) })),
  ),
  hemRound: inch(40 * 16, 200 * 16),
  hemDepth: inch(4, 48),
  turnUnder: fc.option(inch(2, 8), { nil: undefined }),
  marker: inch(8 * 16, 30 * 16),
  drop: inch(-48, 48),
  points: fc.uniqueArray(
    fc.record({
      at: fc.constantFrom('centre-front', 'left-side', 'centre-back', 'right-side', 'left-back'),
      pin: inch(0, 96),
      cloth: fc.option(inch(0, 64), { nil: undefined }),
    }),
    { selector: (p) => p.at, minLength: 1, maxLength: 5 },
  ),
});

function fieldsOf(o: typeof skirts extends fc.Arbitrary<infer T> ? T : never): Record<string, string> {
  const f: Record<string, string> = { hemRound: o.hemRound, hemDepth: o.hemDepth, ...o.flare, markerHeight: o.marker };
  if (o.turnUnder) f.turnUnder = o.turnUnder;
  // The hem wanted this far from the marker's line (above or below it).
  f.hemFromFloor = `${o.marker} + ${o.drop}`;
  for (const p of o.points) {
    f[`pin-${p.at}`] = p.pin;
    if (p.cloth) f[`cloth-${p.at}`] = p.cloth;
  }
  return f;
}

/** A printed length read back as a whole number of the sheet's steps (1/8 or 1/16 in, 0.5 mm). */
function steps(text: string, unit: Unit, precision: Precision): number {
  const step = unit === 'in' ? 25.4 / precision : 0.5;
  const mm = parseLength(text.replace(/^-/, ''), unit).mm * (text.startsWith('-') ? -1 : 1);
  const n = mm / step;
  expect(Math.abs(n - Math.round(n)), `${text} is a whole number of steps`).toBeLessThan(1e-6);
  return Math.round(n);
}

describe('a skirt adds up as printed, on the safe side of the cloth', () => {
  it('depth + turn-under = kept; round − fullness = landing; pins − below = new line; new line − kept = cut; cloth + cut = spare', () => {
    fc.assert(
      fc.property(skirts, (o) => {
        const fields = fieldsOf(o);
        if (SKIRT_ADAPTER.refusals(fields, 'in').length > 0) return; // the save refuses it: no sheet
        const [unit, precision] = o.scale;
        const data = sheet(fields, unit, precision);
        const b = block(data);
        const p = b.printed;
        const n = (t: string) => steps(t, unit, precision);
        expect(n(p.depth.text) + n(p.turnUnder.text)).toBe(n(p.keep.text));
        if (p.fullness && p.landing) expect(n(p.hemRound.text) - n(p.fullness.text)).toBe(n(p.landing.text));
        // A skirt's sheet carries the skirt's plan (KindSheetData is every kind's).
        const plan = data.kindSheet!.plan as SkirtPlan;
        const below = n(p.level!.belowPins.text);
        b.points.forEach((r, k) => {
          expect(n(r.pin) - below).toBe(n(r.newLine));
          expect(n(r.newLine) - n(p.keep.text)).toBe(n(r.cut));
          if (r.cloth !== '—') expect(n(r.cloth) + n(r.cut)).toBe(n(r.spare));
          // Safe side: the printed cut is never above the exact one (cloth kept = the finished depth + turn-under).
          const exact = plan.level!.points[k]!;
          expect(p.level!.points[k]!.cutAboveEdge.mm).toBeLessThanOrEqual(exact.cutAboveEdge.mm + 1e-6);
          expect(p.level!.points[k]!.newLineAboveEdge.mm).toBeLessThanOrEqual(exact.newLineAboveEdge.mm + 1e-6);
          if (exact.spare && p.level!.points[k]!.spare) expect(p.level!.points[k]!.spare!.mm).toBeLessThanOrEqual(exact.spare.mm + 1e-6);
        });
        // The depth is the plan's own or deeper, never shallower: the cloth kept covers the hem.
        expect(p.keep.mm).toBeGreaterThanOrEqual((plan.flared.finishDepth ?? plan.flared.hemDepth).mm + plan.flared.turnUnder.mm - 1e-6);
      }),
      { numRuns: 150, seed: 17 },
    );
  });
});

describe('the skirt sheet as a PDF', () => {
  it('carries the figures with their sums, the table, the notes, the steps, the cautions and the strip', async () => {
    const text = flatText(pdfFile(await renderCutSheet(sheet(HALF_CIRCLE, 'in', 8))));
    for (const words of [
      'Skirt or dress hem',
      'Rust half-circle skirt',
      'Hem round 110 in: flared, 180° of pattern.',
      'it lands on a round of 110 in − 3 1/4 in = 106 3/4 in',
      'Deepest turned hem that lies flat: 1 in.',
      'Turned hem, 1 in deep.',
      'Cloth kept below the new hem line: 1 in hem + 1/4 in turn-under = 1 1/4 in',
      'New hem line: 1 in below the marker',
      'Centre front',
      'Centre back',
      'Table: from the edge; strip: from the new line.',
      'The present hem hangs unevenly: 1/2 in between', // 2 3/4 − 2 1/4 (the engine's note)
      'Iron and steam burn',
      'Shears, blades, seam rippers',
      'Needles and pins',
      "Your shop's own practice",
      '▼ top on the new hem line',
      'CUT',
    ])
      expect(text).toContain(words);
    // The fullness is printed once, as the figure that adds up (3 1/4 in up), not again to the nearest 1/8.
    expect(text).not.toContain('Ease 3 1/8 in');
    expect(text).not.toContain('measured down from the pin mark');
  });

  it('lays the 1:1 strip from the new hem line: the hem top at its depth, the cut at the cloth kept', () => {
    const [strip] = sheetStripColumns(sheet(HALF_CIRCLE, 'in', 8)).column;
    // 1 in = 72 pt exactly: the hem top 1 in below the line, the cut 1 1/4 in = 90 pt.
    expect(strip!.segment.ticks.map((t) => [t.name, t.cut, Math.round(t.y * 1000) / 1000])).toEqual([
      ['hem top', false, 72],
      ['CUT', true, 90],
    ]);
  });

  it('lays out without two runs of text touching, in every unit and both papers, also in French', async () => {
    for (const [unit, precision] of [
      ['in', 16],
      ['mm', 8],
    ] as const)
      for (const pageSize of ['LETTER', 'A4'] as const)
        for (const language of ['en', 'fr'] as const) {
          const data = buildKindSheet({ ...HEADER, pageSize, language }, saved(HALF_CIRCLE), unit, precision)!;
          const pdf = await renderCutSheet(data);
          expect(crowdedRuns(textRuns(pdf), 2).map(([a, b]) => `${a.text} | ${b.text}`)).toEqual([]);
        }
  });
});
