/**
 * mulberry32, a seeded 32-bit PRNG (Tommy Ettinger's public-domain generator, as flatbush's bench uses), for tests
 * and benchmarks: the same data on every run, so a failing seed can be pinned.
 */
export function makeRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
