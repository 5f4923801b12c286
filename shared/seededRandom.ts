/**
 * mulberry32: a small seeded generator of uniform numbers in [0, 1) (Tommy Ettinger's public-domain
 * 32-bit generator, as used by flatbush's benchmarks). The core never calls Math.random: seeds come in, so
 * motifs, tests and benchmarks give the same result on every run and a failing seed can be pinned.
 */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
