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

/** The element's rendered width in px, followed as it changes; null until measured (on the server and at the first render). */
export function useWidth(ref: RefObject<Element | null>): number | null {
  const [width, setWidth] = useState<number | null>(null);
  useEffect(() => {
    const el = ref.current;
    if (!el || typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(([entry]) => setWidth(entry ? Math.round(entry.contentRect.width) : null));
    observer.observe(el);
    return () => observer.disconnect();
  }, [ref]);
  return width;
}
