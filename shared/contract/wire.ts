// The type of a value as it crosses the API: the schema's inferred type, read-only all the way down, so the
// engine's read-only answers (shared/route) type-check against the contract without a copy, and a client cannot
// change an answer it parsed.

/** `T` with every property, array and tuple read-only, recursively. */
export type Wire<T> = T extends (...args: never[]) => unknown ? T : T extends object ? { readonly [K in keyof T]: Wire<T[K]> } : T;
