import { useT } from '@/components/I18n';
import type { Unit } from '@/lib/allowance/types';
import type { MessageKey } from '@/lib/shared/i18n/format';

const PICKS: Record<Unit, { value: string; label: string; note: string }[]> = {
  in: [
    { value: '1 1/4', label: '1 1/4', note: 'trim' },
    { value: '1 1/2', label: '1 1/2', note: 'classic' },
    { value: '1 3/4', label: '1 3/4', note: 'wide' },
  ],
  mm: ['30', '35', '40', '45'].map((v) => ({ value: v, label: v, note: 'mm' })),
  cm: ['3', '3.5', '4', '4.5'].map((v) => ({ value: v, label: v, note: 'cm' })),
};

interface Props {
  unit: Unit;
  current: string;
  onPick: (value: string) => void;
}

/** Common cuff depths (common practice, no source) one tap away. */
export function QuickPicks({ unit, current, onPick }: Props) {
  const t = useT();
  // The inch picks are named by the look (a catalog word); metric ones by their unit.
  const note = (n: string) => (unit === 'in' ? t(`calc.pick.${n}` as MessageKey) : n);
  return (
    <div role="group" aria-label={t('calc.picks')} className="flex flex-wrap gap-2">
      {PICKS[unit].map((p) => (
        <button
          key={p.value}
          type="button"
          aria-pressed={current.trim() === p.value}
          onClick={() => onPick(p.value)}
          className="flex min-h-11 min-w-16 flex-col items-center justify-center rounded-md border-2 border-rule bg-card px-3 leading-tight hover:border-accent aria-pressed:border-accent aria-pressed:bg-accent-soft"
        >
          <span className="measure text-lg font-semibold">{p.label}</span>
          <span className="text-xs text-muted">{note(p.note)}</span>
        </button>
      ))}
    </div>
  );
}
