import { useT } from '@/components/I18n';
import type { MessageKey } from '@/lib/shared/i18n/format';
import type { UseFormRegister } from 'react-hook-form';
import { LengthInput } from '@/components/LengthInput';
import { describedBy, FieldFrame } from '@/components/Field';
import { Segmented } from '@/components/calculator/Segmented';
// The defaults module only (no parser, so no mathjs in the island).
import { usualCuffDepthsText } from '@/lib/allowance/defaults';
import { FIELD, fieldsOf, GROUPS, isLengthField, partGroupOf, type GroupId } from '@/lib/shared/fitting/kinds';
import { FINISHES, type Finish, type Leg, type LegLength, type MeasurementsInput } from '@/lib/shared/measurement-request';

interface Props {
  leg: Leg;
  finish: Finish;
  unit: string;
  register: UseFormRegister<MeasurementsInput>;
  onFinish: (f: Finish) => void;
  errorFor: (field: LegLength) => string | undefined;
  /** what a field's typed text reads as ("31 7/8 in"), or null */
  readingFor: (field: LegLength) => string | null;
  /** the pair's old hem or cuff is let down first: the width at the cutting line is asked for */
  letDown?: boolean;
}

// The hints are the registry's; the usual cuff depths come from the engine's defaults.
function hintOf(f: LegLength): string | undefined {
  return f === 'cuffDepth' ? `Usual: ${usualCuffDepthsText()}.` : FIELD[f].hint;
}

/** The finish's fields in the registry's groups and order (a let-down pair also gets the width at the cut). */
function groupsOf(finish: Finish, letDown: boolean): { title: string; fields: LegLength[] }[] {
  const fields = fieldsOf(finish, letDown);
  return (Object.keys(GROUPS) as GroupId[])
    .map((g) => ({
      title: g === 'part' ? partGroupOf(finish) : GROUPS[g],
      fields: fields.filter((f) => f.group === g).map((f) => f.key as LegLength),
    }))
    .filter((g) => g.fields.length > 0);
}

/** One leg's fitting fields for its finish (the other finishes' values are kept, only hidden). */
export function LegFields({ leg, finish, unit, register, onFinish, errorFor, readingFor, letDown = false }: Props) {
  const t = useT();
  // Hints in the catalog's words (fieldHint.<key>); a field without one has none.
  // The registry's words (src/lib/shared/fitting/kinds.ts) through the catalog (field.<key>, fieldHint.<key>);
  // a key the catalog lacks keeps the registry's English.
  const say = (key: string, english: string | undefined, values?: Record<string, string>) => {
    if (english === undefined) return undefined;
    const said = t(key as MessageKey, values);
    return said === key ? english : said;
  };
  const hint = (f: LegLength) =>
    f === 'cuffDepth' ? say('fieldHint.cuffDepth', hintOf(f), { usual: usualCuffDepthsText() }) : say(`fieldHint.${f}`, FIELD[f].hint);
  const groupTitle = (title: string) => (title === GROUPS.taper ? t('fitting.group.taper') : (say(`fitting.group.${title}`, title) ?? title));
  return (
    <div className="flex flex-col gap-4">
      <Segmented
        name={`finish-${leg}`}
        legend={t('fitting.finishOf', { leg })}
        value={finish}
        onChange={onFinish}
        options={FINISHES.map((f) => ({ value: f, label: t(`fitting.finish.${f}`) }))}
      />
      {groupsOf(finish, letDown).map((g) => (
        <fieldset key={g.title} className="flex flex-col gap-3">
          <legend className="mb-1 text-lg font-extrabold">{groupTitle(g.title)}</legend>
          <div className="grid gap-3 sm:grid-cols-2">
            {g.fields.map((f) =>
              FIELD[f].unit === 'choice' ? (
                <FieldFrame key={f} id={`m-legs-${leg}-${f}`} label={say(`field.${f}`, FIELD[f].label) ?? FIELD[f].label} hint={hint(f)} error={errorFor(f)}>
                  {/* A plain select: the keyboard's arrows and letters choose, as anywhere. */}
                  <select
                    id={`m-legs-${leg}-${f}`}
                    aria-invalid={errorFor(f) ? true : undefined}
                    aria-describedby={describedBy(`m-legs-${leg}-${f}`, errorFor(f), hint(f))}
                    className={`min-h-11 rounded-md border-2 bg-card px-3 text-xl ${errorFor(f) ? 'border-cut' : 'border-rule focus:border-accent'}`}
                    {...register(`legs.${leg}.${f}`)}
                  >
                    <option value="">{t('shrink.none')}</option>
                    {FIELD[f].options?.map((o) => (
                      <option key={o.value} value={o.value}>
                        {say(`shrink.cloth.${o.value}`, o.label)}
                      </option>
                    ))}
                  </select>
                </FieldFrame>
              ) : (
                <LengthInput
                  key={f}
                  id={`m-legs-${leg}-${f}`}
                  label={say(`field.${f}`, FIELD[f].label) ?? FIELD[f].label}
                  unit={FIELD[f].unit === 'percent' ? '%' : unit}
                  registration={register(`legs.${leg}.${f}`)}
                  hint={hint(f)}
                  error={errorFor(f)}
                  reading={isLengthField(f) ? readingFor(f) : null}
                />
              ),
            )}
          </div>
        </fieldset>
      ))}
    </div>
  );
}
