import { useT } from '@/components/I18n';
import type { MessageKey } from '@/lib/shared/i18n/format';
import type { WaistNote } from '@/lib/shared/cut-sheet-types';

/** A leg's pending waist change and where it moves the pin mark (worked out on the server as the sheet prints it), or nothing. */
export function WaistNoteLine({ note }: { note: WaistNote | undefined }) {
  const t = useT();
  if (!note) return null;
  return (
    <p data-testid="waist-note" className="rounded-lg border-2 border-warn bg-card px-4 py-2 text-lg font-semibold">
      {t(`waist.${note.code}` as MessageKey, { ...note })}
    </p>
  );
}
