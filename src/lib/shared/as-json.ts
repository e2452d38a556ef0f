// A server type as an island receives it through fetch and JSON.parse: every Date is a string.

/** `T` after a JSON round trip: Date fields (at any depth, nullable or not) become ISO strings. */
export type AsJson<T> = T extends Date ? string : T extends readonly (infer U)[] ? AsJson<U>[] : T extends object ? { [K in keyof T]: AsJson<T[K]> } : T;
