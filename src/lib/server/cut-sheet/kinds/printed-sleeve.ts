// The figures a sleeve's sheet prints, in whole display steps (1/8 or 1/16 in, 0.5 mm) so every
// sum holds as printed, each rounded to the side that keeps cloth (a sleeve cut too short cannot
// be put back; one a step long can be taken up at a fitting):
// - the shortening s: down (the sleeve never loses more than asked; at least one step);
// - the hem depth h: up, so the cutting line, s − h above the present edge, is never higher;
// - the lowest button's height and the spacing: to the nearest step (where the buttons sit), each
//   button the one below plus the spacing; it moves up s (or stays), so now + move − s = after;
// - the vent's length now: down; after = now − s (its top stays); the margin above the top button
//   up; room = vent after − top button − margin (fits only if it also does with the top button's
//   height rounded up); when they do not fit, how many do and the spacing that fits them all (down);
// - the lining: the fold and pleat wanted rounded to keep lining (fold down, pleat up), the fold
//   and pleat now the other way, so it is shortened s + (f′ − f) − (p′ − p), never more than exact.
// Only the wanted and measured inputs come from the input; which way the work goes is the plan's.
import type { SleeveInput, SleevePlan } from '../../../allowance/kind-types';
import { Exact } from '../../../allowance/exact';
import { InputReader } from '../../../allowance/read-input';
import { readSleeveInput } from '../../../allowance/sleeve-shorten';
import type { Len } from '../../../allowance/types';
import { down, near, StepScale, up } from '../printed';

/** A line on the sleeve's 1:1 strip. */
export type SleeveStripName = 'button' | 'new-edge' | 'cut' | 'present-edge' | 'present-seam' | 'new-seam' | 'lining-seam';

/** One button as printed: its centre above the present edge now, how far it moves up, its new centre there (now + move) and above the new edge (new centre − the shortening at the cuff). */
export interface PrintedSleeveButton {
  n: number;
  /** its chalk line on the strip, when it moves (null: it stays) */
  line: number | null;
  now: Len;
  moveUp: Len;
  newCentre: Len;
  aboveNewEdge: Len;
}

// A moved button's chalk line: after the new edge (1) and the cut (2), from the lowest button.
const BUTTON_LINE = 2;

/** One tick of the sleeve's strip, measured down from the strip's top (its highest line). */
export interface SleeveStripLine {
  name: SleeveStripName;
  /** the chalk line's number (0: the line the strip is laid on) */
  n: number;
  /** the button's number, lowest 1 */
  button?: number;
  cut: boolean;
  belowTop: Len;
  /** at the cuff: above the present edge (negative below); from the shoulder: below the present seam line */
  fromPresent: Len;
}

/** A sleeve plan as its sheet prints it. */
export interface PrintedSleeve {
  method: SleevePlan['method'];
  shortenBy: Len;
  hemDepth: Len;
  /** at the cuff: the cutting line, the hem depth below the new edge (above the present edge: new edge − hem depth, negative below) */
  cut: { belowNewEdge: Len; abovePresentEdge: Len } | null;
  buttons: PrintedSleeveButton[];
  spacing: Len | null;
  /** decorative buttonholes restitched this far up; 0 when they stay */
  buttonholesMoveUp: Len;
  /** null when the vent's length was not given */
  vent: {
    before: Len;
    after: Len;
    topButton: Len | null;
    margin: Len;
    /** vent after − top button − margin, as printed */
    room: Len;
    /** the buttons fit: the printed room, and the room with the top button's height rounded up, are not negative */
    fits: boolean;
    shortBy: Len | null;
    buttonsThatFit: number;
    /** all the buttons fit this far apart (floored), when they do not fit as they are */
    spacingThatFits: Len | null;
  } | null;
  lining: { shortenBy: Len; foldChange: Len; pleatChange: Len; fold: Len; foldNow: Len; pleat: Len; pleatNow: Len };
  strip: SleeveStripLine[];
}

