import { useT } from '@/components/I18n';
import type { Precision, Unit } from '@/lib/allowance/types';
import type { MessageKey } from '@/lib/shared/i18n/format';
import type { LegValues } from '@/lib/shared/measurement-request';
import { shrinkNoteOf } from '@/lib/shared/fitting/shrink-note';

/** A hem left long for unwashed cloth: the figures the sheet prints (edge, unwashed hem allowance, cut, the percent and its source), the wash-first advice and the caution; nothing with no unwashed cloth chosen. */
export function ShrinkPlanView({ leg, values, unit, precision }: { leg: string; values: LegValues; unit: Unit; precision: Precision }) {
  const t = useT();
  const note = shrinkNoteOf(values, values.finish, unit, precision);
  if (!note) return null;
  const cloth = t(`shrink.cloth.${note.cloth}` as MessageKey);
  return (
    <section
      data-testid={`shrink-${leg}`}
      aria-labelledby={`shrink-${leg}-heading`}
      className="flex flex-col gap-2 rounded-lg border-2 border-warn bg-card px-4 py-3"
    >
      <h3 id={`shrink-${leg}-heading`} className="text-xl font-extrabold">
        {t('shrink.heading')}
      </h3>
      {note.code === 'none' ? (
        <p className="text-lg">{t('shrink.noShrinkage', { cloth })}</p>
      ) : (
        <>
          <p className="text-lg">{t('shrink.percent', { cloth, percent: note.percent, source: note.source })}</p>
          <ul className="measure flex flex-col gap-1 text-xl font-extrabold">
            <li data-testid={`shrink-${leg}-edge`}>{t('shrink.edge', { allowance: note.allowance })}</li>
            <li data-testid={`shrink-${leg}-hem`}>{t('shrink.hem', { hem: note.hem })}</li>
            <li data-testid={`shrink-${leg}-cut`}>{t('shrink.cut', { cut: note.cutBelow })}</li>
          </ul>
          <p className="text-lg">{t('shrink.inPlan')}</p>
          <p className="text-lg font-semibold">{t('shrink.washFirst')}</p>
          <p className="rounded-sm border-l-4 border-warn bg-warn-soft px-2 py-1 text-base font-semibold text-warn">{t('shrink.caution')}</p>
        </>
      )}
    </section>
  );
}
