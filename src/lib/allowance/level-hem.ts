// A hem levelled from the floor. At the fitting a hem marker set at one height from the floor puts
// a level line of pins round the skirt; the present hem hangs unevenly below it. The new hem line
// is level too, at the height wanted, so it runs a fixed distance from the pins all round:
//   new line below the pins   s = markerHeight − (hemFromFloor − shoeRise)
// where shoeRise = shoesToWear − shoesAtMarking (the garment rises with the wearer). At a place where
// the pins are p above the present edge, the new line lies p − s above that edge: positive shortens,
// negative lets down. Exact arithmetic throughout (no rounding until shown).
import { AllowanceError } from './allowance-error';
import { type Exact, ZERO } from './exact';
import { kindLength, NO_SOURCE } from './kind-defaults';
import type { HemPoint, LevelHemInput, LevelHemNoteCode, LevelHemPlan, LevelPoint } from './kind-types';
import { lenMaker } from './len';
import { type Note, note } from './notes';
import { InputReader } from './read-input';
import { readChoice } from './read-values';

/** Where the levelling rules come from. */
export const LEVEL_HEM_SOURCES = {
  marker: `${NO_SOURCE}: a hem marker set at one height marks a level line round the wearer standing still in the shoes to be worn`,
  shoes:
    'derived: the garment rises with the wearer, so a change of shoes moves the hem line by the difference in lift (mark in the shoes to be worn when possible)',
} as const;

/** The places round a hem, front to back on the left and back to front on the right. */
export const HEM_POINTS: readonly HemPoint[] = [
  'centre-front',
  'left-front',
  'left-side',
  'left-back',
  'centre-back',
  'right-back',
  'right-side',
  'right-front',
];

/** A levelling input read and checked: exact mm throughout. */
export interface LevelHemValues {
  unit: LevelHemInput['unit'];
  precision: NonNullable<LevelHemInput['precision']>;
  marker: Exact;
  floor: Exact;
  shoesAtMarking: Exact;
  shoesToWear: Exact;
  hemDepth: Exact;
  points: { at: HemPoint; pin: Exact; cloth: Exact | null }[];
}

/** Read a levelling input field by field (errors carry the field name, points as points.N.field). */
export function readLevelHemInput(input: LevelHemInput, r: InputReader): LevelHemValues {
  const marker = r.length(input.markerHeight, 'markerHeight', 'Marker height', { required: true, min: 'positive' }) ?? ZERO;
  const floor = r.length(input.hemFromFloor, 'hemFromFloor', 'Hem above the floor', { required: true, min: 'positive' }) ?? ZERO;
  const shoesAtMarking = r.length(input.shoesAtMarking, 'shoesAtMarking', 'Shoes at the marking', { min: 'non-negative' }) ?? ZERO;
  const shoesToWear = r.length(input.shoesToWear, 'shoesToWear', 'Shoes to be worn', { min: 'non-negative' }) ?? shoesAtMarking;
  const hemDepth = r.length(input.hemDepth, 'hemDepth', 'Hem depth', { min: 'positive' }) ?? kindLength('skirtHemDepth', r.unit);
  const points: LevelHemValues['points'] = [];
  const list: unknown = input.points;
  if (!Array.isArray(list) || list.length === 0 || list.length > HEM_POINTS.length) {
    r.refuse(new AllowanceError('out-of-range', 'Give the places measured round the hem.', 'points', { rule: 'places', min: 1, max: HEM_POINTS.length }));
  } else {
    const seen = new Set<HemPoint>();
    list.forEach((p: Partial<LevelHemInput['points'][number]> | null, k) => {
      const at = readChoice(r, p?.at, `points.${k}.at`, HEM_POINTS);
      if (at !== null && seen.has(at)) r.refuse(new AllowanceError('impossible-shape', 'Each place once.', `points.${k}.at`, { rule: 'place-twice', at }));
      if (at !== null) seen.add(at);
      const pin = r.length(p?.pinAboveEdge, `points.${k}.pinAboveEdge`, 'Marker line above the edge', { required: true, min: 'non-negative' });
      const cloth = r.length(p?.cloth, `points.${k}.cloth`, 'Cloth below the edge', { min: 'non-negative' });
      if (at !== null && pin !== null) points.push({ at, pin, cloth });
    });
  }
  return { unit: r.unit, precision: r.precision, marker, floor, shoesAtMarking, shoesToWear, hemDepth, points };
}

/** Level a hem from the floor: the new line's distance from the present edge at each place measured, and the cloth check. */
export function levelHem(input: LevelHemInput): LevelHemPlan {
  const v = readLevelHemInput(input, new InputReader(input, false));
  const len = lenMaker(v.unit, v.precision);
  const rise = v.shoesToWear.sub(v.shoesAtMarking);
  const s = v.marker.sub(v.floor.sub(rise));
  const notes: Note<LevelHemNoteCode>[] = [note('chalk-from-pins', { below: len(s) })];
  if (!rise.isZero()) notes.push(note('shoes-differ', { rise: len(rise) }));
  let low: Exact | null = null;
  let high: Exact | null = null;
  const points: LevelPoint[] = v.points.map(({ at, pin, cloth }) => {
    const change = pin.sub(s);
    if (low === null || change.compare(low) < 0) low = change;
    if (high === null || change.compare(high) > 0) high = change;
    const cut = change.sub(v.hemDepth);
    // Cloth below the cutting line: the let-down cloth below the edge, plus any cut line above the edge.
    const rest = cloth === null ? null : cloth.add(cut);
    if (rest !== null && rest.sign() < 0) notes.push(note('not-enough-cloth', { at, shortBy: len(rest.neg()) }));
    if (change.sign() < 0) notes.push(note('old-hem-line-shows', { at, letDown: len(change.neg()) }));
    return {
      at,
      pinAboveEdge: len(pin),
      newLineAboveEdge: len(change),
      cutAboveEdge: len(cut),
      spare: rest === null ? null : len(rest),
      enough: rest === null ? null : rest.sign() >= 0,
    };
  });
  const uneven = high !== null && low !== null ? (high as Exact).sub(low) : ZERO;
  if (!uneven.isZero()) notes.push(note('uneven-hem', { by: len(uneven) }));
  return {
    kind: 'level-hem',
    unit: v.unit,
    precision: v.precision,
    newLineBelowPins: len(s),
    shoeRise: len(rise),
    hemDepth: len(v.hemDepth),
    points,
    unevenBy: len(uneven),
    notes,
    cautions: ['needles-and-pins', 'blades-and-rippers', 'iron-and-steam'],
    sources: LEVEL_HEM_SOURCES,
  };
}
