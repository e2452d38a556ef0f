// A jacket or coat sleeve shortened keeping its vent and buttons.
//
// At the cuff the hem is let down and the new edge chalked `shortenBy` higher; the vent's top stays,
// so the vent is that much shorter, and the buttons (with decorative buttonholes, restitched) move up
// by the same amount to keep their distance from the edge. Working (cut) buttonholes cannot move:
// past the shop's slack (none by default) the sleeve is shortened from the shoulder instead, as it
// is when the vent would be cut away. The lining hangs from the armhole to its fold, f above the
// sleeve's edge, with an ease pleat p folded over its stitching: its length is S − f + p for a
// sleeve S long, so it is made  s + (f' − f) − (p' − p)  shorter when the sleeve loses s.
import { AllowanceError } from './allowance-error';
import { Exact, ZERO } from './exact';
import { exactArith } from './kind-arith';
import { kindLength, NO_SOURCE } from './kind-defaults';
import type { SleeveButton, SleeveButtonholes, SleeveInput, SleeveNoteCode, SleevePlan } from './kind-types';
import { type LenMaker, lenMaker } from './len';
import { type Note, type NoteValue, note } from './notes';
import { InputReader } from './read-input';
import { readChoice, readNumber } from './read-values';

/** Where the sleeve rules come from. */
export const SLEEVE_SOURCES = {
  buttons: `${NO_SOURCE}: the buttons keep their distance from the finished edge, so they move up as much as the sleeve is shortened`,
  workingButtonholes: `${NO_SOURCE}: cut buttonholes cannot be moved; the sleeve is shortened from the shoulder instead`,
  lining: 'derived: the lining is S − f + p long (sleeve, fold above the edge, ease pleat), so it loses s + Δf − Δp',
  defaults: NO_SOURCE,
} as const;

const BUTTONHOLES = ['none', 'decorative', 'working'] as const satisfies readonly SleeveButtonholes[];

/** A sleeve input read and checked: exact mm throughout. */
export interface SleeveValues {
  unit: SleeveInput['unit'];
  precision: NonNullable<SleeveInput['precision']>;
  shortenBy: Exact;
  buttonholes: SleeveButtonholes;
  buttons: number;
  bottom: Exact;
  spacing: Exact;
  vent: Exact | null;
  hemDepth: Exact;
  fold: Exact;
  pleat: Exact;
  foldNow: Exact;
  pleatNow: Exact;
  ventMargin: Exact;
  slack: Exact;
}

/** Read a sleeve input field by field (errors carry the field name). */
export function readSleeveInput(input: SleeveInput, r: InputReader): SleeveValues {
  const u = r.unit;
  const nonNeg = { min: 'non-negative' } as const;
  const fold = r.length(input.liningFoldAboveEdge, 'liningFoldAboveEdge', 'Lining fold', nonNeg) ?? kindLength('liningFoldAboveEdge', u);
  const pleat = r.length(input.liningEasePleat, 'liningEasePleat', 'Lining ease pleat', nonNeg) ?? kindLength('liningEasePleat', u);
  return {
    unit: u,
    precision: r.precision,
    shortenBy: r.length(input.shortenBy, 'shortenBy', 'Shorten by', { required: true, min: 'positive' }) ?? Exact.int(1),
    buttonholes: readChoice(r, input.buttonholes, 'buttonholes', BUTTONHOLES) ?? 'none',
    buttons: readNumber(r, input.buttons, 'buttons', { min: 0, max: 8, integer: true })?.valueOf() ?? 4,
    bottom: r.length(input.bottomButtonAboveEdge, 'bottomButtonAboveEdge', 'Lowest button', { min: 'positive' }) ?? kindLength('bottomButtonAboveEdge', u),
    spacing: r.length(input.buttonSpacing, 'buttonSpacing', 'Button spacing', { min: 'positive' }) ?? kindLength('buttonSpacing', u),
    vent: r.length(input.ventLength, 'ventLength', 'Vent length', { min: 'positive' }),
    hemDepth: r.length(input.hemDepth, 'hemDepth', 'Hem depth', { min: 'positive' }) ?? kindLength('sleeveHemDepth', u),
    fold,
    pleat,
    foldNow: r.length(input.liningFoldNow, 'liningFoldNow', 'Lining fold now', nonNeg) ?? fold,
    pleatNow: r.length(input.liningPleatNow, 'liningPleatNow', 'Lining pleat now', nonNeg) ?? pleat,
    ventMargin: r.length(input.ventTopMargin, 'ventTopMargin', 'Vent top margin', nonNeg) ?? kindLength('ventTopMargin', u),
    slack: r.length(input.workingButtonholeSlack, 'workingButtonholeSlack', 'Working buttonhole slack', nonNeg) ?? kindLength('workingButtonholeSlack', u),
  };
}

