/** Ends an exhaustive switch; reaching it means a tagged union gained a member nobody handled. */
export function assertNever(value: never): never {
  throw new Error(`assertNever: unexpected value ${JSON.stringify(value)}`);
}
