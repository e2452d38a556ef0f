// Each whole-garment kind's adapter, by kind: the one place a new kind is plugged in for the form,
// the save check, the plan view and the sheet. A kind declared but not built yet maps to null.
import type { WholeGarmentKind } from './garment-kinds';
import type { KindAdapter } from './kind-fields';
import { SKIRT_ADAPTER } from './skirt-fitting';
import { SLEEVE_ADAPTER } from './sleeve-fitting';

/** The adapters by kind. */
export const KIND_ADAPTERS: Record<WholeGarmentKind, KindAdapter | null> = {
  skirt: SKIRT_ADAPTER,
  sleeves: SLEEVE_ADAPTER,
};

/** A kind's adapter, or null for trousers (per leg) and kinds not built yet. */
export function adapterOf(kind: string): KindAdapter | null {
  return (KIND_ADAPTERS as Record<string, KindAdapter | null | undefined>)[kind] ?? null;
}
