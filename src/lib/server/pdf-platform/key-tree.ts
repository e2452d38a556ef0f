// Keys found, not spelt: what a memo compares is walked as a path of values through a tree of maps,
// and the path's end is the key, one object per distinct path. Spelling the values into a string
// made a new string, and hashed it, for every lookup; the walk asks each map for one value and makes
// nothing for a path seen before. Values are map keys as they are (a string, a number, a boolean,
// null and undefined never equal one another); a setting compared by content stands in the path as
// the object its spelling is interned to, so it never equals a string. The memos using it mark
// their paths' structure with objects of their own.
type Tree = Map<unknown, unknown>;

/** A place in a key tree: where a path has got to. */
export type KeyPath = Tree;

const END = { mark: 'end of path' };

/** Paths of values to key objects, with a bound on the maps held (then it starts afresh). */
export class KeyTree {
  private root: Tree = new Map();
  private maps = 0;
  private spellings = new Map<string, object>();
  private count = 0;

  /** `limit` maps at most; `forget` runs when the tree starts afresh (keys made before are never given again). */
  constructor(
    private readonly limit: number,
    private readonly forget: () => void,
  ) {}

  /** Where a new path starts. */
  start(): KeyPath {
    if (this.maps >= this.limit || this.spellings.size >= this.limit) {
      this.root = new Map();
      this.maps = 0;
      this.spellings.clear();
      this.forget();
    }
    return this.root;
  }

  /** The path one value further. */
  step(at: KeyPath, value: unknown): KeyPath {
    let next = at.get(value) as Tree | undefined;
    if (next === undefined) {
      at.set(value, (next = new Map()));
      this.maps += 1;
    }
    return next;
  }

  /** The object standing in a path for a setting spelt as `spelt` (the same object for the same spelling). */
  spelling(spelt: string): object {
    let stand = this.spellings.get(spelt);
    if (stand === undefined) this.spellings.set(spelt, (stand = { spelt }));
    return stand;
  }

  /** The key at the end of a path. */
  end(at: KeyPath): object {
    let key = at.get(END) as object | undefined;
    if (key === undefined) at.set(END, (key = { path: (this.count += 1) }));
    return key;
  }
}