/** Why these buttons make no vent (the top button above the vent's top now), or null. */
export function sleeveShapeError(v: SleeveValues): AllowanceError | null {
  if (v.vent === null || v.buttons === 0) return null;
  const top = v.bottom.add(v.spacing.mul(Exact.int(v.buttons - 1)));
  if (top.compare(v.vent) >= 0) return new AllowanceError('impossible-shape', 'The buttons reach past the vent.', 'ventLength', { rule: 'buttons-above-vent' });
  return null;
}

/** Plan shortening a sleeve: at the cuff keeping vent and buttons, or from the shoulder when the buttonholes or the vent forbid it. */
export function shortenSleeve(input: SleeveInput): SleevePlan {
  const v = readSleeveInput(input, new InputReader(input, false));
  const shape = sleeveShapeError(v);
  if (shape) throw shape;
  const len = lenMaker(v.unit, v.precision);
  const s = v.shortenBy;
  const notes: Note<SleeveNoteCode>[] = [];
  const working = v.buttonholes === 'working';
  const ventGone = v.vent !== null && s.compare(v.vent) >= 0;
  const workingTooFar = working && s.compare(v.slack) > 0;
  const method = ventGone || workingTooFar ? 'shoulder' : 'cuff';
  // Buttons move with the edge, except on working buttonholes (they stay, and the edge comes nearer).
  const moves = method === 'cuff' && !working;
  const moveUp = moves ? s : ZERO;
  const buttons: SleeveButton[] = [];
  for (let k = 0; k < v.buttons; k++) {
    const now = v.bottom.add(v.spacing.mul(Exact.int(k)));
    const after = method === 'cuff' && working ? now.sub(s) : now;
    buttons.push({ n: k + 1, aboveNewEdge: len(after), moveUp: len(moveUp) });
  }
  if (method === 'shoulder') {
    notes.push(note(ventGone ? 'vent-cut-away-shorten-at-shoulder' : 'working-buttonholes-shorten-at-shoulder', { shortenBy: len(s) }));
    notes.push(note('recut-sleeve-head', { shortenBy: len(s) }));
  } else {
    if (v.buttons > 0 && moves) notes.push(note('move-buttons', { moveUp: len(s), buttons: v.buttons }));
    if (v.buttonholes === 'decorative') notes.push(note('restitch-buttonholes', { moveUp: len(s) }));
    if (working) notes.push(note('buttonholes-closer-to-edge', { by: len(s) }));
    notes.push(note('remake-vent-corners', {}));
  }
  let ventAfter: Exact | null = null;
  let room: Exact | null = null;
  if (v.vent !== null) {
    ventAfter = method === 'cuff' ? v.vent.sub(s) : v.vent;
    const top = v.buttons === 0 ? ZERO : buttonsTop(v).sub(method === 'cuff' && working ? s : ZERO);
    room = ventAfter.sub(top).sub(v.ventMargin);
    if (room.sign() < 0 && v.buttons > 0) notes.push(note('vent-too-short-for-buttons', { shortBy: len(room.neg()), ...fitting(v, ventAfter, len) }));
  }
  const liningShorten = s.add(v.fold.sub(v.foldNow)).sub(v.pleat.sub(v.pleatNow));
  return {
    kind: 'sleeve',
    unit: v.unit,
    precision: v.precision,
    method,
    shortenBy: len(s),
    hemDepth: len(v.hemDepth),
    newEdgeAboveEdge: method === 'cuff' ? len(s) : null,
    cutAboveEdge: method === 'cuff' ? len(s.sub(v.hemDepth)) : null,
    buttons,
    buttonholesMoveUp: len(v.buttonholes === 'decorative' ? moveUp : ZERO),
    ventAfter: ventAfter === null ? null : len(ventAfter),
    ventRoom: room === null ? null : len(room),
    lining: { shortenBy: len(liningShorten), foldAboveEdge: len(v.fold), easePleat: len(v.pleat) },
    notes,
    cautions: ['blades-and-rippers', 'needles-and-pins', 'iron-and-steam'],
    sources: SLEEVE_SOURCES,
  };
}

// The top button's centre above the edge, as the buttons sit now.
function buttonsTop(v: SleeveValues): Exact {
  return v.bottom.add(v.spacing.mul(Exact.int(v.buttons - 1)));
}

// When the buttons no longer fit the shortened vent: the most that fit at their spacing, and the spacing that fits them all.
function fitting(v: SleeveValues, ventAfter: Exact, len: LenMaker): Record<string, NoteValue> {
  const space = ventAfter.sub(v.ventMargin).sub(v.bottom);
  const most = space.sign() < 0 ? 0 : Math.min(v.buttons, Math.floor(space.div(v.spacing).valueOf() + 1e-9) + 1);
  const out: Record<string, NoteValue> = { buttonsThatFit: most };
  // Floored to the display step: a spacing shown rounded up would not fit.
  if (v.buttons > 1 && space.sign() > 0) out.spacingThatFits = len(exactArith(v.unit, v.precision).floorStep(space.div(Exact.int(v.buttons - 1))));
  return out;
}