/** Works out every figure a sleeve's sheet prints, in whole steps (see the rules at the top). */
export function printedSleeve(plan: SleevePlan, input: SleeveInput): PrintedSleeve {
  const v = readSleeveInput(input, new InputReader(input, false));
  const st = new StepScale(plan.unit, plan.precision);
  const of = (mm: { valueOf(): number }) => st.of(mm.valueOf());
  const cuff = plan.method === 'cuff';
  const S = Math.max(1, down(of(v.shortenBy)));
  const H = Math.max(1, up(of(v.hemDepth)));
  // The edge comes up S at the cuff; from the shoulder it stays where it is.
  const E = cuff ? S : 0;
  const moves = cuff && v.buttonholes !== 'working';
  const M = moves ? S : 0;
  const B = Math.max(1, near(of(v.bottom)));
  const Sp = Math.max(1, near(of(v.spacing)));
  const buttons = Array.from({ length: v.buttons }, (_, k) => {
    const now = B + k * Sp;
    return { n: k + 1, now, moveUp: M, after: now + M - E };
  });
  let vent: PrintedSleeve['vent'] = null;
  if (v.vent !== null) {
    const before = down(of(v.vent));
    const after = before - E;
    const last = buttons.at(-1);
    const margin = up(of(v.ventMargin));
    const room = after - (last?.after ?? 0) - margin;
    // The top button's height rounded up, beside the printed one (the nearest): fits only if both do.
    const topUp = last ? up(of(v.bottom.add(v.spacing.mul(Exact.int(v.buttons - 1))))) + M - E : 0;
    const least = Math.min(room, after - topUp - margin);
    const fits = !last || least >= 0;
    // What does fit, from the printed figures: the buttons at their spacing, or all of them closer (floored).
    const space = after - margin - (buttons[0]?.after ?? 0);
    vent = {
      before: st.len(before),
      after: st.len(after),
      topButton: last ? st.len(last.after) : null,
      margin: st.len(margin),
      room: st.len(room),
      fits,
      shortBy: fits ? null : st.len(Math.max(1, -least)),
      buttonsThatFit: fits ? buttons.length : space < 0 ? 0 : Math.min(buttons.length, Math.floor(space / Sp) + 1),
      spacingThatFits: fits || buttons.length < 2 || space < buttons.length - 1 ? null : st.len(Math.floor(space / (buttons.length - 1))),
    };
  }
  const fold = down(of(v.fold));
  const foldNow = up(of(v.foldNow));
  const pleat = up(of(v.pleat));
  const pleatNow = down(of(v.pleatNow));
  const lining = S + (fold - foldNow) - (pleat - pleatNow);
  return {
    method: plan.method,
    shortenBy: st.len(S),
    hemDepth: st.len(H),
    cut: cuff ? { belowNewEdge: st.len(H), abovePresentEdge: st.len(S - H) } : null,
    buttons: buttons.map((b) => ({
      n: b.n,
      line: moves ? BUTTON_LINE + b.n : null,
      now: st.len(b.now),
      moveUp: st.len(b.moveUp),
      newCentre: st.len(b.now + b.moveUp),
      aboveNewEdge: st.len(b.after),
    })),
    spacing: v.buttons > 0 ? st.len(Sp) : null,
    buttonholesMoveUp: st.len(cuff && v.buttonholes === 'decorative' ? S : 0),
    vent,
    lining: {
      shortenBy: st.len(lining),
      foldChange: st.len(fold - foldNow),
      pleatChange: st.len(pleat - pleatNow),
      fold: st.len(fold),
      foldNow: st.len(foldNow),
      pleat: st.len(pleat),
      pleatNow: st.len(pleatNow),
    },
    strip: stripOf(st, cuff, S, H, moves ? buttons : [], lining),
  };
}

// The strip's lines from its highest: at the cuff the moved buttons' new centres, the new edge, the
// cutting line and the present edge (the line it is laid on); from the shoulder the sleeve head's
// seam lines, laid on the present one. Numbered in the order they are chalked: the new edge 1, the
// cut 2, then the buttons from the lowest (from the shoulder: the new seam 1, the lining's 2).
function stripOf(st: StepScale, cuff: boolean, S: number, H: number, moved: { n: number; after: number }[], lining: number): SleeveStripLine[] {
  // Heights above the present edge (cuff) or below the present seam line (shoulder, negated).
  const lines: (Omit<SleeveStripLine, 'belowTop' | 'fromPresent'> & { at: number })[] = [];
  if (cuff) {
    for (const b of moved) lines.push({ name: 'button', n: BUTTON_LINE + b.n, button: b.n, cut: false, at: S + b.after });
    lines.push({ name: 'new-edge', n: 1, cut: false, at: S }, { name: 'cut', n: 2, cut: true, at: S - H }, { name: 'present-edge', n: 0, cut: false, at: 0 });
  } else {
    lines.push({ name: 'present-seam', n: 0, cut: false, at: 0 }, { name: 'new-seam', n: 1, cut: false, at: -S });
    if (lining > 0 && lining !== S) lines.push({ name: 'lining-seam', n: 2, cut: false, at: -lining });
  }
  const top = Math.max(...lines.map((l) => l.at));
  // Stable: a cut on the present edge stays above it.
  return lines.sort((a, b) => b.at - a.at).map(({ at, ...l }) => ({ ...l, belowTop: st.len(top - at), fromPresent: st.len(cuff ? at : -at) }));
}
