import { useEffect, useState } from 'react';

/** The value as it was once it stopped changing for `ms`; compared by JSON so equal objects don't restart the wait. */
export function useDebounced<T>(value: T, ms: number): T {
  const key = JSON.stringify(value);
  const [settled, setSettled] = useState(key);
  useEffect(() => {
    const t = setTimeout(() => setSettled(key), ms);
    return () => clearTimeout(t);
  }, [key, ms]);
  return JSON.parse(settled) as T;
}
