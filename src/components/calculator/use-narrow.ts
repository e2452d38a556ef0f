import { useEffect, useState, type RefObject } from 'react';

/** True while the element is narrower than `px`: a drawing then stacks its parts so its words stay legible. */
export function useNarrow(ref: RefObject<Element | null>, px: number): boolean {
  const [narrow, setNarrow] = useState(false);
  useEffect(() => {
    const el = ref.current;
    if (!el || typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(([entry]) => setNarrow((entry?.contentRect.width ?? px) < px));
    observer.observe(el);
    return () => observer.disconnect();
  }, [ref, px]);
  return narrow;
}
