// Jeans shortened keeping the factory hem.
//
// Measured down from the pin mark (the new finished edge) on the leg as it hangs: the present edge
// is s below; the factory hem's stitching tops it at s − h. The hem band (h deep) will hang from
// the new edge, so the leg is joined to it h above the mark. With a seam allowance a on each side:
//   join        −h            leg cut     −h + a
//   band cut    s − h − a     band top    s − h       present edge  s
// Cloth cut away = s − 2a: the join takes the seam allowance twice, so the two pieces together are
// the new length + 2a (crotch to leg cut, plus band cut to edge). Under 2a to remove, nothing is cut:
// the leg is folded at s/2 − h (half-way between the join and the band top, which meet) and the tuck
// stays inside. On a tapered leg the band keeps the width it had h above the present edge while the
// leg is joined s + h above it: a flat mismatch of slope × s.
import { AllowanceError } from './allowance-error';
import { exactDefaults } from './defaults';
import { Exact, ZERO } from './exact';
import { kindLength, NO_SOURCE } from './kind-defaults';
import type { OriginalHemInput, OriginalHemLineName, OriginalHemNoteCode, OriginalHemPlan } from './kind-types';
import { lenMaker } from './len';
import { type Note, note } from './notes';
import { InputReader } from './read-input';

/** Where the original-hem rules come from. */
export const ORIGINAL_HEM_SOURCES = {
  method: `${NO_SOURCE}: the factory hem is cut off above its stitching and sewn back at the new length, or folded up and stitched without cutting`,
  arithmetic: 'derived: the join takes a seam allowance from each piece, so the cloth removed is the shortening less twice the seam allowance',
  taper: 'derived: the band keeps the width the leg had just above the old edge; the leg is joined s higher, where a taper has changed it by slope × s',
} as const;

/** An original-hem input read and checked: exact mm throughout. */
export interface OriginalHemValues {
  unit: OriginalHemInput['unit'];
  precision: NonNullable<OriginalHemInput['precision']>;
  s: Exact;
  h: Exact;
  a: Exact;
  inseam: Exact | null;
  widths: { edge: Exact; above: Exact; height: Exact } | null;
  tolerance: Exact;
}

/** Read an original-hem input field by field (errors carry the field name). */
export function readOriginalHemInput(input: OriginalHemInput, r: InputReader): OriginalHemValues {
  const s = r.length(input.shortenBy, 'shortenBy', 'Shorten by', { required: true, min: 'positive' }) ?? Exact.int(1);
  const h = r.length(input.factoryHem, 'factoryHem', 'Factory hem', { required: true, min: 'positive' }) ?? Exact.int(1);
  const a = r.length(input.seamAllowance, 'seamAllowance', 'Seam allowance', { min: 'positive' }) ?? kindLength('jeansSeamAllowance', r.unit);
  const inseam = r.length(input.inseamNow, 'inseamNow', 'Inseam now', { min: 'positive' });
  // The taper check needs all three figures; any one given asks for the others.
  const asked = input.widthAtEdge !== undefined || input.widthAbove !== undefined || input.heightAbove !== undefined;
  const rule = { required: asked, min: 'positive' } as const;
  const edge = r.length(input.widthAtEdge, 'widthAtEdge', 'Width at the edge', rule);
  const above = r.length(input.widthAbove, 'widthAbove', 'Width higher up', rule);
  const height = r.length(input.heightAbove, 'heightAbove', 'Height of the upper width', rule);
  const tolerance = r.length(input.tolerance, 'tolerance', 'Tolerance', { min: 'non-negative' }) ?? exactDefaults(r.unit).taperTolerance;
  if (inseam !== null && s.compare(inseam) >= 0) {
    r.refuse(new AllowanceError('impossible-shape', 'The leg is not that long.', 'shortenBy', { rule: 'shortening-past-inseam' }));
  }
  const widths = edge !== null && above !== null && height !== null ? { edge, above, height } : null;
  return { unit: r.unit, precision: r.precision, s, h, a, inseam, widths, tolerance };
}

/** Plan jeans shortened keeping the factory hem: the chalk lines, the cloth cut away, and the taper at the join. */
export function planOriginalHem(input: OriginalHemInput): OriginalHemPlan {
  const v = readOriginalHemInput(input, new InputReader(input, false));
  const len = lenMaker(v.unit, v.precision);
  const { s, h, a } = v;
  const twoA = a.twice();
  const removed = s.sub(twoA);
  const method = removed.sign() >= 0 ? 'cut-and-join' : 'fold-only';
  const positions: [OriginalHemLineName, Exact][] = [
    ['join', h.neg()],
    ['leg-cut', a.sub(h)],
    ['fold', s.half().sub(h)],
    ['band-cut', s.sub(h).sub(a)],
    ['band-top', s.sub(h)],
    ['present-edge', s],
  ];
  const lines = positions
    .filter(([name]) => (method === 'cut-and-join' ? name !== 'fold' : name !== 'leg-cut' && name !== 'band-cut'))
    .map(([name, below]) => ({ name, belowMark: len(below) }));
  const notes: Note<OriginalHemNoteCode>[] = [note('chalk-on-both-legs', {})];
  if (method === 'fold-only') notes.push(note('fold-only', { tuck: len(s.half()), least: len(twoA) }));
  const band = h.add(a);
  const newInseam = v.inseam === null ? null : v.inseam.sub(s);
  const leg = newInseam === null ? null : newInseam.sub(h).add(a);
  let taper: OriginalHemPlan['taper'] = null;
  if (v.widths !== null) {
    const slope = v.widths.above.sub(v.widths.edge).div(v.widths.height);
    const mismatch = slope.mul(s);
    const withinTolerance = mismatch.abs().compare(v.tolerance) <= 0;
    taper = { mismatch: len(mismatch), perSeam: len(mismatch), perSide: len(mismatch.half()), withinTolerance };
    if (!withinTolerance) {
      const values = { perSeam: len(mismatch.abs()), perSide: len(mismatch.abs().half()) };
      notes.push(note(mismatch.sign() > 0 ? 'take-in-leg-above-join' : 'take-in-band', values));
    }
  }
  return {
    kind: 'original-hem',
    unit: v.unit,
    precision: v.precision,
    shortenBy: len(s),
    factoryHem: len(h),
    seamAllowance: len(a),
    method,
    lines,
    removed: len(method === 'cut-and-join' ? removed : ZERO),
    seamTakes: len(twoA),
    pieces: {
      leg: leg === null ? null : len(leg),
      band: len(band),
      total: leg === null ? null : len(leg.add(band)),
      newInseam: newInseam === null ? null : len(newInseam),
    },
    taper,
    notes,
    cautions: ['blades-and-rippers', 'heavy-seams-needle', 'iron-and-steam'],
    sources: ORIGINAL_HEM_SOURCES,
  };
}
