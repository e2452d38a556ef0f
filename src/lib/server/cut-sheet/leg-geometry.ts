// The leg-bottom drawing worked out in points, to a true scale, for the PDF and any other renderer.
import type { CuffLeg, HemLeg } from '../../shared/cut-sheet-types';
import { translator, type Translate } from '../i18n/catalog';

const EN = translator('en');

const PT_PER_MM = 72 / 25.4;
// A trouser leg about 8 1/2 in across, flat, when the shop has not measured it (common practice, no source).
const NOMINAL_WIDTH_MM = 215.9;
const SCALES = [2, 3, 4, 5, 6, 8, 10, 12] as const;
const LABEL_ROOM = 30;
const TOP_ROOM = 4;
const FOOT_ROOM = 14;

/** One labelled line across the drawing. */
export interface DrawnLine {
  y: number;
  label: string;
  cut: boolean;
}

/** Everything the drawing needs, in points within its box. */
export interface LegGeometry {
  width: number;
  height: number;
  /** 1:scale */
  scale: number;
  /** the leg outline: left side top→bottom, then right side bottom→top */
  outline: [number, number][];
  lines: DrawnLine[];
  /** the strip that is cut away, between the cutting line and the raw edge */
  cutAway: [number, number][];
  /** where the seams must run to keep the cuff-top width straight down, when the leg tapers */
  seams: { x1: number; x2: number; y1: number; y2: number }[];
  rawEdgeKnown: boolean;
  widthMeasured: boolean;
  caption: string;
}

/** Lays out the leg-bottom drawing to the largest scale that fits a box of width × maxHeight points. */
export function legGeometry(leg: CuffLeg | HemLeg, width: number, maxHeight: number, t: Translate = EN): LegGeometry {
  const plan = leg.plan;
  const cut = plan.lines[plan.lines.length - 1]!;
  // The raw edge below the mark: the first line's distances both ways (a hem's edge may sit below the mark).
  const first = plan.lines[0];
  const raw = first?.aboveRawEdge ? first.aboveRawEdge.mm + first.belowMark.mm : null;
  const above = plan.kind === 'cuff' ? plan.cuffDepth.mm : 25.4;
  // The leg ends at the raw edge when it is known; a cut below it falls off the cloth, as drawn.
  const legEnd = raw ?? cut.belowMark.mm + 12.7;
  const below = Math.max(legEnd, cut.belowMark.mm + 6);
  const taper = leg.finish === 'cuff' ? leg.taper?.plan : undefined;

  // Flat width at a depth below the pin mark: the taper followed down, or a plain straight leg.
  let widthAt = (_y: number) => NOMINAL_WIDTH_MM;
  if (taper && taper.lines.length >= 2) {
    const a = taper.lines[0]!;
    const b = taper.lines[taper.lines.length - 1]!;
    const slope = (b.width.mm - a.width.mm) / (b.belowMark.mm - a.belowMark.mm || 1);
    widthAt = (y) => a.width.mm + slope * (y - a.belowMark.mm);
  }
  const widest = Math.max(widthAt(-above), widthAt(below), taper?.targetWidth.mm ?? 0);
  const spanMm = above + below;
  const drawW = width - LABEL_ROOM;
  const drawH = maxHeight - TOP_ROOM - FOOT_ROOM;
  // Past the usual scales (a very long cloth below the mark) the smallest whole scale that fits,
  // so the drawing never runs out of its box onto the steps below.
  const scale =
    SCALES.find((k) => (widest / k) * PT_PER_MM <= drawW && (spanMm / k) * PT_PER_MM <= drawH) ??
    Math.max(16, Math.ceil(Math.max((widest * PT_PER_MM) / drawW, (spanMm * PT_PER_MM) / drawH)));
  const k = PT_PER_MM / scale;

  const cx = drawW / 2;
  const y0 = TOP_ROOM + above * k;
  const Y = (mm: number) => y0 + mm * k;
  const half = (mm: number) => (widthAt(mm) * k) / 2;
  const top = -above;
  const outline: [number, number][] = [
    [cx - half(top), Y(top)],
    [cx - half(legEnd), Y(legEnd)],
    [cx + half(legEnd), Y(legEnd)],
    [cx + half(top), Y(top)],
  ];
  const cy = cut.belowMark.mm;
  const cutAway: [number, number][] =
    cy < legEnd
      ? [
          [cx - half(cy), Y(cy)],
          [cx - half(legEnd), Y(legEnd)],
          [cx + half(legEnd), Y(legEnd)],
          [cx + half(cy), Y(cy)],
        ]
      : [];
  const lines = plan.lines.map((l) => ({
    y: Y(l.belowMark.mm),
    label: l.name === 'cut' ? t('sheet.drawing.cut', { n: l.n }) : String(l.n),
    cut: l.name === 'cut',
  }));
  const seams =
    taper && !taper.withinTolerance
      ? [-1, 1].map((side) => {
          const x = cx + (side * taper.targetWidth.mm * k) / 2;
          return { x1: x, x2: x, y1: Y(-above), y2: Y(cy) };
        })
      : [];
  const height = Y(below) + FOOT_ROOM;
  const caption = t('sheet.drawing.caption', { scale: String(scale), width: taper ? 'yes' : 'no', raw: raw === null ? 'no' : 'yes' });
  return { width, height, scale, outline, lines, cutAway, seams, rawEdgeKnown: raw !== null, widthMeasured: !!taper, caption };
}
