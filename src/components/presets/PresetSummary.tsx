import { PART_LABELS } from '@/lib/shared/fitting/kinds';
import { LENGTHS_OF, PRESET_LENGTHS, type PresetSettings } from '@/lib/shared/preset-settings';

const UNIT_TEXT = { in: 'in', cm: 'cm', mm: 'mm' } as const;

/** A preset's lengths in a line, fractions drawn as a tailor writes them. */
export function PresetSummary({ settings }: { settings: PresetSettings }) {
  const parts = LENGTHS_OF[settings.finish].filter((k) => settings[k] !== undefined);
  return (
    <span className="flex flex-wrap gap-x-3 gap-y-0.5 text-base text-muted">
      <span className="font-semibold text-ink">{PART_LABELS[settings.finish]}</span>
      {parts.map((k) => (
        <span key={k}>
          {k === 'cuffDepth' ? '' : `${PRESET_LENGTHS[k].toLowerCase()} `}
          <span className="measure font-semibold text-ink">
            {settings[k]} {UNIT_TEXT[settings.unit]}
          </span>
        </span>
      ))}
    </span>
  );
}
