// Long fast-check runs as async properties that hand the event loop back between runs.
// Why: Vitest's worker talks to the main process over RPC with a 60 s answer timeout. A synchronous property
// of 2,000 runs can hold a worker's event loop for longer than that on a loaded 2-core machine, and the run
// then fails with "Timeout calling onTaskUpdate" however correct the code under test is.
import fc from 'fast-check';

const nextTurn = () => new Promise<void>((resolve) => setImmediate(resolve));

/** fc.assert of `predicate` over `arb`, yielding to the event loop before every run. */
export async function assertYielding<T>(arb: fc.Arbitrary<T>, predicate: (value: T) => boolean | void, params: fc.Parameters<[T]>): Promise<void> {
  await fc.assert(
    fc.asyncProperty(arb, async (value) => {
      await nextTurn();
      return predicate(value);
    }),
    params,
  );
}
