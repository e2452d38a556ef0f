// A list of presets with what the person may do to each: edit, make the house default, remove
// (the lead's house presets, everyone's own), and read each one's history.
import { useState } from 'react';
import { FormMessage } from '@/components/Field';
import type { PresetView } from '@/lib/shared/preset-settings';
import { PresetForm } from './PresetForm';
import { PresetHistory } from './PresetHistory';
import { PresetSummary } from './PresetSummary';
import { useDeletePreset, useUpdatePreset } from './use-presets';

const BUTTON = 'min-h-11 rounded border-2 px-3 font-semibold';

interface Props {
  title: string;
  presets: PresetView[];
  /** edit and remove buttons (false: to read only) */
  canChange: boolean;
  canSetDefault: boolean;
}

/** The presets, each with its summary, its buttons and its history. */
export function PresetManager({ title, presets, canChange, canSetDefault }: Props) {
  const update = useUpdatePreset();
  const remove = useDeletePreset();
  const [editing, setEditing] = useState<string | null>(null);
  const [historyOpen, setHistoryOpen] = useState<Record<string, boolean>>({});
  const failed = update.error ?? remove.error;
  return (
    <section aria-label={title} className="flex flex-col gap-2">
      <h2 className="text-2xl font-extrabold">{title}</h2>
      {presets.length === 0 && <p className="text-muted">None yet.</p>}
      <ul className="flex flex-col divide-y-2 divide-rule rounded-lg border-2 border-rule bg-card">
        {presets.map((p) => (
          <li key={p.id} className="flex flex-wrap items-center gap-3 px-4 py-3">
            {editing === p.id ? (
              <div className="w-full">
                <PresetForm editing={p} onDone={() => setEditing(null)} />
              </div>
            ) : (
              <>
                <div className="flex min-w-0 flex-1 basis-56 flex-col">
                  <span className="text-xl font-extrabold">
                    {p.name} {p.isDefault && <span className="ml-1 rounded bg-ink px-2 py-0.5 text-sm font-semibold text-paper">House default</span>}
                  </span>
                  <PresetSummary settings={p.settings} />
                </div>
                {canChange && (
                  <button type="button" aria-label={`Edit: ${p.name}`} className={`${BUTTON} border-ink`} onClick={() => setEditing(p.id)}>
                    Edit
                  </button>
                )}
                {canSetDefault && !p.isDefault && (
                  <button
                    type="button"
                    aria-label={`Make default: ${p.name}`}
                    className={`${BUTTON} border-accent text-accent`}
                    onClick={() => update.mutate({ id: p.id, isDefault: true })}
                  >
                    Make default
                  </button>
                )}
                {canChange && (
                  <button
                    type="button"
                    aria-label={`Remove: ${p.name}`}
                    className={`${BUTTON} border-cut text-cut`}
                    onClick={() => window.confirm(`Remove the preset ${p.name}? Fittings that used it keep its name.`) && remove.mutate(p.id)}
                  >
                    Remove
                  </button>
                )}
              </>
            )}
            <PresetHistory preset={p} open={Boolean(historyOpen[p.id])} onToggle={(open) => setHistoryOpen((h) => ({ ...h, [p.id]: open }))} />
          </li>
        ))}
      </ul>
      {failed && <FormMessage kind="error">{failed.message}</FormMessage>}
    </section>
  );
}
