import { useId, useState } from 'react';
import { SCALE_LABELS, SCALES, scaleUnit, type Scale } from '@/lib/bench-requests';

interface Props {
  garmentId: string;
  /** the shop's own scale, chosen first */
  scale: Scale;
}

/** The address of a garment's cut sheet in the chosen scale and paper. */
export function sheetHref(garmentId: string, scale: Scale, page: 'LETTER' | 'A4'): string {
  const { unit, precision } = scaleUnit(scale);
  const q = new URLSearchParams({ unit, page });
  if (unit === 'in') q.set('precision', String(precision));
  return `/api/garments/${encodeURIComponent(garmentId)}/sheet?${q}`;
}

/** "Print cut sheet": choose the unit and paper, open the PDF in a new tab. */
export default function PrintCutSheet({ garmentId, scale: initial }: Props) {
  const [scale, setScale] = useState<Scale>(initial);
  const [page, setPage] = useState<'LETTER' | 'A4'>('LETTER');
  const id = useId();
  const select = 'min-h-12 rounded-md border-2 border-rule bg-card px-2 text-lg focus:border-accent';
  return (
    <section aria-labelledby={`${id}-h`} className="mt-6 flex flex-wrap items-end gap-3 rounded-lg border-2 border-rule bg-card p-4">
      <h2 id={`${id}-h`} className="sr-only">Cut sheet</h2>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-unit`} className="font-semibold">Sheet in</label>
        <select id={`${id}-unit`} value={scale} onChange={(e) => setScale(e.target.value as Scale)} className={select}>
          {SCALES.map((s) => (
            <option key={s} value={s}>{SCALE_LABELS[s]}</option>
          ))}
        </select>
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-page`} className="font-semibold">Paper</label>
        <select id={`${id}-page`} value={page} onChange={(e) => setPage(e.target.value as 'LETTER' | 'A4')} className={select}>
          <option value="LETTER">Letter</option>
          <option value="A4">A4</option>
        </select>
      </div>
      <a href={sheetHref(garmentId, scale, page)} target="_blank" rel="noopener" className="inline-flex min-h-12 items-center rounded-lg bg-accent px-5 text-lg font-bold text-white">
        Print cut sheet
      </a>
    </section>
  );
}
