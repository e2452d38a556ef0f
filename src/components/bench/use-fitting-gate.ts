// Before a garment (or a ticket's garments) passes Chalk-marked: is a fitting saved, and if not,
// what does the shop's rule say? 'warn' asks first (NoFittingAsk), 'refuse' says why here, before
// the server would refuse the move anyway.
import { useState } from 'react';
import { noFittingRefusal, passesMarked } from '@/lib/shared/fitting-rule';
import type { GarmentStep } from '@/lib/shared/garment-steps';
import { useBenchSettings, useStepLabel } from './use-bench';

/** The gate: `check(from, to, fitted, go)` runs `go` at once, after a confirm, or not at all (with `refused` said). */
export function useFittingGate(what: string) {
  const rule = useBenchSettings().data?.fittingRule ?? 'warn';
  const label = useStepLabel();
  const [asking, setAsking] = useState<{ step: string; go: () => void } | null>(null);
  const [refused, setRefused] = useState('');
  /** `fitted`: whether every garment moving has its fitting, read fresh (a promise) or known. */
  const check = async (from: GarmentStep, to: GarmentStep, fitted: boolean | (() => Promise<boolean>), go: () => void) => {
    setRefused('');
    if (!passesMarked(from, to) || (typeof fitted === 'boolean' ? fitted : await fitted())) return go();
    if (rule === 'refuse') return setRefused(noFittingRefusal(what, label(to)));
    setAsking({ step: label(to), go });
  };
  const ask = {
    open: asking !== null,
    what,
    step: asking?.step ?? '',
    onGoOn: () => {
      asking?.go();
      setAsking(null);
    },
    onCancel: () => setAsking(null),
  };
  return { check, refused, ask, rule };
}
