import { useT } from '@/components/I18n';
import { useId, useRef, useState } from 'react';
import type { WhoOption } from '@/lib/shared/bench-types';
import { GARMENT_STEPS, type GarmentStep } from '@/lib/shared/garment-steps';
import { DEFAULT_QUEUE_FILTER, type QueueFilter as Filters } from '@/lib/shared/queue-filter';

interface Props {
  value: Filters;
  onChange: (f: Filters) => void;
  /** the Tailor filter's choices for this reader (only what can match: services/queue.ts) */
  who: WhoOption[];
  label: (s: GarmentStep) => string;
}

const SELECT = 'min-h-11 rounded-md border-2 border-rule bg-card px-2 text-lg focus:border-accent';

/** The queue's search (customer, phone, ticket number or garment) and its filters by stage, tailor
 * and wanted-by day. On a phone the filters fold behind one button, so the work shows first. */
export function QueueFilters({ value, onChange, who, label }: Props) {
  const t = useT();
  const set = (patch: Partial<Filters>) => onChange({ ...value, ...patch });
  const [open, setOpen] = useState(false);
  const more = useId();
  const first = useRef<HTMLSelectElement>(null);
  // How many filters differ from the opening ones: said on the folded button, so none hides unseen.
  const on = (['step', 'who', 'due'] as const).filter((k) => value[k] !== DEFAULT_QUEUE_FILTER[k]).length;
  const toggle = () => {
    setOpen(!open);
    // Opening moves the focus to the first filter, for keyboard and screen-reader users alike.
    if (!open) requestAnimationFrame(() => first.current?.focus());
  };
  return (
    <form
      role="search"
      aria-label={t('queue.filter.form')}
      onSubmit={(e) => e.preventDefault()}
      className="grid gap-3 rounded-lg border-2 border-rule bg-card p-3 max-sm:grid-cols-[minmax(0,1fr)_auto] max-sm:items-end sm:grid-cols-2 lg:grid-cols-4"
    >
      <div className="flex min-w-0 flex-col gap-1">
        <label htmlFor="q-search" className="font-semibold">
          {t('queue.filter.search')}
        </label>
        <input
          id="q-search"
          type="search"
          value={value.search}
          onChange={(e) => set({ search: e.target.value })}
          placeholder={t('queue.filter.searchHint')}
          className={SELECT}
          autoComplete="off"
        />
      </div>
      <button
        type="button"
        aria-expanded={open}
        aria-controls={more}
        onClick={toggle}
        className="inline-flex min-h-11 items-center gap-1 rounded-md border-2 border-ink bg-card px-3 text-lg font-bold sm:hidden"
      >
        {t('queue.filter.toggle', { on })}
        <span aria-hidden="true">{open ? '▲' : '▼'}</span>
      </button>
      {/* contents: the three filters sit in the form's grid beside the search on wider screens. */}
      <div id={more} className={`gap-3 max-sm:col-span-2 max-sm:flex-col sm:contents ${open ? 'flex' : 'max-sm:hidden'}`}>
        <div className="flex flex-col gap-1">
          <label htmlFor="q-step" className="font-semibold">
            {t('queue.filter.step')}
          </label>
          <select ref={first} id="q-step" value={value.step} onChange={(e) => set({ step: e.target.value as Filters['step'] })} className={SELECT}>
            <option value="open">{t('queue.filter.open')}</option>
            <option value="all">{t('queue.filter.all')}</option>
            {GARMENT_STEPS.map((s) => (
              <option key={s} value={s}>
                {label(s)}
              </option>
            ))}
          </select>
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor="q-who" className="font-semibold">
            {t('queue.filter.who')}
          </label>
          <select id="q-who" value={value.who} onChange={(e) => set({ who: e.target.value })} className={SELECT}>
            {who.map((o) => (
              <option key={o.value} value={o.value}>
                {o.label}
              </option>
            ))}
          </select>
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor="q-due" className="font-semibold">
            {t('queue.filter.due')}
          </label>
          <select id="q-due" value={value.due} onChange={(e) => set({ due: e.target.value as Filters['due'] })} className={SELECT}>
            <option value="all">{t('queue.filter.anyDay')}</option>
            <option value="today">{t('queue.filter.today')}</option>
            <option value="overdue">{t('queue.filter.overdue')}</option>
          </select>
        </div>
      </div>
    </form>
  );
}
