import { useT } from '@/components/I18n';
import { useId, useState } from 'react';
import { SCALE_LABELS, SCALES, scaleUnit, type Scale } from '@/lib/shared/bench-requests';
import { PrintOutcome, usePrintSheet } from './use-print-sheet';

interface Props {
  garmentId: string;
  /** the shop's own scale, chosen first */
  scale: Scale;
  /** the fitting on screen has changes not yet saved: the sheet would print the saved ones */
  unsaved?: boolean;
  /** saves the fitting on screen; true once saved */
  save?: () => Promise<boolean>;
}

/** The address of a garment's cut sheet in the chosen scale and paper. */
export function sheetHref(garmentId: string, scale: Scale, page: 'LETTER' | 'A4'): string {
  const { unit, precision } = scaleUnit(scale);
  const q = new URLSearchParams({ unit, page });
  if (unit === 'in') q.set('precision', String(precision));
  return `/api/garments/${encodeURIComponent(garmentId)}/sheet?${q}`;
}

/** "Print cut sheet": choose the unit and paper, fetch the PDF and open it; unsaved changes are saved first or said. */
export function PrintCutSheet({ garmentId, scale: initial, unsaved = false, save }: Props) {
  const [scale, setScale] = useState<Scale>(initial);
  // A metric shop prints on A4, an inch shop on Letter, until the paper is chosen here.
  const [page, setPage] = useState<'LETTER' | 'A4'>(scaleUnit(initial).unit === 'in' ? 'LETTER' : 'A4');
  const t = useT();
  const [asking, setAsking] = useState(false);
  const [notSaved, setNotSaved] = useState(false);
  const { state, print } = usePrintSheet();
  const id = useId();
  const select = 'min-h-12 rounded-md border-2 border-rule bg-card px-2 text-lg focus:border-accent';
  const printSaved = () => {
    setAsking(false);
    setNotSaved(false);
    void print(() => fetch(sheetHref(garmentId, scale, page), { credentials: 'same-origin' }));
  };
  const saveThenPrint = async () => {
    setAsking(false);
    const ok = save ? await save() : false;
    if (ok) printSaved();
    else setNotSaved(true);
  };
  return (
    <section aria-labelledby={`${id}-h`} className="flex flex-wrap items-end gap-3 rounded-lg border-2 border-rule bg-card p-4">
      <h2 id={`${id}-h`} className="sr-only">
        {t('calc.sheet')}
      </h2>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-unit`} className="font-semibold">
          {t('print.sheetIn')}
        </label>
        <select id={`${id}-unit`} value={scale} onChange={(e) => setScale(e.target.value as Scale)} className={select}>
          {SCALES.map((s) => (
            <option key={s} value={s}>
              {SCALE_LABELS[s]}
            </option>
          ))}
        </select>
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-page`} className="font-semibold">
          {t('calc.paper')}
        </label>
        <select id={`${id}-page`} value={page} onChange={(e) => setPage(e.target.value as 'LETTER' | 'A4')} className={select}>
          <option value="LETTER">Letter</option>
          <option value="A4">A4</option>
        </select>
      </div>
      <button
        type="button"
        disabled={state.status === 'busy'}
        onClick={() => (unsaved ? setAsking(true) : printSaved())}
        className="min-h-12 rounded-lg bg-accent px-5 text-lg font-bold text-white disabled:opacity-60"
      >
        {state.status === 'busy' ? t('calc.making') : t('calc.print')}
      </button>
      {asking && unsaved && (
        <div role="alert" className="flex w-full flex-col gap-2 rounded border-2 border-warn bg-warn-soft px-3 py-2 text-lg font-semibold text-warn">
          <p>{t('print.unsavedAsk')}</p>
          <div className="flex flex-wrap gap-3">
            {save && (
              <button type="button" onClick={() => void saveThenPrint()} className="min-h-11 rounded bg-accent px-4 text-white">
                {t('print.saveThen')}
              </button>
            )}
            <button type="button" onClick={printSaved} className="min-h-11 rounded border-2 border-warn bg-card px-4">
              {t('print.saved')}
            </button>
          </div>
        </div>
      )}
      {notSaved && (
        <p role="alert" className="w-full rounded border-2 border-cut bg-cut-soft px-3 py-2 text-lg font-semibold text-cut">
          {t('print.notSaved')}
        </p>
      )}
      <PrintOutcome state={state} filename="cut-sheet.pdf" />
    </section>
  );
}
