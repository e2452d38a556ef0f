import type { CreaseLanding } from '@/lib/allowance/types';

/** Where the old hem's crease ends up once the cuff is made, and whether it will show. */
export function CreaseNote({ crease }: { crease: CreaseLanding }) {
  return (
    <section
      aria-labelledby="crease-heading"
      className={`rounded-md border-2 px-4 py-3 text-lg break-inside-avoid ${crease.visible ? 'border-warn bg-warn-soft text-warn' : 'border-rule bg-card'}`}
    >
      <h2 id="crease-heading" className="font-extrabold">
        Old crease
      </h2>
      <p>{crease.message}</p>
    </section>
  );
}
