import { typedAndRead } from '@/lib/shared/length-reading';
import { isUnit } from '@/lib/allowance/units';
import type { Precision, Unit } from '@/lib/allowance/types';
import type { AuditEntry } from '@/lib/shared/bench-types';
import { dateTimeText } from '@/lib/shared/date-text';
import { isLengthField, valueWords } from '@/lib/shared/fitting/kinds';
import { EXISTING_FINISH_LABELS, type ExistingFinish } from '@/lib/shared/existing-finish';
import { isGarmentStep, type GarmentStep } from '@/lib/shared/garment-steps';
import { FINISH_LABELS, LEG_LENGTH_LABELS, LEG_LENGTHS, type Finish, type LegLength } from '@/lib/shared/measurement-request';

interface Props {
  history: AuditEntry[];
  label: (s: GarmentStep) => string;
  /** the shop's unit and precision, for the reading beside a length typed in another unit */
  unit: Unit;
  precision: Precision;
  /** a line's words for events this list does not know itself (a kind's fitting), or null to leave it to the list */
  lineOf?: (e: AuditEntry) => string | null;
  /** the order of one save's lines (same moment), lowest first; by default a leg's, left before right in the form's order */
  rankOf?: (e: AuditEntry) => number;
}

const OTHER_FIELDS: Record<string, string> = {
  finish: 'Finish',
  preset: 'Preset',
  unit: 'Unit',
  description: 'Description',
  dueOn: 'Due date',
  assigneeId: 'Given to',
  existingFinish: 'Existing finish',
};

function fieldName(field: string): string {
  return LEG_LENGTH_LABELS[field as LegLength] ?? OTHER_FIELDS[field] ?? field;
}

function shown(field: string, value: unknown): string {
  if (value === null || value === undefined || value === '') return 'nothing';
  if (field === 'finish') return FINISH_LABELS[value as Finish] ?? String(value);
  if (field === 'existingFinish') return EXISTING_FINISH_LABELS[value as ExistingFinish] ?? String(value);
  return String(value);
}

function describe(e: AuditEntry, { label, unit: shopUnit, precision }: Omit<Props, 'history' | 'lineOf' | 'rankOf'>): string {
  const d = e.detail;
  if (e.action === 'measurement.changed') {
    const typedIn = isUnit(d.unit) ? d.unit : shopUnit;
    const isField = LEG_LENGTHS.includes(d.field as LegLength);
    // A length as typed, with its own unit ("38 mm" stays 38 mm in an inch shop), and the shop's reading; a choice or percent in words.
    const val = (v: unknown) =>
      !v
        ? 'nothing'
        : !isField
          ? shown(String(d.field), v)
          : isLengthField(d.field as LegLength)
            ? typedAndRead(String(v), typedIn, shopUnit, precision)
            : valueWords(d.field as LegLength, String(v));
    return `${String(d.leg) === 'left' ? 'Left' : 'Right'} leg, ${fieldName(String(d.field))}: ${val(d.old)} → ${val(d.new)}`;
  }
  if (e.action === 'garment.moved' && isGarmentStep(d.from) && isGarmentStep(d.to)) {
    return d.back ? `Stepped back from ${label(d.from)} to ${label(d.to)}` : `Moved from ${label(d.from)} to ${label(d.to)}`;
  }
  if (e.action === 'garment.changed') {
    return Object.entries(d as Record<string, { old: unknown; new: unknown }>)
      .map(([k, v]) => `${fieldName(k)}: ${k === 'assigneeId' ? (v.new ? 'someone new' : 'nobody') : `${shown(k, v.old)} → ${shown(k, v.new)}`}`)
      .join('; ');
  }
  if (e.action === 'garment.added') return 'Taken in';
  return e.action;
}

const FIELD_ORDER = ['finish', 'preset', 'unit', ...LEG_LENGTHS] as string[];

// A leg's line: left leg before right, each in the form's order.
function legRank(e: AuditEntry): number {
  return (e.detail.leg === 'right' ? 100 : 0) + FIELD_ORDER.indexOf(String(e.detail.field ?? ''));
}

/** Newest first; one save's changes (same moment) in `rank`'s order. */
function ordered(history: AuditEntry[], rank: (e: AuditEntry) => number): AuditEntry[] {
  return [...history].sort((x, y) => (x.at === y.at ? rank(x) - rank(y) : x.at < y.at ? 1 : -1));
}

/** Every change to the garment and its measurements: who, when, old and new value. */
export function FittingHistory({ history, label, unit, precision, lineOf, rankOf = legRank }: Props) {
  return (
    <section aria-labelledby="history-heading" className="flex flex-col gap-2">
      <h2 id="history-heading" className="text-2xl font-extrabold">
        History
      </h2>
      {history.length === 0 ? (
        <p className="text-muted">No changes recorded yet.</p>
      ) : (
        <ol className="flex flex-col divide-y divide-rule rounded-lg border-2 border-rule bg-card" data-testid="history">
          {ordered(history, rankOf).map((e) => (
            <li key={e.id} className="flex flex-wrap items-baseline gap-x-4 px-4 py-2">
              <span className="measure font-semibold">{lineOf?.(e) ?? describe(e, { label, unit, precision })}</span>
              <span className="text-base text-muted">
                {e.actorName ?? 'Someone no longer here'} · <time dateTime={e.at}>{dateTimeText(e.at)}</time>
              </span>
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}
