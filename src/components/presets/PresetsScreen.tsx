// The presets page: the lead keeps the house presets and picks the house default (first, as it is
// the lead's page); everyone tries presets on a leg's settings and keeps their own.
import { useEffect, useState } from 'react';
import { withQuery } from '@/components/WithQuery';
import type { PresetSettings } from '@/lib/preset-settings';
import { HousePresetForm } from './HousePresetForm';
import { LegSettings } from './LegSettings';
import { PresetManager } from './PresetManager';
import { PresetPicker } from './PresetPicker';
import { usePresets } from './use-presets';

interface Props {
  canManageHouse: boolean;
  canCreateOwn: boolean;
}

const BLANK: PresetSettings = { finish: 'cuff', unit: 'in' };

function PresetsScreen({ canManageHouse, canCreateOwn }: Props) {
  const presets = usePresets();
  const [leg, setLeg] = useState<PresetSettings | null>(null);
  // The house default is preselected: it fills the leg until someone taps another preset.
  useEffect(() => {
    if (leg === null && presets.data) setLeg(presets.data.find((p) => p.house && p.isDefault)?.settings ?? BLANK);
  }, [leg, presets.data]);
  const settings = leg ?? BLANK;
  return (
    <div className="flex flex-col gap-8">
      {canManageHouse && (
        <>
          <HousePresetForm />
          <PresetManager title="Manage house presets" presets={presets.data?.filter((p) => p.house) ?? []} canSetDefault />
        </>
      )}
      <section aria-labelledby="try-heading" className="flex flex-col gap-3">
        <h2 id="try-heading" className="text-2xl font-extrabold">Apply a preset</h2>
        <p className="text-muted">One tap fills the leg settings. Change any length, then keep it as your own preset.</p>
        <div className="grid grid-cols-[minmax(0,1fr)] gap-6 lg:grid-cols-[minmax(0,5fr)_minmax(0,6fr)]">
          <PresetPicker unit={settings.unit} onApply={setLeg} current={canCreateOwn ? settings : undefined} />
          <div className="lg:sticky lg:top-4 lg:self-start">
            <LegSettings value={settings} onChange={setLeg} />
          </div>
        </div>
      </section>
      {canCreateOwn && <PresetManager title="Manage your own presets" presets={presets.data?.filter((p) => !p.house) ?? []} canSetDefault={false} />}
    </div>
  );
}

/** The presets page island. */
export default withQuery(PresetsScreen);
