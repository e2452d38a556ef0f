// A garment fitted once (a skirt; later sleeves): its saved fitting planned by its kind's adapter
// in the sheet's unit, as the sheet's data. The lengths keep the unit they were typed in.
import { withUnitsNamed } from '@/lib/allowance';
import type { Precision, Unit } from '@/lib/allowance/types';
import { adapterOf } from '../../../shared/fitting/kind-adapters';
import type { KindTexts } from '../../../shared/fitting/kind-fields';
import type { KindFittingView } from '../../../shared/kind-fitting-request';
import type { CutSheetData, KindSheetData } from '../../../shared/cut-sheet-types';
import type { SheetHeader } from '../build';

/** A saved fitting's texts with each length's unit named, so a sheet in another unit reads them as typed. */
export function namedTexts(saved: Pick<KindFittingView, 'values' | 'choices' | 'unit'>): KindTexts {
  const out: KindTexts = { ...saved.choices };
  for (const [k, v] of Object.entries(saved.values)) out[k] = withUnitsNamed(v.text, saved.unit ?? 'in');
  return out;
}

/** The sheet's data for a garment fitted once; null when its kind has no adapter. Throws the engine's AllowanceError for a fitting it refuses. */
export function buildKindSheet(header: SheetHeader, saved: KindFittingView, unit: Unit, precision: Precision): CutSheetData | null {
  const adapter = adapterOf(saved.kind);
  if (!adapter) return null;
  const kindSheet = { kind: saved.kind, plan: adapter.plan(namedTexts(saved), unit, precision) } as KindSheetData;
  return { ...header, unit, precision, legs: [], kindSheet };
}
