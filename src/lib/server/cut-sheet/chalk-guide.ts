// The full-size chalk guide worked out in points: 1 in = 72 pt exactly, 25 mm = 70.866 pt.
import type { Len, Unit } from '@/lib/allowance/types';

/** What a strip needs of a leg group (content.ts's SheetLegGroup has these; declared here so the
 * sheet's content can use the ruler without an import cycle). */
export interface GuideGroup {
  label: string;
  slopeNote: string | null;
  /** the strip's heading in the sheet's language (else worked out from the English label) */
  stripLabel?: string;
  /** short: the line's name on the strip in the sheet's language (else from the English name) */
  lines: { n: number; name: string; short?: string; cut: boolean; belowMark: Len }[];
  /** where the strip's top is laid, when not on the pin mark (a kept factory hem's: on the join) */
  top?: string;
}

const PT_PER_MM = 72 / 25.4;

/** One inch, in points. */
export const INCH_PT = 72;

/** The printer check: a short tape-measure ruler in the sheet's unit, its ticks across in points from its 0. */
export interface CheckRuler {
  /** from the 0 tick to the last, in points */
  length: number;
  /** what it must measure on paper, as said on the sheet ("2 in", "5 cm", "50 mm") */
  says: string;
  ticks: { x: number; len: number; label: string | null }[];
}

/** The check ruler for a sheet in this unit: 2 in by eighths, or 5 cm by millimetres (numbered in cm, or every 10 mm on a mm sheet); it fits the guide column. */
export function checkRuler(unit: Unit): CheckRuler {
  const ticks: CheckRuler['ticks'] = [];
  if (unit === 'in') {
    for (let i = 0; i <= 16; i++) {
      const inch = i % 8 === 0;
      ticks.push({ x: i * 9, len: inch ? 12 : i % 4 === 0 ? 9 : i % 2 === 0 ? 6 : 4, label: inch ? `${i / 8}` : null });
    }
    return { length: 16 * 9, says: '2 in', ticks };
  }
  for (let i = 0; i <= 50; i++) {
    const cm = i % 10 === 0;
    ticks.push({ x: i * PT_PER_MM, len: cm ? 12 : i % 5 === 0 ? 8 : 4, label: cm ? `${unit === 'mm' ? i : i / 10}` : null });
  }
  return { length: 50 * PT_PER_MM, says: unit === 'mm' ? '50 mm' : '5 cm', ticks };
}

/** One chalk line on the strip. */
export interface GuideTick {
  y: number;
  /** the top of its label, down the segment: just below the tick, or lower when the tick above's label reaches there */
  labelY: number;
  /** another line's bar runs through its label: the label is set on paper white, the bar showing either side */
  crossed?: boolean;
  n: number;
  name: string;
  text: string;
  cut: boolean;
}

/** Where two segments of one strip line up: the same cloth distance drawn on both. */
export interface MatchMark {
  /** down the segment, in points */
  y: number;
  /** below the pin mark, in points */
  cloth: number;
  letter: string;
}

/** One piece of a strip at 1:1; a strip longer than the paper allows is cut into several, each overlapping the next at a match mark. */
export interface GuideSegment {
  /** distance below the pin mark of the segment's top edge, in points */
  from: number;
  length: number;
  /** y down the segment */
  ticks: GuideTick[];
  ruler: { y: number; len: number; label: string | null }[];
  /** the mark shared with the segment before (near the top) */
  matchAbove: MatchMark | null;
  /** the mark shared with the segment after (near the bottom) */
  matchBelow: MatchMark | null;
}

/** One strip, for both legs or for one of them. */
export interface GuideStrip {
  label: string;
  /** where its top is laid, when not on the pin mark */
  top?: string;
  segments: GuideSegment[];
}

const SHORT: Record<string, string> = {
  'Finished edge': 'finished edge',
  'Cuff top': 'cuff top',
  'Inner fold': 'inner fold',
  'Cutting line': 'CUT',
};

