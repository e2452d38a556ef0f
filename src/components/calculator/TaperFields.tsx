import type { Unit } from '@/lib/allowance/types';
import type { LengthField as Field } from './calculator-values';
import { LengthField, type Bind, type FieldInfo } from './LengthField';

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
  return (
    <details open={open} onToggle={(e) => onToggle(e.currentTarget.open)} className="rounded-md border-2 border-rule bg-paper">
      <summary className="flex min-h-11 cursor-pointer items-center px-3 text-lg font-semibold">Tapered leg: check the width</summary>
      <div className="grid gap-4 border-t-2 border-rule p-3 sm:grid-cols-2">
        <p className="text-base text-muted sm:col-span-2">
          Measure the leg flat. The width at the cuff top must run straight down to the cut, or the cuff will not lie flat.
        </p>
        <LengthField {...common} name="widthAtEdge" label="Width at the finished edge" error={errorFor('widthAtEdge')} />
        <LengthField {...common} name="widthAbove" label="Width higher up" error={errorFor('widthAbove')} />
        <LengthField {...common} name="heightAbove" label="…measured this high above the edge" error={errorFor('heightAbove')} />
        <LengthField
          {...common}
          name="seamAllowance"
          label="Seam allowance (optional)"
          error={errorFor('seamAllowance')}
          hint="Cloth beyond the stitching at each seam."
        />
        {waiting && <p className="text-base text-muted sm:col-span-2">Type the cuff depth and the three widths to see the let-out.</p>}
        {!waiting && problem && <p className="text-base font-semibold text-cut sm:col-span-2">{problem}</p>}
      </div>
    </details>
  );
}
