import { dueState, dueText } from '@/lib/due-date';

/** A due date with "Overdue" or "Due today" standing out in words and colour, never colour alone. */
export function DueBadge({ dueOn }: { dueOn: string | null }) {
  const state = dueState(dueOn);
  return (
    <span className="inline-flex flex-wrap items-center gap-2">
      <span className={state === 'none' ? 'text-muted' : ''}>{dueText(dueOn)}</span>
      {state === 'overdue' && <span className="rounded bg-cut px-2 py-0.5 text-sm font-extrabold text-white">Overdue</span>}
      {state === 'today' && <span className="rounded border-2 border-warn bg-warn-soft px-2 py-0.5 text-sm font-extrabold text-warn">Due today</span>}
    </span>
  );
}
