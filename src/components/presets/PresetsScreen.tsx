// The presets page: the lead keeps the house presets and picks the house default; everyone reads
// them and their history; tailors keep their own. Presets are applied on a garment's fitting,
// where a new fitting starts from the house default.
import { withQuery } from '@/components/WithQuery';
import { PresetForm } from './PresetForm';
import { PresetManager } from './PresetManager';
import { usePresets } from './use-presets';

interface Props {
  canManageHouse: boolean;
  canCreateOwn: boolean;
}

function PresetsScreen({ canManageHouse, canCreateOwn }: Props) {
  const presets = usePresets();
  if (presets.isError)
    return (
      <p role="alert" className="font-semibold text-cut">
        Presets could not be loaded: {presets.error.message}
      </p>
    );
  const house = presets.data?.filter((p) => p.house) ?? [];
  const own = presets.data?.filter((p) => !p.house) ?? [];
  return (
    <div className="flex flex-col gap-8">
      {canManageHouse && <PresetForm scope="house" />}
      <PresetManager
        title={canManageHouse ? 'Manage house presets' : 'House presets'}
        presets={house}
        canChange={canManageHouse}
        canSetDefault={canManageHouse}
      />
      {canCreateOwn && (
        <>
          <PresetForm scope="personal" />
          <PresetManager title="Manage your own presets" presets={own} canChange canSetDefault={false} />
        </>
      )}
      <p className="text-muted">
        To apply a preset, open a garment: its fitting lists these presets, and a new fitting starts from the house default.{' '}
        <a href="/bench" className="font-semibold text-accent underline">
          Go to the bench
        </a>
      </p>
    </div>
  );
}

/** The presets page island. */
export default withQuery(PresetsScreen);
