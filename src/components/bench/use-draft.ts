// Unsaved form values kept in this tab's sessionStorage, so a reload or a lost connection does not
// throw away lengths typed at the fitting. Cleared once the form is saved or the draft discarded.

/** Reads a kept draft, or null (also where storage is unavailable). */
export function readDraft<T>(key: string): T | null {
  try {
    const raw = typeof window === 'undefined' ? null : window.sessionStorage.getItem(key);
    return raw ? (JSON.parse(raw) as T) : null;
  } catch {
    return null;
  }
}

/** Keeps the values as the draft while they differ from what is saved; drops it once they do not. */
export function keepDraft(key: string, values: unknown, dirty: boolean): void {
  try {
    if (dirty) window.sessionStorage.setItem(key, JSON.stringify(values));
    else window.sessionStorage.removeItem(key);
  } catch {
    // Private mode or full storage: the form itself still holds everything.
  }
}
