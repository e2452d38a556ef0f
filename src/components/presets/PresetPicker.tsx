// The one-tap preset list for a leg's plan: house presets (the default first and marked), then
// the person's own, and a way to keep the current settings as one's own preset.
import { QueryClientContext } from '@tanstack/react-query';
import { useContext, useEffect, useState } from 'react';
import { withQuery } from '@/components/WithQuery';
import type { PresetSettings, PresetView } from '@/lib/shared/preset-settings';
import { PresetSummary } from './PresetSummary';
import { SavePresetForm } from './SavePresetForm';
import { usePresets } from './use-presets';

export type { PresetSettings } from '@/lib/shared/preset-settings';

interface Props {
  /** the unit the plan is in: presets in it are listed first */
  unit: 'in' | 'cm' | 'mm';
  /** called with the tapped preset's settings, and the preset itself (its name goes on record) */
  onApply: (settings: PresetSettings, preset: PresetView) => void;
  /** the leg's settings now, to keep as a personal preset (no save form without them) */
  current?: PresetSettings;
}

function byUnit(list: PresetView[], unit: Props['unit']): PresetView[] {
  // The default stays first; the rest keep the API's order, the plan's unit ahead of the others.
  return [...list].sort((x, y) => Number(y.isDefault) - Number(x.isDefault) || Number(y.settings.unit === unit) - Number(x.settings.unit === unit));
}

function PresetButton({ preset, chosen, onTap }: { preset: PresetView; chosen: boolean; onTap: () => void }) {
  return (
    <li>
      <button
        type="button"
        aria-pressed={chosen}
        onClick={onTap}
        className="flex min-h-14 w-full flex-col items-start gap-0.5 rounded-md border-2 border-rule bg-card px-4 py-2 text-left hover:border-accent aria-pressed:border-accent aria-pressed:bg-accent-soft"
      >
        <span className="flex flex-wrap items-center gap-2 text-xl font-extrabold">
          {preset.name}
          {preset.isDefault && <span className="rounded bg-ink px-2 py-0.5 text-sm font-semibold text-paper">House default</span>}
        </span>
        <PresetSummary settings={preset.settings} />
      </button>
    </li>
  );
}

function Picker({ unit, onApply, current }: Props) {
  const presets = usePresets();
  const [chosen, setChosen] = useState<string | null>(null);
  // The default as it was when the list first came: a later change of default does not move the
  // highlight off what the leg was filled with.
  useEffect(() => {
    if (chosen === null && presets.data) setChosen(presets.data.find((p) => p.house && p.isDefault)?.id ?? '');
  }, [chosen, presets.data]);
  if (presets.isPending) return <p className="text-muted">Loading presets…</p>;
  if (presets.isError)
    return (
      <p role="alert" className="font-semibold text-cut">
        Presets could not be loaded: {presets.error.message}
      </p>
    );
  const house = byUnit(
    presets.data.filter((p) => p.house),
    unit,
  );
  const own = byUnit(
    presets.data.filter((p) => !p.house),
    unit,
  );
  const selected = chosen ?? house.find((p) => p.isDefault)?.id ?? null;
  const tap = (p: PresetView) => {
    setChosen(p.id);
    onApply(p.settings, p);
  };
  return (
    <div className="flex flex-col gap-4">
      <section aria-labelledby="house-presets-heading">
        <h3 id="house-presets-heading" className="mb-2 text-lg font-extrabold">
          House presets
        </h3>
        {house.length === 0 ? (
          <p className="text-muted">The lead has not set any house presets yet.</p>
        ) : (
          <ul className="flex flex-col gap-2">
            {house.map((p) => (
              <PresetButton key={p.id} preset={p} chosen={selected === p.id} onTap={() => tap(p)} />
            ))}
          </ul>
        )}
      </section>
      <section aria-labelledby="own-presets-heading">
        <h3 id="own-presets-heading" className="mb-2 text-lg font-extrabold">
          Your presets
        </h3>
        {own.length === 0 ? (
          <p className="text-muted">None yet{current ? ': save the settings you use often below.' : '.'}</p>
        ) : (
          <ul className="flex flex-col gap-2">
            {own.map((p) => (
              <PresetButton key={p.id} preset={p} chosen={selected === p.id} onTap={() => tap(p)} />
            ))}
          </ul>
        )}
      </section>
      {current && <SavePresetForm current={current} onSaved={(p) => setChosen(p.id)} />}
    </div>
  );
}

const PickerWithOwnClient = withQuery(Picker);

/** Lists the presets to apply in one tap; works inside another island's query client or on its own. */
export function PresetPicker(props: Props) {
  const client = useContext(QueryClientContext);
  return client ? <Picker {...props} /> : <PickerWithOwnClient {...props} />;
}

export default PresetPicker;
