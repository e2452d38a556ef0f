import type { Person } from '@/lib/bench-types';
import { GARMENT_STEPS, type GarmentStep } from '@/lib/garment-steps';
import type { QueueFilter as Filters } from '@/lib/queue-filter';

interface Props {
  value: Filters;
  onChange: (f: Filters) => void;
  people: Person[];
  label: (s: GarmentStep) => string;
}

const SELECT = 'min-h-11 rounded-md border-2 border-rule bg-card px-2 text-lg focus:border-accent';

/** The queue's filters: step, who, due and a search by customer or ticket number. */
export function QueueFilters({ value, onChange, people, label }: Props) {
  const set = (patch: Partial<Filters>) => onChange({ ...value, ...patch });
  return (
    <form role="search" aria-label="Filter the queue" onSubmit={(e) => e.preventDefault()} className="grid gap-3 rounded-lg border-2 border-rule bg-card p-3 sm:grid-cols-2 lg:grid-cols-4">
      <div className="flex flex-col gap-1">
        <label htmlFor="q-search" className="font-semibold">Customer or ticket</label>
        <input id="q-search" type="search" value={value.search} onChange={(e) => set({ search: e.target.value })} placeholder="Ticket no., name, phone or garment" className={SELECT} autoComplete="off" />
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor="q-step" className="font-semibold">Step</label>
        <select id="q-step" value={value.step} onChange={(e) => set({ step: e.target.value as Filters['step'] })} className={SELECT}>
          <option value="open">All not collected</option>
          <option value="all">All, collected too</option>
          {GARMENT_STEPS.map((s) => <option key={s} value={s}>{label(s)}</option>)}
        </select>
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor="q-who" className="font-semibold">Who</label>
        <select id="q-who" value={value.who} onChange={(e) => set({ who: e.target.value })} className={SELECT}>
          <option value="all">Everyone</option>
          <option value="mine-open">Mine and unassigned</option>
          <option value="mine">Mine</option>
          <option value="nobody">Unassigned</option>
          {people.map((p) => <option key={p.userId} value={p.userId}>{p.name}</option>)}
        </select>
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor="q-due" className="font-semibold">Due</label>
        <select id="q-due" value={value.due} onChange={(e) => set({ due: e.target.value as Filters['due'] })} className={SELECT}>
          <option value="all">Any day</option>
          <option value="today">Today or overdue</option>
          <option value="overdue">Overdue</option>
        </select>
      </div>
    </form>
  );
}
