import type { PlanWarning } from '@/lib/allowance/types';

interface Props {
  warnings: PlanWarning[];
}

/** The engine's warnings, read out as they change; the live region stays put even when empty. */
export function Warnings({ warnings }: Props) {
  return (
    <div role="status" aria-live="polite">
      {warnings.length > 0 && (
        <ul aria-label="Warnings" className="flex flex-col gap-2">
          {warnings.map((w, i) => (
            <li key={`${w.code}-${i}`} className="rounded-md border-l-8 border-warn bg-warn-soft px-4 py-3 text-lg text-warn break-inside-avoid">
              <strong className="font-extrabold">Take care: </strong>
              {w.message}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
