import { Dialog } from '@/components/Dialog';

interface Props {
  open: boolean;
  /** the garment ("“Olive gabardine”", "this garment") or how many ("2 garments") */
  what: string;
  /** the step it would be marked, in the shop's words */
  step: string;
  onGoOn: () => void;
  onCancel: () => void;
}

/** The shop's 'warn' rule: before a garment with no fitting saved passes Chalk-marked, ask (the safe answer has the focus). */
export function NoFittingAsk({ open, what, step, onGoOn, onCancel }: Props) {
  return (
    <Dialog open={open} onClose={onCancel} title="No fitting saved" size="ask" testId="no-fitting-ask">
      <p className="text-xl">
        No fitting to cut by is saved for {what} (both legs, each with its plan): there are no chalk lines worked out. Mark it {step} anyway?
      </p>
      <div className="flex flex-wrap gap-3">
        <button type="button" data-autofocus onClick={onCancel} className="min-h-14 rounded-lg border-2 border-ink bg-card px-5 text-xl font-bold">
          Not yet
        </button>
        <button type="button" onClick={onGoOn} className="min-h-14 rounded-lg bg-cut px-5 text-xl font-extrabold text-white">
          Mark {step} anyway
        </button>
      </div>
    </Dialog>
  );
}
