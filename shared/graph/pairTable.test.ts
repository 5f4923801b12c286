import { describe, expect, it } from 'vitest';
import { PairTable } from './pairTable.ts';

describe('graph/pairTable', () => {
  it('stores unordered pairs and agrees with a Map through growth', () => {
    const t = new PairTable(4);
    const ref = new Map<string, number>();
    let seed = 7;
    const rnd = (n: number): number => (seed = (seed * 48271) % 2147483647) % n;
    for (let k = 0; k < 20_000; k++) {
      const a = rnd(3000);
      const b = rnd(3000);
      const key = `${Math.min(a, b)},${Math.max(a, b)}`;
      expect(t.get(b, a)).toBe(ref.get(key) ?? -1);
      if (!ref.has(key)) {
        ref.set(key, k);
        t.insert(a, b, k);
      }
    }
    expect(t.get(1, 2)).toBe(ref.get('1,2') ?? -1);
  });
});
