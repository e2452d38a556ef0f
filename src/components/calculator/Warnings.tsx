import { useT } from '@/components/I18n';
import type { PlanWarning } from '@/lib/allowance/types';
import { warningText } from '@/lib/shared/i18n/engine-messages';

interface Props {
  warnings: PlanWarning[];
}

/** The engine's warnings, read out as they change; the live region stays put even when empty. */
export function Warnings({ warnings }: Props) {
  const t = useT();
  return (
    <div role="status" aria-live="polite">
      {warnings.length > 0 && (
        <ul aria-label={t('calc.warnings')} className="flex flex-col gap-2">
          {warnings.map((w, i) => (
            <li key={`${w.code}-${i}`} className="rounded-md border-l-8 border-warn bg-warn-soft px-4 py-3 text-lg text-warn break-inside-avoid">
              <strong className="font-extrabold">{t('calc.takeCare')}</strong>
              {warningText(t, w)}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
