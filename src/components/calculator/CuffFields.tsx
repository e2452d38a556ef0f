import type { Unit } from '@/lib/allowance/types';
import type { LengthField as Field } from './calculator-values';
import { LengthField, type Bind, type FieldInfo } from './LengthField';
import { QuickPicks } from './QuickPicks';

interface Props {
  bind: Bind;
  unit: Unit;
  errorFor: (f: Field) => string | undefined;
  info: FieldInfo;
  cuffDepth: string;
  onPick: (value: string) => void;
}

/** The lengths a cuff needs: its depth, the sections and the cloth there is. */
export function CuffFields({ bind, unit, errorFor, info, cuffDepth, onPick }: Props) {
  const common = { bind, unit, info };
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <div className="sm:col-span-2">
        <LengthField {...common} name="cuffDepth" label="Cuff depth" error={errorFor('cuffDepth')}>
          <QuickPicks unit={unit} current={cuffDepth} onPick={onPick} />
        </LengthField>
      </div>
      <div className="sm:col-span-2">
        <LengthField
          {...common}
          name="available"
          label="Cloth below the mark"
          error={errorFor('available')}
          hint="Let the old hem down first, then measure from the pin mark to the raw edge."
        />
      </div>
      <LengthField {...common} name="hemSection" label="Third section" error={errorFor('hemSection')} hint="Blank: same as the cuff depth." />
      <LengthField {...common} name="turnUnder" label="Turn-under" error={errorFor('turnUnder')} hint={unit === 'in' ? 'Blank: 1/2 in.' : 'Blank: 12 mm.'} />
      <LengthField {...common} name="oldCrease" label="Old crease (optional)" error={errorFor('oldCrease')} hint="Below the mark; a minus sign if above." />
      <LengthField
        {...common}
        name="clothThickness"
        label="Turn of cloth (optional)"
        error={errorFor('clothThickness')}
        hint="For thick cloth: taken at each fold."
      />
    </div>
  );
}
