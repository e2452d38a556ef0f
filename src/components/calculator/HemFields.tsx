import type { Unit } from '@/lib/allowance/types';
import type { LengthField as Field } from './calculator-values';
import { LengthField, type Bind, type FieldInfo } from './LengthField';
import { useT } from '@/components/I18n';

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
  const t = useT();
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <div className="sm:col-span-2">
        <LengthField {...common} name="available" label={t('calc.field.available')} error={errorFor('available')} hint={t('calc.hint.available')} />
      </div>
      <LengthField
        {...common}
        name="hemAllowance"
        label={t('calc.field.hemAllowance')}
        error={errorFor('hemAllowance')}
        hint={t('calc.hint.hemAllowance', { length: inch ? '1 1/2 in' : '40 mm' })}
      />
      <LengthField
        {...common}
        name="turnUnder"
        label={t('calc.field.turnUnder')}
        error={errorFor('turnUnder')}
        hint={t('calc.hint.blank', { length: inch ? '1/4 in' : '6 mm' })}
      />
      <LengthField
        {...common}
        name="slope"
        label={t('calc.optional', { label: t('calc.field.slope') })}
        error={errorFor('slope')}
        hint={t('calc.hint.slope', { length: inch ? '1/2 in' : '12 mm' })}
      />
    </div>
  );
}
