import { useRich, useT, withLanguage } from '@/components/I18n';
import { useQuery } from '@tanstack/react-query';
import { useRef, useState } from 'react';
import { GarmentPhotos } from '@/components/photos/GarmentPhotos';
import { withQuery } from '@/components/WithQuery';
import { PrintCutSheet } from '@/components/cut-sheets/PrintCutSheet';
import { scaleUnit, type Scale } from '@/lib/shared/bench-requests';
import type { FittingView, GarmentDetail } from '@/lib/shared/bench-types';
import { letDownFirst } from '@/lib/shared/existing-finish';
import { fetchJson } from '@/lib/shared/fetch-json';
import { GARMENT_STEPS } from '@/lib/shared/garment-steps';
import { ticketLabel } from '@/lib/shared/ticket-number';
import { DueBadge } from './DueBadge';
import { FittingForm } from './FittingForm';
import { KindFittingForm } from './kinds/KindFittingForm';
import { isLegKind, kindOf } from '@/lib/shared/fitting/garment-kinds';
import type { KindFittingAnswer } from '@/lib/shared/kind-fitting-request';
import { GarmentEdit } from './GarmentEdit';
import { FittingHistory } from './FittingHistory';
import { KindHistory } from './KindHistory';
import { FittingReadOnly } from './FittingReadOnly';
import { StepBackButton } from './StepBackButton';
import { StepButton } from './StepButton';
import { useBenchSettings, useStepLabel } from './use-bench';

interface Props {
  garmentId: string;
  /** the shop's name: its initials start the ticket number */
  shopName: string;
  /** may change description, due date and assignee */
  canEditGarment: boolean;
  canEditFitting: boolean;
  canReadFitting: boolean;
  canAdvance: boolean;
  canPickup: boolean;
  /** may step a collected garment back to ready (the lead) */
  canReopen?: boolean;
  canUploadPhotos: boolean;
  /** the scale the cut sheet starts in, when this person may print it */
  print?: { scale: Scale } | null;
}

