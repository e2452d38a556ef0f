import type { ReactNode } from 'react';
import type { Unit } from '@/lib/allowance/types';
import { FlatCloth, ShortHatch, type Band, type FlatLine } from './FlatCloth';
import { ScaleBar } from './ScaleBar';
import { DRAWING_WIDTH as W, SECTION_X } from './section-drawing';

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
  return (
    <figure className="rounded-lg border-2 border-rule bg-card p-2">
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-labelledby={desc ? `${id}-title ${id}-desc` : `${id}-title`} className="h-auto w-full">
        <title id={`${id}-title`}>{title}</title>
        {desc && <desc id={`${id}-desc`}>{desc}</desc>}
        <ShortHatch />
        <text x={56} y={18} className="fill-muted text-[13px] font-semibold tracking-wider uppercase">Flat, from the pin mark down</text>
        <text x={W - 12} y={18} textAnchor="end" className="fill-muted text-[13px] font-semibold tracking-wider uppercase">Finished, in section</text>
        <FlatCloth lines={lines} rawMm={rawMm} aboveMm={aboveMm} s={s} yMark={yMark} x={56} width={130} bands={bands} />
        <line x1={SECTION_X - 70} x2={W - 12} y1={yMark} y2={yMark} className="stroke-rule" strokeWidth={1} strokeDasharray="2 4" />
        {children}
        <ScaleBar unit={unit} s={s} x={56} y={H - 16} />
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
