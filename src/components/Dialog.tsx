// A modal dialog on the browser's own <dialog>: it opens on the top layer, so nothing on the page
// moves; the browser keeps the keyboard inside it, closes it on Escape, and puts the focus back
// where it was when it closes.
import { useEffect, useId, useRef, type ReactNode } from 'react';

interface Props {
  open: boolean;
  /** called however it closes: Escape, the Close button, a tap on the dimmed page */
  onClose: () => void;
  title: string;
  children: ReactNode;
  /** 'panel': tall, for a list (presets); 'ask': short, for a question */
  size?: 'panel' | 'ask';
  /** for tests and screenshots */
  testId?: string;
}

/** A labelled modal dialog with a Close button; the page under it stays where it is. Mark the control to start on with data-autofocus. */
export function Dialog({ open, onClose, title, children, size = 'panel', testId }: Props) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) {
      d.showModal();
      // React's autoFocus runs before the dialog opens; the element marked data-autofocus (the safe answer) gets it now.
      d.querySelector<HTMLElement>('[data-autofocus]')?.focus();
    }
    if (!open && d.open) d.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      data-testid={testId}
      onClose={onClose}
      // A tap on the dimmed page outside the box closes it, as Escape does.
      onClick={(e) => e.target === e.currentTarget && onClose()}
      className={
        'm-auto w-[min(40rem,calc(100vw-1.5rem))] overflow-y-auto overscroll-contain rounded-lg border-2 border-ink bg-card p-0 text-ink backdrop:bg-ink/60 ' +
        (size === 'panel' ? 'max-h-[min(44rem,calc(100dvh-1.5rem))]' : 'max-h-[calc(100dvh-1.5rem)]')
      }
    >
      {/* Nothing inside while closed: no hidden copy of its title or buttons for a search to find. */}
      {open && (
        <div className="flex flex-col gap-4 p-4">
          <div className="flex items-start justify-between gap-3">
            <h2 id={titleId} className="text-2xl font-extrabold">
              {title}
            </h2>
            <button type="button" onClick={onClose} className="min-h-11 shrink-0 rounded-md border-2 border-ink px-4 text-lg font-semibold">
              Close
            </button>
          </div>
          {children}
        </div>
      )}
    </dialog>
  );
}
