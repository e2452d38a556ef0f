import { useId, useState } from 'react';
import type { PageSize } from '@/lib/shared/cut-sheet-types';
import { PrintOutcome, usePrintSheet } from '@/components/cut-sheets/use-print-sheet';
import { useLanguage, useT } from '@/components/I18n';

interface Props {
  /** the plan request as typed (unit included), or null while there is nothing to print */
  body: Record<string, unknown> | null;
  /** why there is nothing to print yet */
  blocked: string | null;
}

/** Prints the calculator's plan as a cut sheet (POST /api/plan/sheet) on Letter or A4, in the unit chosen. */
export function PrintPlan({ body, blocked }: Props) {
  const t = useT();
  const language = useLanguage();
  // A metric plan starts on A4, an inch plan on Letter.
  const metric = body?.unit === 'mm' || body?.unit === 'cm';
  const [chosen, setPage] = useState<PageSize | null>(null);
  const page: PageSize = chosen ?? (metric ? 'A4' : 'LETTER');
  const { state, print } = usePrintSheet();
  const id = useId();
  const onPrint = () =>
    body &&
    print(() =>
      fetch('/api/plan/sheet', {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ ...body, pageSize: page, language }),
      }),
    );
  return (
    <section aria-labelledby={`${id}-h`} className="flex flex-wrap items-end gap-3 rounded-lg border-2 border-rule bg-card p-4 print:hidden">
      <h2 id={`${id}-h`} className="w-full text-xl font-extrabold">
        {t('calc.sheet')}
      </h2>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-page`} className="font-semibold">
          {t('calc.paper')}
        </label>
        <select
          id={`${id}-page`}
          value={page}
          onChange={(e) => setPage(e.target.value as PageSize)}
          className="min-h-12 rounded-md border-2 border-rule bg-card px-2 text-lg focus:border-accent"
        >
          <option value="LETTER">Letter</option>
          <option value="A4">A4</option>
        </select>
      </div>
      <button
        type="button"
        onClick={onPrint}
        disabled={!body || state.status === 'busy'}
        className="min-h-12 rounded-lg bg-accent px-5 text-lg font-bold text-white disabled:opacity-60"
      >
        {state.status === 'busy' ? t('calc.making') : t('calc.print')}
      </button>
      {blocked && <p className="w-full text-base text-muted">{blocked}</p>}
      <PrintOutcome state={state} filename="cut-sheet.pdf" />
    </section>
  );
}