function Bench({
  garmentId,
  shopName,
  canEditGarment,
  canEditFitting,
  canReadFitting,
  canAdvance,
  canPickup,
  canReopen = false,
  canUploadPhotos,
  print = null,
}: Props) {
  const garment = useQuery({ queryKey: ['garment', garmentId], queryFn: () => fetchJson<GarmentDetail>(`/api/garments/${garmentId}`) });
  // Trousers are fitted per leg; any other kind once, through its own route (the registry says which).
  const kind = garment.data ? kindOf(garment.data.kind) : null;
  const fitting = useQuery({
    queryKey: ['fitting', garmentId],
    queryFn: () => fetchJson<FittingView>(`/api/garments/${garmentId}/measurements`),
    enabled: canReadFitting && kind === 'trousers',
  });
  const whole = useQuery({
    queryKey: ['kind-fitting', garmentId],
    queryFn: () => fetchJson<KindFittingAnswer>(`/api/garments/${garmentId}/kind-fitting`),
    enabled: canReadFitting && kind !== null && !isLegKind(kind),
  });
  const settings = useBenchSettings();
  const label = useStepLabel();
  const t = useT();
  const rich = useRich();
  const [editing, setEditing] = useState(false);
  // The fitting form's unsaved state and its save, so printing never quietly prints stale lengths.
  const [fittingDirty, setFittingDirty] = useState(false);
  const saveFitting = useRef<(() => Promise<boolean>) | null>(null);
  if (garment.isError)
    return (
      <p role="alert" className="text-xl font-semibold text-cut">
        {garment.error.message}
      </p>
    );
  if (garment.isPending || settings.isPending) return <p className="text-xl text-muted">{t('garment.loading')}</p>;
  const g = garment.data;
  const { unit, precision } = scaleUnit(settings.data?.scale ?? 'in8');
  const at = GARMENT_STEPS.indexOf(g.status);
  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-col gap-3">
        <p className="text-lg">
          <a href={`/tickets/${g.ticket.id}`} className="font-extrabold text-accent underline">
            {ticketLabel(g.ticket.number, shopName)}
          </a>
          {g.customer && <> · {g.customer.name}</>}
          {g.customer?.phone && <span className="text-muted"> · {g.customer.phone}</span>}
        </p>
        <h1 className="text-4xl font-extrabold">{g.description}</h1>
        <dl className="grid gap-x-8 gap-y-1 text-lg sm:grid-cols-[auto_1fr]">
          <dt className="font-semibold">{t('garment.due')}</dt>
          <dd>
            <DueBadge dueOn={g.dueOn} />
          </dd>
          <dt className="font-semibold">{t('garment.givenTo')}</dt>
          <dd>{g.assigneeName ?? t('garment.nobody')}</dd>
          {kind !== 'trousers' && (
            <>
              <dt className="font-semibold">{t('garment.kind')}</dt>
              <dd data-testid="garment-kind">{t(`kind.${kind ?? 'trousers'}`)}</dd>
            </>
          )}
          {kind === 'trousers' && (
            <>
              <dt className="font-semibold">{t('garment.existingFinish')}</dt>
              <dd>
                {t(`existing.${g.existingFinish}`)}
                {g.existingFinish === 'cuff' && t('garment.letDownFirst')}
              </dd>
            </>
          )}
          {g.customer?.notes && (
            <>
              <dt className="font-semibold">{t('garment.customerNotes')}</dt>
              <dd>{g.customer.notes}</dd>
            </>
          )}
        </dl>
        {canEditGarment &&
          (editing ? (
            <GarmentEdit garment={g} onDone={() => setEditing(false)} />
          ) : (
            <button type="button" onClick={() => setEditing(true)} className="min-h-11 self-start rounded-md border-2 border-ink px-4 text-lg font-semibold">
              {t('garment.change')}
            </button>
          ))}
        {/* A record of where the garment stands, drawn as text (no outlines, no fills) so nothing
            looks tappable: the one way to move it is the button below, with its rules. */}
        <ol aria-label={t('garment.steps')} data-testid="step-record" className="flex flex-wrap items-baseline gap-x-2 gap-y-1 text-lg">
          {GARMENT_STEPS.map((s, i) => (
            <li key={s} aria-current={i === at ? 'step' : undefined} className="inline-flex items-baseline gap-2">
              {i > 0 && (
                <span aria-hidden="true" className="text-muted">
                  ›
                </span>
              )}
              <span className={i === at ? 'font-extrabold text-ink underline decoration-4 underline-offset-4' : i < at ? 'text-ok' : 'text-muted'}>
                {i < at && <span aria-hidden="true">✓ </span>}
                {label(s)}
                {i < at && <span className="sr-only">{t('garment.done')}</span>}
              </span>
            </li>
          ))}
        </ol>
        <p className="text-2xl">{rich('garment.now', { step: <strong data-testid="garment-step">{label(g.status)}</strong> })}</p>
        <div className="flex flex-wrap items-start gap-4">
          <StepButton garmentId={g.id} status={g.status} canAdvance={canAdvance} canPickup={canPickup} canReopen={canReopen} fitted={g.fitted} />
          <StepBackButton garmentId={g.id} status={g.status} canAdvance={canAdvance} canReopen={canReopen} />
        </div>
      </header>

      {canReadFitting &&
        kind !== null &&
        !isLegKind(kind) &&
        (whole.isPending ? (
          <p className="text-lg text-muted">{t('garment.loadingFitting')}</p>
        ) : whole.isError ? (
          <p role="alert" className="font-semibold text-cut">
            {whole.error.message}
          </p>
        ) : (
          <KindFittingForm
            garmentId={g.id}
            kind={kind}
            fitting={whole.data}
            unit={unit}
            precision={precision}
            canEdit={canEditFitting}
            onDirtyChange={setFittingDirty}
            saveRef={saveFitting}
          />
        ))}

      {canReadFitting &&
        kind === 'trousers' &&
        (fitting.isPending ? (
          <p className="text-lg text-muted">{t('garment.loadingFitting')}</p>
        ) : fitting.isError ? (
          <p role="alert" className="font-semibold text-cut">
            {fitting.error.message}
          </p>
        ) : canEditFitting ? (
          <FittingForm
            garmentId={g.id}
            fitting={fitting.data}
            unit={unit}
            precision={precision}
            onDirtyChange={setFittingDirty}
            saveRef={saveFitting}
            letDown={letDownFirst(g.existingFinish)}
          />
        ) : (
          <FittingReadOnly fitting={fitting.data} unit={unit} precision={precision} letDown={letDownFirst(g.existingFinish)} />
        ))}

      {print && (
        <PrintCutSheet
          garmentId={g.id}
          scale={print.scale}
          unsaved={canEditFitting && fittingDirty}
          save={() => saveFitting.current?.() ?? Promise.resolve(false)}
        />
      )}

      {/* The photos island brings its own "Fitting photos" heading. */}
      <GarmentPhotos garmentId={g.id} canUpload={canUploadPhotos} />

      {canReadFitting && fitting.data && <FittingHistory history={fitting.data.history} label={label} unit={unit} precision={precision} />}
      {canReadFitting && kind !== null && !isLegKind(kind) && whole.data && (
        <KindHistory history={whole.data.history} kind={kind} label={label} unit={unit} precision={precision} />
      )}
    </div>
  );
}

/** The garment page island: where it stands, its fitting per leg with the live plan, photos, history; in the shop's language. */
export default withLanguage(withQuery(Bench));
