// The full-size chalk guide worked out in points: 1 in = 72 pt exactly, 25 mm = 70.866 pt.
import type { Unit } from '@/lib/allowance/types';
import type { SheetLegGroup } from './content';

const PT_PER_MM = 72 / 25.4;

/** Side of the inch calibration square, in points. */
export const INCH_PT = 72;
/** Side of the 25 mm calibration square, in points. */
export const MM25_PT = 25 * PT_PER_MM;

/** One chalk line on the strip. */
export interface GuideTick {
  y: number;
  n: number;
  name: string;
  text: string;
  cut: boolean;
}

/** One strip, for both legs or for one of them. */
export interface GuideStrip {
  label: string;
  length: number;
  ticks: GuideTick[];
  /** the plan's lines that fall beyond the end of the paper */
  beyond: GuideTick[];
  /** ruler marks along the edge: y and length in points */
  ruler: { y: number; len: number; label: string | null }[];
}

const SHORT: Record<string, string> = {
  'Finished edge': 'finished edge',
  'Cuff top': 'cuff top',
  'Inner fold': 'inner fold',
  'Cutting line': 'CUT',
};

function ruler(unit: Unit, length: number): GuideStrip['ruler'] {
  const marks: GuideStrip['ruler'] = [];
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

/** Lays out one strip per group, each at most maxLength points long (the paper's limit). */
export function guideStrips(groups: SheetLegGroup[], unit: Unit, maxLength: number): GuideStrip[] {
  return groups.map((g) => {
    const ticks = g.lines.map((l) => ({
      y: l.belowMark.mm * PT_PER_MM,
      n: l.n,
      name: SHORT[l.name] ?? l.name,
      text: l.belowMark.text,
      cut: l.cut,
    }));
    const deepest = Math.max(...ticks.map((t) => t.y));
    const length = Math.min(maxLength, deepest + 26);
    return {
      // A sloped hem's lines are planned at the back, where the pin is.
      label: (g.label === 'Both legs' ? g.label : g.label.replace(' leg', '')) + (g.slopeNote ? ', at the back' : ''),
      length,
      ticks: ticks.filter((t) => t.y <= length),
      beyond: ticks.filter((t) => t.y > length),
      ruler: ruler(unit, length),
    };
  });
}
