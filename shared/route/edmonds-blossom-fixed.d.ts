// Types for the test oracle edmonds-blossom-fixed 1.0.1 (a JS port of Van Rantwijk's mwmatching.py; it ships none).
declare module 'edmonds-blossom-fixed' {
  /** Maximum-weight matching of `[u, v, weight]` edges (each a 3-number array); returns mate[v] (-1 when unmatched). */
  export default function blossom(edges: readonly (readonly number[])[], maxCardinality?: boolean): number[];
}
