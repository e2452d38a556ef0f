import type { CuffLine, HemLine } from '@/lib/allowance/types';
import type { Label } from './DrawingLabels';
import type { FlatLine } from './FlatCloth';
import { LINE_NAMES } from './line-names';

/** Width of the flat-and-section drawings, in px. */
export const DRAWING_WIDTH = 720;
/** Width of a flat-and-section drawing stacked for a narrow screen, in px. */
export const NARROW_WIDTH = 400;
/** How far left the section moves when stacked, in px: its labels start about 320 px in. */
export const NARROW_SHIFT = 320;
/** Where the leg runs down in the section view, in px from the left. */
export const SECTION_X = 510;
/** Gap between layers in the section, in px: cloth thickness is not to scale. */
export const LAYER_GAP = 9;

/** A drawing's vertical scale: px per mm, the pin mark's height, the whole height, and mm above the mark to px. */
export interface SectionScale {
  s: number;
  yMark: number;
  H: number;
  up: (mm: number) => number;
}

/** Fits the cloth from aboveMm over the mark down past the cut or raw edge into room px, at most 4 px per mm. */
export function sectionScale(aboveMm: number, cutMm: number, rawMm: number | null, room: number): SectionScale {
  const belowMm = Math.max(cutMm, rawMm ?? 0) + 12;
  const s = Math.min(4, room / (aboveMm + belowMm));
  const yMark = 34 + aboveMm * s;
  const H = yMark + belowMm * s + 52;
  return { s, yMark, H, up: (mm) => yMark - mm * s };
}

/** A plan's chalk lines as the flat cloth draws them. */
export function flatLines(lines: (CuffLine | HemLine)[]): FlatLine[] {
  return lines.map((l) => ({ n: l.n, label: LINE_NAMES[l.name], mm: l.belowMark.mm, text: l.belowMark.text, cut: l.name === 'cut' }));
}

/** The raw edge turned under at the top of the inside layer: its path on from the layer above, and its two labels. */
export function turnUnder(xt: number, yIn: number, depthPx: number, cutN: number): { path: string; labels: Label[] } {
  const r = LAYER_GAP / 2;
  return {
    path: `V${yIn + r} A${r},${r} 0 0 1 ${xt},${yIn + r} V${yIn + depthPx}`,
    labels: [
      { y: yIn + 4, to: [xt - 3, yIn + r], text: 'turn-under' },
      { y: yIn + depthPx + 10, to: [xt - 2, yIn + depthPx], text: 'cut edge', n: [cutN], cut: true },
    ],
  };
}
