// A waist change waiting on the same trousers moves the hem: taken in, the band sits higher on the
// body and the trousers with it, so a length pinned before the change ends up short.
//
// Rule 'girth-slope' (derived): the band rests where the body's girth matches it; from the waist
// girth W to the seat girth S over the depth D between them the girth grows by (S − W)/D per unit
// down, so a band taken in by c rises c·D/(S − W). Rule 'shop-ratio': the shop's own figure per
// unit taken in at the waist (and at the seat). The pin mark moves down the leg by the rise, so the
// finished length stays where it was pinned; or the shop has the waist done first and pins after.
import { AllowanceError } from './allowance-error';
import { type Exact, ZERO } from './exact';
import { NO_SOURCE } from './kind-defaults';
import type { WaistMoveInput, WaistMoveNoteCode, WaistMovePlan, WaistMoveRule, WaistPolicy } from './kind-types';
import { lenMaker } from './len';
import { type Note, note } from './notes';
import { InputReader } from './read-input';
import { readChoice, readNumber } from './read-values';

/** Where the waist rules come from. */
export const WAIST_MOVE_SOURCES = {
  'girth-slope': `derived: the band rests where the body's girth matches it, growing from waist to seat; that the waist moves the hem is ${NO_SOURCE} (TRADE.md)`,
  'shop-ratio': "the shop's own figure",
  policy: `${NO_SOURCE}: adjust the waist before pinning the length (TRADE.md), or record the change and move the mark`,
} as const;

const POLICIES = ['record', 'waist-first'] as const satisfies readonly WaistPolicy[];
const RULES = ['girth-slope', 'shop-ratio'] as const satisfies readonly WaistMoveRule[];

/** A waist move input read and checked: exact throughout. */
export interface WaistMoveValues {
  unit: WaistMoveInput['unit'];
  precision: NonNullable<WaistMoveInput['precision']>;
  policy: WaistPolicy;
  waist: Exact;
  seat: Exact;
  rule: WaistMoveRule;
  waistRatio: Exact;
  seatRatio: Exact;
  mostRise: Exact | null;
}

/** Read a waist move input field by field (errors carry the field name). */
export function readWaistMoveInput(input: WaistMoveInput, r: InputReader): WaistMoveValues {
  const policy = readChoice(r, input.policy, 'policy', POLICIES, 'record') ?? 'record';
  const waist = r.length(input.waistChange, 'waistChange', 'Waist change', { required: true }) ?? ZERO;
  const seat = r.length(input.seatChange, 'seatChange', 'Seat change') ?? ZERO;
  const rule = readChoice(r, input.rule, 'rule', RULES) ?? 'shop-ratio';
  let waistRatio = ZERO;
  let seatRatio = ZERO;
  if (rule === 'girth-slope') {
    const need = { required: true, min: 'positive' } as const;
    const W = r.length(input.waistGirth, 'waistGirth', 'Waist girth', need);
    const S = r.length(input.seatGirth, 'seatGirth', 'Seat girth', need);
    const D = r.length(input.waistToSeat, 'waistToSeat', 'Waist to seat', need);
    if (W !== null && S !== null && D !== null) {
      if (S.compare(W) <= 0)
        r.refuse(new AllowanceError('impossible-shape', 'The seat must be larger than the waist for this rule.', 'seatGirth', { rule: 'seat-not-larger' }));
      else waistRatio = D.div(S.sub(W));
    }
  } else {
    waistRatio = readNumber(r, input.waistRatio, 'waistRatio', { required: true, min: 0, max: 10 }) ?? ZERO;
    seatRatio = readNumber(r, input.seatRatio, 'seatRatio', { min: 0, max: 10 }) ?? ZERO;
  }
  const mostRise = r.length(input.mostRise, 'mostRise', 'Most rise', { min: 'non-negative' });
  return { unit: r.unit, precision: r.precision, policy, waist, seat, rule, waistRatio, seatRatio, mostRise };
}

/** How far the pin mark moves for a pending waist (and seat) change, with the rule and its source; or the waist first. */
export function waistMovesHem(input: WaistMoveInput): WaistMovePlan {
  const v = readWaistMoveInput(input, new InputReader(input, false));
  const len = lenMaker(v.unit, v.precision);
  const notes: Note<WaistMoveNoteCode>[] = [];
  const rule = { code: v.rule, waistRatio: v.waistRatio.valueOf(), seatRatio: v.seatRatio.valueOf(), source: WAIST_MOVE_SOURCES[v.rule] };
  const base = { kind: 'waist-move' as const, unit: v.unit, precision: v.precision, policy: v.policy, rule, sources: WAIST_MOVE_SOURCES };
  if (v.policy === 'waist-first') {
    notes.push(note('waist-first', { waistChange: len(v.waist) }));
    return { ...base, rise: null, pinMarkMoves: null, direction: null, notes };
  }
  // Taken in (negative change) lifts the trousers: rise = −(change × ratio).
  let rise = v.waist.mul(v.waistRatio).add(v.seat.mul(v.seatRatio)).neg();
  if (v.mostRise !== null && rise.compare(v.mostRise) > 0) {
    notes.push(note('rise-capped', { rise: len(rise), most: len(v.mostRise) }));
    rise = v.mostRise;
  }
  if (v.rule === 'girth-slope' && !v.seat.isZero()) notes.push(note('seat-change-not-counted', { seatChange: len(v.seat) }));
  const direction = rise.sign() > 0 ? 'down' : rise.sign() < 0 ? 'up' : 'none';
  if (direction !== 'none') notes.unshift(note('pin-mark-moves', { by: len(rise.abs()), direction }));
  notes.push(note('check-at-next-fitting', {}));
  return { ...base, rise: len(rise), pinMarkMoves: len(rise), direction, notes };
}
