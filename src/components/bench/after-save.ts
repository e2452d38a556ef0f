// What a form shows once a save comes back: the server's copy for every field nobody touched while
// the save was on its way, and what is typed now for every field changed since it started.

type Values = { [key: string]: unknown };

function isValues(v: unknown): v is Values {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** The saved values with newer edits laid over them, and the dotted paths of those edits. */
export function afterSave<T extends Values>(sent: T, now: T, saved: T): { values: T; newer: string[] } {
  const newer: string[] = [];
  const walk = (s: unknown, n: unknown, v: unknown, path: string): unknown => {
    if (isValues(v) && isValues(n)) {
      const out: Values = { ...v };
      for (const key of Object.keys(v)) out[key] = walk(isValues(s) ? s[key] : undefined, n[key], v[key], path ? `${path}.${key}` : key);
      return out;
    }
    if (n === undefined || Object.is(n, s)) return v;
    newer.push(path);
    return n;
  };
  return { values: walk(sent, now, saved, '') as T, newer };
}
