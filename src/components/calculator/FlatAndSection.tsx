import { useRef, type ReactNode } from 'react';
import type { Unit } from '@/lib/allowance/types';
import { FlatCloth, ShortHatch, type Band, type FlatLine } from './FlatCloth';
import { ScaleBar } from './ScaleBar';
import { DRAWING_WIDTH as W, NARROW_SHIFT, NARROW_WIDTH, SECTION_X } from './section-drawing';
import { useNarrow } from './use-narrow';

// Side by side, the smallest words (13 px) stay at 12 px or more down to this width on screen;
// narrower, the flat cloth and the section stack, with every word at 16 px (13 px or more on a phone).
const SIDE_BY_SIDE_MIN_PX = 680;

interface Props {
  /** prefix of the title's (and description's) element ids */
  id: string;
  title: string;
  desc?: string;
  unit: Unit;
  lines: FlatLine[];
  rawMm: number | null;
  /** leg shown above the mark on the flat cloth */
  aboveMm: number;
  bands: Band[];
  s: number;
  yMark: number;
  H: number;
  /** the finished section, drawn on the right */
  children: ReactNode;
}

/** A figure of the cloth flat on the left and finished in section on the right, with the pin mark across and a scale bar. */
export function FlatAndSection({ id, title, desc, unit, lines, rawMm, aboveMm, bands, s, yMark, H, children }: Props) {
  const ref = useRef<HTMLElement>(null);
  const narrow = useNarrow(ref, SIDE_BY_SIDE_MIN_PX);
  return (
    <figure ref={ref} className="rounded-lg border-2 border-rule bg-card p-2 break-inside-avoid">
      <svg
        // The section reaches little below the pin mark: its frame ends just under the finished edge's label.
        viewBox={narrow ? `0 0 ${NARROW_WIDTH} ${H + yMark + 44}` : `0 0 ${W} ${H}`}
        role="img"
        aria-labelledby={desc ? `${id}-title ${id}-desc` : `${id}-title`}
        data-layout={narrow ? 'stacked' : 'side-by-side'}
        className={`h-auto w-full print:max-h-[8in] ${narrow ? '[&_text]:text-[16px]' : ''}`}
      >
        <title id={`${id}-title`}>{title}</title>
        {desc && <desc id={`${id}-desc`}>{desc}</desc>}
        <ShortHatch />
        <text x={56} y={18} className="fill-muted text-[13px] font-semibold tracking-wider uppercase">
          Flat, from the pin mark down
        </text>
        <FlatCloth lines={lines} rawMm={rawMm} aboveMm={aboveMm} s={s} yMark={yMark} x={56} width={130} bands={bands} />
        <ScaleBar unit={unit} s={s} x={56} y={H - 16} />
        {/* Stacked, the section moves below the flat cloth and left into the narrow frame. */}
        <g transform={narrow ? `translate(${-NARROW_SHIFT} ${H})` : undefined}>
          <text x={W - 12} y={18} textAnchor="end" className="fill-muted text-[13px] font-semibold tracking-wider uppercase">
            Finished, in section
          </text>
          <line x1={SECTION_X - 70} x2={W - 12} y1={yMark} y2={yMark} className="stroke-rule" strokeWidth={1} strokeDasharray="2 4" />
          {children}
        </g>
      </svg>
    </figure>
  );
}

/** One layer of cloth in the section; the accented one (the cuff face) drawn heavier. */
export function SectionPath({ d, accent = false }: { d: string; accent?: boolean }) {
  return (
    <path d={d} fill="none" className={accent ? 'stroke-accent' : 'stroke-ink'} strokeWidth={accent ? 5 : 3} strokeLinecap="round" strokeLinejoin="round" />
  );
}
