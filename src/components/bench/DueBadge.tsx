import { useIntlLocale, useMaybeT } from '@/components/I18n';
import { dueState, dueText, todayIso } from '@/lib/shared/due-date';
import type { GarmentStep } from '@/lib/shared/garment-steps';
import { workDueState } from '@/lib/shared/queue-filter';

/** A due date with "Overdue" or "Due today" standing out in words and colour, never colour alone;
 * given the garment's step, only work not yet ready is ever overdue or due today. */
export function DueBadge({ dueOn, status }: { dueOn: string | null; status?: GarmentStep }) {
  const state = status ? workDueState({ dueOn, status }, todayIso()) : dueState(dueOn);
  // In the page's language where the page gave one (the garment page), else English.
  const t = useMaybeT();
  const locale = useIntlLocale();
  return (
    <span className="inline-flex flex-wrap items-center gap-2">
      <span className={!dueOn ? 'text-muted' : ''}>{dueText(dueOn, locale, t ? t('due.none') : undefined)}</span>
      {state === 'overdue' && <span className="rounded bg-cut px-2 py-0.5 text-sm font-extrabold text-white">{t ? t('due.overdue') : 'Overdue'}</span>}
      {state === 'today' && (
        <span className="rounded border-2 border-warn bg-warn-soft px-2 py-0.5 text-sm font-extrabold text-warn">{t ? t('due.today') : 'Due today'}</span>
      )}
    </span>
  );
}
