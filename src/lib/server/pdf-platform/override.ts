// Every patch of a package's internals goes through here, so that each can be taken back exactly
// (the "same output with and without" tests, and a patch found not to fit after all).

/** Sets `target[key]` as an own property and returns how to put back what was there (own value, or the inherited one). */
export function override(target: object, key: PropertyKey, value: unknown): () => void {
  const had = Object.getOwnPropertyDescriptor(target, key);
  Object.defineProperty(target, key, { value, writable: true, configurable: true, enumerable: had?.enumerable ?? false });
  return () => {
    if (had) Object.defineProperty(target, key, had);
    else delete (target as Record<PropertyKey, unknown>)[key];
  };
}

/** Runs undo functions last first. */
export function undoAll(undos: (() => void)[]): void {
  while (undos.length) undos.pop()!();
}

/**
 * A patch shared by every face of one class: installed by the first user, taken back when the last
 * lets go. Returns the user's release (calling it twice releases once).
 */
export function sharedPatch(users: Map<object, { count: number; undo: () => void }>, proto: object, install: () => () => void): () => void {
  let use = users.get(proto);
  if (!use) users.set(proto, (use = { count: 0, undo: install() }));
  const held = use;
  held.count += 1;
  let done = false;
  return () => {
    if (done) return;
    done = true;
    held.count -= 1;
    if (held.count === 0) {
      users.delete(proto);
      held.undo();
    }
  };
}
