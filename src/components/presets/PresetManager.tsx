// The presets a person may change: the lead's house presets (default, remove), everyone's own (remove).
import { FormMessage } from '@/components/Field';
import type { PresetView } from '@/lib/preset-settings';
import { PresetSummary } from './PresetSummary';
import { useDeletePreset, useUpdatePreset } from './use-presets';

const BUTTON = 'min-h-11 rounded border-2 px-3 font-semibold';

/** A list with a make-default button (house, lead) and a remove button on each row. */
export function PresetManager({ title, presets, canSetDefault }: { title: string; presets: PresetView[]; canSetDefault: boolean }) {
  const update = useUpdatePreset();
  const remove = useDeletePreset();
  const failed = update.error ?? remove.error;
  return (
    <section aria-label={title} className="flex flex-col gap-2">
      <h2 className="text-2xl font-extrabold">{title}</h2>
      {presets.length === 0 && <p className="text-muted">None yet.</p>}
      <ul className="flex flex-col divide-y-2 divide-rule rounded-lg border-2 border-rule bg-card">
        {presets.map((p) => (
          <li key={p.id} className="flex flex-wrap items-center gap-3 px-4 py-3">
            <div className="flex min-w-0 flex-1 basis-56 flex-col">
              <span className="text-xl font-extrabold">
                {p.name} {p.isDefault && <span className="ml-1 rounded bg-ink px-2 py-0.5 text-sm font-semibold text-paper">House default</span>}
              </span>
              <PresetSummary settings={p.settings} />
            </div>
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
            <button
              type="button"
              aria-label={`Remove: ${p.name}`}
              className={`${BUTTON} border-cut text-cut`}
              onClick={() => window.confirm(`Remove the preset ${p.name}?`) && remove.mutate(p.id)}
            >
              Remove
            </button>
          </li>
        ))}
      </ul>
      {failed && <FormMessage kind="error">{failed.message}</FormMessage>}
    </section>
  );
}
