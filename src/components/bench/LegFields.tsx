import type { UseFormRegister } from 'react-hook-form';
import { LengthInput } from '@/components/LengthInput';
import { Segmented } from '@/components/calculator/Segmented';
// The defaults module only (no parser, so no mathjs in the island).
import { usualCuffDepthsText } from '@/lib/allowance/defaults';
import { FINISH_LABELS, FINISHES, LEG_LENGTH_LABELS, type Finish, type Leg, type LegLength, type MeasurementsInput } from '@/lib/measurement-request';

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

const HINTS: Partial<Record<LegLength, string>> = {
  backPin: 'Measured the shop’s way, e.g. along the inseam to the pin.',
  frontPin: 'Optional. Recorded; a cuff is still hemmed level.',
  cuffDepth: `Usual: ${usualCuffDepthsText()}.`,
  hemSection: 'Blank: the same as the cuff depth.',
  turnUnder: 'Blank: the usual.',
  hemAllowance: 'Blank: 1 1/2 in (40 mm).',
  slope: 'How much lower the back sits; often about 1/2 in.',
  available: 'From the pin mark to the raw edge, once the old hem is let down.',
  oldCrease: 'Where the old hem fold is, below the mark (negative above).',
  heightAbove: 'Where the higher width was taken, above the finished edge.',
  seamAllowance: 'Left on each side of each leg seam, to let out.',
  widthAtCut: 'Let down first: the old hem often flares below its fold, so measure flat where you will cut. Blank: the taper followed down.',
};

const TAPER = 'Taper check (flat widths)';
const TAPER_FIELDS: LegLength[] = ['widthAtEdge', 'widthAbove', 'heightAbove', 'seamAllowance'];

/** Which lengths each finish asks for, in order, grouped. */
const GROUPS: Record<Finish, { title: string; fields: LegLength[] }[]> = {
  cuff: [
    { title: 'Pins', fields: ['backPin', 'frontPin'] },
    { title: 'Cuff', fields: ['cuffDepth', 'hemSection', 'turnUnder'] },
    { title: 'Cloth', fields: ['available', 'oldCrease'] },
    { title: TAPER, fields: TAPER_FIELDS },
  ],
  // A plain hem on a tapered leg is checked too: turned up, it must lie flat on the leg above.
  plain: [
    { title: 'Pins', fields: ['backPin', 'frontPin'] },
    { title: 'Hem', fields: ['hemAllowance', 'turnUnder'] },
    { title: 'Cloth', fields: ['available'] },
    { title: TAPER, fields: TAPER_FIELDS },
  ],
  slope: [
    { title: 'Pins', fields: ['backPin', 'frontPin'] },
    { title: 'Hem', fields: ['slope', 'hemAllowance', 'turnUnder'] },
    { title: 'Cloth', fields: ['available'] },
    { title: TAPER, fields: TAPER_FIELDS },
  ],
};

// On a pair let down first the width at the cut is measured, not followed down: asked after the three widths.
function fieldsOf(title: string, fields: LegLength[], letDown: boolean): LegLength[] {
  return letDown && title === TAPER ? [...fields.slice(0, 3), 'widthAtCut', ...fields.slice(3)] : fields;
}

/** One leg's fitting fields for its finish (the other finishes' values are kept, only hidden). */
export function LegFields({ leg, finish, unit, register, onFinish, errorFor, readingFor, letDown = false }: Props) {
  return (
    <div className="flex flex-col gap-4">
      <Segmented
        name={`finish-${leg}`}
        legend={`Finish, ${leg} leg`}
        value={finish}
        onChange={onFinish}
        options={FINISHES.map((f) => ({ value: f, label: FINISH_LABELS[f] }))}
      />
      {GROUPS[finish].map((g) => (
        <fieldset key={g.title} className="flex flex-col gap-3">
          <legend className="mb-1 text-lg font-extrabold">{g.title}</legend>
          <div className="grid gap-3 sm:grid-cols-2">
            {fieldsOf(g.title, g.fields, letDown).map((f) => (
              <LengthInput
                key={f}
                id={`m-legs-${leg}-${f}`}
                label={LEG_LENGTH_LABELS[f]}
                unit={unit}
                registration={register(`legs.${leg}.${f}`)}
                hint={HINTS[f]}
                error={errorFor(f)}
                reading={readingFor(f)}
              />
            ))}
          </div>
        </fieldset>
      ))}
    </div>
  );
}
