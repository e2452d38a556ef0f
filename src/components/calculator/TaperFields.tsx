import type { Unit } from '@/lib/allowance/types';
import type { LengthField as Field } from './calculator-values';
import { LengthField, type Bind, type FieldInfo } from './LengthField';
import { useT } from '@/components/I18n';

interface Props {
  open: boolean;
  onToggle: (open: boolean) => void;
  bind: Bind;
  unit: Unit;
  errorFor: (f: Field) => string | undefined;
  info: FieldInfo;
  /** open, but a width is still blank */
  waiting: boolean;
  /** the taper check's own message when it was refused */
  problem: string | null;
}

/** The optional taper check, folded away until asked for: leg widths measured flat. */
export function TaperFields({ open, onToggle, bind, unit, errorFor, info, waiting, problem }: Props) {
  const common = { bind, unit, info };
  const t = useT();
  return (
    <details open={open} onToggle={(e) => onToggle(e.currentTarget.open)} className="rounded-md border-2 border-rule bg-paper">
      <summary className="flex min-h-11 cursor-pointer items-center px-3 text-lg font-semibold">{t('calc.taper.summary')}</summary>
      <div className="grid gap-4 border-t-2 border-rule p-3 sm:grid-cols-2">
        <p className="text-base text-muted sm:col-span-2">{t('calc.taper.intro')}</p>
        <LengthField {...common} name="widthAtEdge" label={t('calc.field.widthAtEdge')} error={errorFor('widthAtEdge')} />
        <LengthField {...common} name="widthAbove" label={t('calc.field.widthAbove')} error={errorFor('widthAbove')} />
        <LengthField {...common} name="heightAbove" label={t('calc.field.heightAbove')} error={errorFor('heightAbove')} />
        <LengthField
          {...common}
          name="seamAllowance"
          label={t('calc.optional', { label: t('calc.field.seamAllowance') })}
          error={errorFor('seamAllowance')}
          hint={t('calc.hint.seamAllowance')}
        />
        {waiting && <p className="text-base text-muted sm:col-span-2">{t('calc.taper.waiting')}</p>}
        {!waiting && problem && <p className="text-base font-semibold text-cut sm:col-span-2">{problem}</p>}
      </div>
    </details>
  );
}
