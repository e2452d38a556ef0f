// A preset's kept edits, read when opened: who changed which field, when, old → new.
import { useQuery } from '@tanstack/react-query';
import { dateTimeText } from '@/lib/shared/date-text';
import { fetchJson } from '@/lib/shared/fetch-json';
import { PRESET_FIELDS, type PresetChange, type PresetView } from '@/lib/shared/preset-settings';
import { PART_LABELS } from '@/lib/shared/fitting/kinds';

const FINISH_WORDS: Record<string, string> = PART_LABELS;

function shown(field: string, value: PresetChange['old']): string {
  if (value === null || value === '') return 'nothing';
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (field === 'finish') return FINISH_WORDS[value] ?? value;
  return value;
}

function line(c: PresetChange): string {
  if (c.field === 'created') return `Made as ${shown('name', c.new)}`;
  return `${PRESET_FIELDS[c.field as keyof typeof PRESET_FIELDS] ?? c.field}: ${shown(c.field, c.old)} → ${shown(c.field, c.new)}`;
}

function Entries({ id }: { id: string }) {
  const history = useQuery({ queryKey: ['presets', id, 'history'], queryFn: () => fetchJson<PresetChange[]>(`/api/presets/${id}/history`) });
  if (history.isPending) return <p className="text-muted">Loading…</p>;
  if (history.isError)
    return (
      <p role="alert" className="font-semibold text-cut">
        History could not be loaded: {history.error.message}
      </p>
    );
  if (history.data.length === 0) return <p className="text-muted">Nothing recorded yet.</p>;
  return (
    <ol className="flex flex-col divide-y divide-rule">
      {history.data.map((c) => (
        <li key={c.id} className="flex flex-wrap items-baseline gap-x-3 py-1">
          <span className="measure font-semibold">{line(c)}</span>
          <span className="text-base text-muted">
            {c.actorName ?? 'Someone no longer here'} · <time dateTime={c.at}>{dateTimeText(c.at)}</time>
          </span>
        </li>
      ))}
    </ol>
  );
}

/** A closed "History" line under a preset; its entries are fetched once opened. */
export function PresetHistory({ preset, open, onToggle }: { preset: PresetView; open: boolean; onToggle: (open: boolean) => void }) {
  return (
    <details open={open} onToggle={(e) => onToggle(e.currentTarget.open)} className="w-full">
      <summary className="min-h-11 cursor-pointer content-center font-semibold text-accent">History of {preset.name}</summary>
      {open && <Entries id={preset.id} />}
    </details>
  );
}
