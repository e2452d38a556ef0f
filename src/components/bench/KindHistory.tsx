import { useT } from '@/components/I18n';
import type { Precision, Unit } from '@/lib/allowance/types';
import type { AuditEntry } from '@/lib/shared/bench-types';
import type { WholeGarmentKind } from '@/lib/shared/fitting/garment-kinds';
import type { GarmentStep } from '@/lib/shared/garment-steps';
import { kindChangeLine, kindFieldRank } from '@/lib/shared/i18n/kind-words';
import { FittingHistory } from './FittingHistory';

interface Props {
  history: AuditEntry[];
  kind: WholeGarmentKind;
  label: (s: GarmentStep) => string;
  /** the shop's unit and precision, for the reading beside a length typed in another unit */
  unit: Unit;
  precision: Precision;
}

/** The history of a garment fitted once (a skirt, sleeves): its fitting's changes in the kind's words, beside its moves and edits. */
export function KindHistory({ history, kind, label, unit, precision }: Props) {
  const t = useT();
  const lineOf = (e: AuditEntry) => (e.action === 'kind-fitting.changed' ? kindChangeLine(t, kind, e.detail, unit, precision) : null);
  // One save's changes share their moment: read in the form's order.
  const rankOf = (e: AuditEntry) => kindFieldRank(kind, e.detail.field);
  return <FittingHistory history={history} label={label} unit={unit} precision={precision} lineOf={lineOf} rankOf={rankOf} />;
}