function ruler(unit: Unit, length: number): GuideSegment['ruler'] {
  const marks: GuideSegment['ruler'] = [];
  if (unit === 'in') {
    for (let i = 1; i * 9 <= length; i++) {
      const inch = i % 8 === 0;
      marks.push({ y: i * 9, len: inch ? 12 : i % 4 === 0 ? 8 : i % 2 === 0 ? 5 : 3, label: inch ? `${i / 8}` : null });
    }
  } else {
    for (let i = 1; i * PT_PER_MM <= length; i++) {
      const cm = i % 10 === 0;
      marks.push({ y: i * PT_PER_MM, len: cm ? 12 : i % 5 === 0 ? 8 : 4, label: cm ? `${i / 10}` : null });
    }
  }
  return marks;
}

/** Room below a tick for its two lines of label (number and name, then the distance). */
export const TICK_LABEL = 26;
// A match mark takes its line and, above it, one line of text ("match ▲ A").
const MATCH_ABOVE = 14;
// A tick's label may wrap its name onto a second line in a narrow column: three lines in all.
const TICK_LABEL_WRAPPED = 36;
const MATCH_BELOW = 3;
// A segment ends this far below its match mark, and the next starts this far above it.
const END_BELOW_MATCH = 6;
const START_ABOVE_MATCH = MATCH_ABOVE + 4;

// Where to cut a strip: the deepest point, no lower than `limit`, whose match mark and its text
// touch no tick or tick label, so every line keeps its number, name and distance whole on one segment.
function matchPoint(ticks: GuideTick[], from: number, limit: number): number {
  const free = (m: number) => ticks.every((t) => t.y + TICK_LABEL_WRAPPED < m - MATCH_ABOVE || t.y - 2 > m + MATCH_BELOW);
  for (let m = Math.floor(limit); m > from + START_ABOVE_MATCH + 24; m--) if (free(m)) return m;
  return limit;
}

/** Lays out one strip per group, each cut into segments of at most maxLength points (the paper's limit), every chalk line on one of them. */
export function guideStrips(groups: GuideGroup[], unit: Unit, maxLength: number): GuideStrip[] {
  // Letters run on across the strips, so the left leg's A is never laid on the right leg's.
  let letter = 0;
  return groups.map((g) => {
    // Lines closer than a label's height (a kept factory hem's join and cuts can be 1/4 in apart):
    // each label starts below the one above it, still carrying its line's number and distance.
    let labelBottom = Number.NEGATIVE_INFINITY;
    const ticks = g.lines
      .map((l) => {
        const y = l.belowMark.mm * PT_PER_MM;
        const name = l.short ?? SHORT[l.name] ?? l.name;
        const labelY = Math.max(y + 2, labelBottom + 1);
        labelBottom = labelY + (name.length > 9 ? TICK_LABEL_WRAPPED : TICK_LABEL) - 2;
        return { y, labelY, labelBottom, n: l.n, name, text: l.belowMark.text, cut: l.cut };
      })
      .map(({ labelBottom: bottom, ...t }, _i, all) => (all.some((o) => o.y > t.labelY && o.y < bottom) ? { ...t, crossed: true } : t));
    const end = Math.max(Math.max(...ticks.map((t) => t.y)) + TICK_LABEL, labelBottom + 2);
    const marks = ruler(unit, end);
    const segments: GuideSegment[] = [];
    let from = 0;
    let above: MatchMark | null = null;
    for (;;) {
      const last = end - from <= maxLength;
      const m = last ? 0 : matchPoint(ticks, from, from + maxLength - END_BELOW_MATCH);
      const to = last ? end : m + END_BELOW_MATCH;
      const below: MatchMark | null = last ? null : { y: m - from, cloth: m, letter: String.fromCharCode(65 + letter++) };
      segments.push({
        from,
        length: to - from,
        ticks: ticks.filter((t) => t.y >= from && t.y < to && (last || t.y < m)).map((t) => ({ ...t, y: t.y - from, labelY: t.labelY - from })),
        ruler: marks.filter((r) => r.y > from && r.y <= to).map((r) => ({ ...r, y: r.y - from })),
        matchAbove: above,
        matchBelow: below,
      });
      if (last) break;
      from = m - START_ABOVE_MATCH;
      above = { y: START_ABOVE_MATCH, cloth: m, letter: below!.letter };
    }
    return {
      ...(g.top ? { top: g.top } : {}),
      // A sloped hem's lines are planned at the back, where the pin is.
      label: g.stripLabel ?? (g.label === 'Both legs' ? g.label : g.label.replace(' leg', '')) + (g.slopeNote ? ', at the back' : ''),
      segments,
    };
  });
}
