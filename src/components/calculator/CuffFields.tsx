import type { Unit } from '@/lib/allowance/types';
import type { LengthField as Field } from './calculator-values';
import { LengthField, type Bind, type FieldInfo } from './LengthField';
import { QuickPicks } from './QuickPicks';
import { useT } from '@/components/I18n';

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
  const t = useT();
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <div className="sm:col-span-2">
        <LengthField {...common} name="cuffDepth" label={t('calc.field.cuffDepth')} error={errorFor('cuffDepth')}>
          <QuickPicks unit={unit} current={cuffDepth} onPick={onPick} />
        </LengthField>
      </div>
      <div className="sm:col-span-2">
        <LengthField {...common} name="available" label={t('calc.field.available')} error={errorFor('available')} hint={t('calc.hint.available')} />
      </div>
      <LengthField {...common} name="hemSection" label={t('calc.field.hemSection')} error={errorFor('hemSection')} hint={t('calc.hint.hemSection')} />
      <LengthField
        {...common}
        name="turnUnder"
        label={t('calc.field.turnUnder')}
        error={errorFor('turnUnder')}
        hint={t('calc.hint.blank', { length: unit === 'in' ? '1/2 in' : '12 mm' })}
      />
      <LengthField
        {...common}
        name="oldCrease"
        label={t('calc.optional', { label: t('calc.field.oldCrease') })}
        error={errorFor('oldCrease')}
        hint={t('calc.hint.oldCrease')}
      />
      <LengthField
        {...common}
        name="clothThickness"
        label={t('calc.optional', { label: t('calc.field.clothThickness') })}
        error={errorFor('clothThickness')}
        hint={t('calc.hint.clothThickness')}
      />
    </div>
  );
}
