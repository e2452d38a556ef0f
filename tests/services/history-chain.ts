// For the racing-saves tests: whether a field's recorded changes link up into one history.

/** Whether a field's change events link up: from `start`, each event's old is the previous one's new, ending at `end`. */
export function chained(events: { old: unknown; new: unknown }[], start: unknown, end: unknown): boolean {
  let at: unknown = start;
  const left = [...events];
  while (left.length) {
    const i = left.findIndex((e) => e.old === at);
    if (i < 0) return false;
    at = left.splice(i, 1)[0]!.new;
  }
  return at === end;
}
