// A shrink allowance on a plain hem for cloth not yet washed (raw denim, unwashed cotton).
//
// Washing shortens every length by the fraction p, so a leg L long from the crotch to the pin mark
// becomes L·(1 − p). To end at L after washing it is made L/(1 − p) long: the finished edge is
// chalked L·p/(1 − p) below the pin mark (p × L alone falls short), and the hem allowance H is cut
// H/(1 − p) so it too shrinks to H. Exact arithmetic: p is a decimal percent.
import { exactDefaults } from './defaults';
import { Exact, ZERO } from './exact';
import { NO_SOURCE, SHRINKAGE_PERCENT, type ShrinkCloth } from './kind-defaults';
import type { ShrinkInput, ShrinkNoteCode, ShrinkPlan } from './kind-types';
import { lenMaker } from './len';
import { type Note, note } from './notes';
import { InputReader } from './read-input';
import { readChoice, readNumber } from './read-values';

/** Where the shrink rules come from. */
export const SHRINK_SOURCES = {
  arithmetic: 'derived: a length shrinking by p ends at L when made L/(1 − p)',
  washFirst: `${NO_SOURCE}: wash and dry the garment as it will be washed before altering, when the customer can`,
} as const;

const CLOTHS = ['raw-denim', 'preshrunk-denim', 'unwashed-cotton', 'prewashed', 'other'] as const;
const ONE = Exact.int(1);
const HUNDRED = Exact.int(100);

/** A shrink input read and checked: exact throughout. */
export interface ShrinkValues {
  unit: ShrinkInput['unit'];
  precision: NonNullable<ShrinkInput['precision']>;
  percent: Exact;
  source: string;
  length: Exact;
  hem: Exact;
}

/** Read a shrink input field by field (errors carry the field name). */
export function readShrinkInput(input: ShrinkInput, r: InputReader): ShrinkValues {
  const cloth = readChoice(r, input.cloth, 'cloth', CLOTHS) ?? 'other';
  const own = readNumber(r, input.shrinkPercent, 'shrinkPercent', { required: cloth === 'other', min: 0, max: 50, below: true }, true);
  const preset = cloth === 'other' ? null : SHRINKAGE_PERCENT[cloth as ShrinkCloth];
  return {
    unit: r.unit,
    precision: r.precision,
    percent: own ?? preset?.value ?? ZERO,
    source: own !== null ? "the shop's own figure" : (preset?.source ?? NO_SOURCE),
    length: r.length(input.lengthToMark, 'lengthToMark', 'Length to the mark', { required: true, min: 'positive' }) ?? ONE,
    hem: r.length(input.hemAllowance, 'hemAllowance', 'Hem allowance', { min: 'positive' }) ?? exactDefaults(r.unit).hemAllowance,
  };
}

/** A plain hem made long enough to shrink to the pinned length: the finished edge and cut below the pin mark, with the shrinkage's source. */
export function shrinkAllowance(input: ShrinkInput): ShrinkPlan {
  const v = readShrinkInput(input, new InputReader(input, false));
  const len = lenMaker(v.unit, v.precision);
  const p = v.percent.div(HUNDRED);
  const keep = ONE.sub(p);
  const made = v.length.div(keep);
  const edge = made.sub(v.length);
  const hem = v.hem.div(keep);
  const notes: Note<ShrinkNoteCode>[] = [];
  if (p.isZero()) notes.push(note('no-shrinkage', {}));
  else {
    notes.push(note('shrink-allowance', { percent: v.percent.valueOf(), allowance: len(edge) }));
    notes.push(note('wash-first-advised', {}));
  }
  return {
    kind: 'shrink',
    unit: v.unit,
    precision: v.precision,
    percent: v.percent.valueOf(),
    percentSource: v.source,
    finishedEdgeBelowMark: len(edge),
    hemAllowanceUnwashed: len(hem),
    cutBelowMark: len(edge.add(hem)),
    lengthAfterWash: len(made.mul(keep)),
    notes,
    cautions: p.isZero() ? ['iron-and-steam'] : ['hot-wash-and-dryer', 'iron-and-steam'],
    sources: { ...SHRINK_SOURCES, percent: v.source },
  };
}
