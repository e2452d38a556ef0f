import { useT } from '@/components/I18n';
import { creaseText } from '@/lib/shared/i18n/engine-messages';
import type { CreaseLanding } from '@/lib/allowance/types';

/** Where the old hem's crease ends up once the cuff is made, and whether it will show. */
export function CreaseNote({ crease }: { crease: CreaseLanding }) {
  const t = useT();
  return (
    <section
      aria-labelledby="crease-heading"
      className={`rounded-md border-2 px-4 py-3 text-lg break-inside-avoid ${crease.visible ? 'border-warn bg-warn-soft text-warn' : 'border-rule bg-card'}`}
    >
      <h2 id="crease-heading" className="font-extrabold">
        {t('crease.heading')}
      </h2>
      <p>{creaseText(t, crease)}</p>
    </section>
  );
}
