import type { Unit } from '@/lib/allowance/types';
import type { LengthField as Field } from './calculator-values';
import { LengthField, type Bind, type FieldInfo } from './LengthField';

interface Props {
  bind: Bind;
  unit: Unit;
  errorFor: (f: Field) => string | undefined;
  info: FieldInfo;
}

/** The lengths a plain hem needs: allowance, turn-under, cloth there is and the slope. */
export function HemFields({ bind, unit, errorFor, info }: Props) {
  const common = { bind, unit, info };
  const inch = unit === 'in';
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <div className="sm:col-span-2">
        <LengthField
          {...common}
          name="available"
          label="Cloth below the mark"
          error={errorFor('available')}
          hint="Let the old hem down first, then measure from the pin mark to the raw edge."
        />
      </div>
      <LengthField
        {...common}
        name="hemAllowance"
        label="Hem allowance"
        error={errorFor('hemAllowance')}
        hint={inch ? 'Blank: 1 1/2 in, turn-under included.' : 'Blank: 40 mm, turn-under included.'}
      />
      <LengthField {...common} name="turnUnder" label="Turn-under" error={errorFor('turnUnder')} hint={inch ? 'Blank: 1/4 in.' : 'Blank: 6 mm.'} />
      <LengthField
        {...common}
        name="slope"
        label="Slope (optional)"
        error={errorFor('slope')}
        hint={inch ? 'How much lower at the back than the front, often 1/2 in.' : 'How much lower at the back than the front, often 12 mm.'}
      />
    </div>
  );
}
