// A leg's plan settings as a preset fills them: finish, unit and the lengths, all editable.
import { Segmented } from '@/components/calculator/Segmented';
import { LENGTHS_OF, PRESET_LENGTHS, type PresetLength, type PresetSettings } from '@/lib/preset-settings';

/** Editable settings of one leg (the trial panel of the presets page). */
export function LegSettings({ value, onChange }: { value: PresetSettings; onChange: (next: PresetSettings) => void }) {
  const setLength = (k: PresetLength, text: string) => onChange({ ...value, [k]: text === '' ? undefined : text });
  return (
    <fieldset className="flex min-w-0 flex-col gap-4 rounded-lg border-2 border-ink bg-card p-5">
      <legend className="px-1 text-2xl font-extrabold">Leg settings</legend>
      <div className="grid gap-4 sm:grid-cols-2">
        <Segmented
          name="leg-finish"
          legend="Finish"
          options={[{ value: 'cuff', label: 'Cuff' }, { value: 'hem', label: 'Plain hem' }]}
          value={value.finish}
          onChange={(finish) => onChange({ ...value, finish })}
        />
        <Segmented
          name="leg-unit"
          legend="Unit"
          options={[{ value: 'in', label: 'in' }, { value: 'cm', label: 'cm' }, { value: 'mm', label: 'mm' }]}
          value={value.unit}
          onChange={(unit) => onChange({ ...value, unit })}
        />
      </div>
      <div className="grid gap-3 sm:grid-cols-3">
        {LENGTHS_OF[value.finish].map((k) => (
          <div key={k} className="flex flex-col gap-1">
            <label htmlFor={`leg-${k}`} className="font-semibold">
              {PRESET_LENGTHS[k]} ({value.unit})
            </label>
            <input
              id={`leg-${k}`}
              type="text"
              autoComplete="off"
              spellCheck={false}
              value={value[k] ?? ''}
              placeholder="usual"
              onChange={(e) => setLength(k, e.target.value)}
              className="measure w-full min-w-0 rounded border-2 border-rule bg-card px-3 py-2 text-3xl font-extrabold focus:border-accent"
            />
          </div>
        ))}
      </div>
    </fieldset>
  );
}
