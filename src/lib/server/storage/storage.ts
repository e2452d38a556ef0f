// The storage interface fitting photos go through: the disk today, an object store later.

/** Bytes kept under a key such as `<shopId>/<random id>.jpg`. */
export interface Storage {
  /** Saves the bytes under the key, replacing what was there. */
  put(key: string, bytes: Uint8Array, contentType: string): Promise<void>;
  /** The bytes under the key, or null when there are none. */
  get(key: string): Promise<Uint8Array | null>;
  /** Removes the key; removing a missing key is not an error. */
  delete(key: string): Promise<void>;
}

// Keys are made by the app (shop id + random id), never from a person's input; this is the guard
// that keeps any slip from reaching outside the storage root.
const KEY = /^[A-Za-z0-9_-]+(\/[A-Za-z0-9_-]+)*\.[a-z0-9]{2,5}$/;

/** The key when it is a plain relative name (no `..`, no leading slash), else throws. */
export function checkKey(key: string): string {
  if (!KEY.test(key)) throw new Error(`Refusing storage key ${JSON.stringify(key)}.`);
  return key;
}
