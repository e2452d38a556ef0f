import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { useSay } from '@/components/I18n';
import type { GarmentDetail } from '@/lib/shared/bench-types';
import { fetchJson } from '@/lib/shared/fetch-json';
import { passesMarked } from '@/lib/shared/fitting-rule';
import { nextStep, type GarmentStep } from '@/lib/shared/garment-steps';
import { NoFittingAsk } from './NoFittingAsk';
import { useStepLabel } from './use-bench';
import { useFittingGate } from './use-fitting-gate';
import { useStepBack } from './use-step-back';

interface Props {
  garmentId: string;
  status: GarmentStep;
  /** may move bench steps (advance) */
  canAdvance: boolean;
  /** may hand over (ready → collected) */
  canPickup: boolean;
  /** may step a collected garment back (the lead), so may undo a hand-over tapped by mistake */
  canReopen?: boolean;
  /** 'big' on the garment page, 'row' in the queue */
  size?: 'big' | 'row';
  /** a label naming the garment, for screen readers in a table of many */
  what?: string;
  /** told when the word after a tap (and its Undo) appears and goes, so a list can keep the row where it was meanwhile */
  onOffer?: (showing: boolean) => void;
  /** whether a fitting is saved, when the page knows (it is read again at the tap that passes Chalk-marked) */
  fitted?: boolean;
}

// Long enough to notice a wrong tap and reach Undo; it stays while Undo has the focus.
const UNDO_MS = 10_000;

/** The one tap that moves a garment to its next step, with a short Undo after it; says what went wrong in words. */
export function StepButton({ garmentId, status, canAdvance, canPickup, canReopen = false, size = 'big', what, onOffer, fitted }: Props) {
  const label = useStepLabel();
  const say = useSay();
  const client = useQueryClient();
  const next = nextStep(status);
  // The step a tap just moved the garment to, while Undo is offered.
  const [undoable, setUndoable] = useState<{ from: GarmentStep; to: GarmentStep } | null>(null);
  const [held, setHeld] = useState(false);
  const [said, setSaid] = useState('');
  const move = useMutation({
    mutationFn: ({ to }: { from: GarmentStep; to: GarmentStep }) =>
      fetchJson<{ status: GarmentStep }>(`/api/garments/${garmentId}/step`, { method: 'POST', body: { to } }),
    onSuccess: (_moved, { from, to }) => {
      const mayUndo = to === 'collected' ? canReopen : canAdvance;
      setUndoable(mayUndo ? { from, to } : null);
      setSaid(say('move.marked', `Marked ${label(to)}.`, { step: label(to) }));
      return client.invalidateQueries();
    },
  });
  const back = useStepBack(garmentId);
  const showing = Boolean(undoable || said);
  useEffect(() => onOffer?.(showing), [onOffer, showing]);
  const gate = useFittingGate(what ? `“${what}”` : 'this garment');
  // Read fresh at the tap: someone may have saved the fitting since the list was drawn. Unreadable: the server decides.
  const fittedNow = () =>
    client.fetchQuery({ queryKey: ['garment', garmentId], queryFn: () => fetchJson<GarmentDetail>(`/api/garments/${garmentId}`), staleTime: 0 }).then(
      (g) => g.fitted,
      () => true,
    );

  useEffect(() => {
    if ((!undoable && !said) || held) return;
    const t = setTimeout(() => {
      setUndoable(null);
      setSaid('');
    }, UNDO_MS);
    return () => clearTimeout(t);
  }, [undoable, said, held]);

  const undo = () => {
    if (!undoable) return;
    const { from, to } = undoable;
    back.mutate(to, {
      onSuccess: () => {
        setUndoable(null);
        setHeld(false);
        setSaid(say('move.steppedBack', `Stepped back to ${label(from)}.`, { step: label(from) }));
      },
    });
  };

  const busy = move.isPending || back.isPending;
  const allowed = next !== null && (next === 'collected' ? canPickup : canAdvance);
  const look =
    size === 'big'
      ? 'min-h-16 w-full rounded-lg bg-accent px-6 text-2xl font-extrabold text-white sm:w-auto'
      : 'min-h-12 rounded-md bg-accent px-4 text-lg font-bold text-white whitespace-nowrap';
  if (!allowed && !undoable && !said) {
    return next && size === 'big' ? (
      <p className="text-lg text-muted">{say('move.notYours', `Next: ${label(next)} (not your step to mark).`, { step: label(next) })}</p>
    ) : null;
  }
  // Known here to have no fitting, and the shop refuses: no button that can only be refused, the note says why.
  const unfitted = next !== null && allowed && size === 'big' && fitted === false && passesMarked(status, next);
  const blocked = unfitted && gate.rule === 'refuse';
  return (
    <div className="flex flex-col gap-1">
      {next && allowed && !blocked && (
        <button
          type="button"
          className={`${look} aria-disabled:opacity-60`}
          // aria-disabled rather than disabled: a disabled button drops the keyboard focus mid-move.
          aria-disabled={busy || undefined}
          onClick={() => !busy && void gate.check(status, next, fittedNow, () => move.mutate({ from: status, to: next }))}
          // The name begins with the words on the button (WCAG 2.5.3: "Mark Cut" said aloud finds it),
          // then says which garment, for a list of many such buttons.
          aria-label={what && !move.isPending ? say('move.markWhat', `Mark ${label(next)}: ${what}`, { step: label(next), what }) : undefined}
        >
          {move.isPending ? say('move.moving', 'Moving…') : say('move.mark', `Mark ${label(next)}`, { step: label(next) })}
        </button>
      )}
      <div className="flex flex-wrap items-center gap-2">
        {/* Polite: said once the tap lands, without cutting off what a screen reader is reading. */}
        <p role="status" className="text-base font-semibold">
          {said}
        </p>
        {undoable && (
          <button
            type="button"
            onClick={undo}
            onFocus={() => setHeld(true)}
            onBlur={() => setHeld(false)}
            disabled={back.isPending}
            aria-label={say('move.undoLabel', `Undo: step ${what ?? 'the garment'} back to ${label(undoable.from)}`, {
              what: what ?? say('move.theGarment', 'the garment'),
              step: label(undoable.from),
            })}
            className="min-h-11 rounded-md border-2 border-ink bg-card px-4 text-lg font-bold disabled:opacity-60"
          >
            {back.isPending ? say('move.undoing', 'Undoing…') : say('move.undo', 'Undo')}
          </button>
        )}
      </div>
      {unfitted && (
        <p data-testid="no-fitting-note" className="rounded-md border-l-8 border-warn bg-warn-soft px-3 py-2 text-lg font-semibold text-warn">
          No fitting to cut by saved yet
          {blocked ? `: the shop’s rule is to save one (both legs) before marking it ${label(next)}.` : `: you will be asked before marking it ${label(next)}.`}
        </p>
      )}
      {gate.refused && (
        <p role="alert" className="text-base font-semibold text-cut">
          {gate.refused}
        </p>
      )}
      <NoFittingAsk {...gate.ask} />
      {(move.error ?? back.error) && (
        <p role="alert" className="text-base font-semibold text-cut">
          {(move.error ?? back.error)!.message}
        </p>
      )}
    </div>
  );
}
