/** A binary max-heap of numeric ids ordered by a priority, on plain arrays (ids and priorities stored together). */
export class MaxHeap {
  readonly #ids: number[] = [];
  readonly #keys: number[] = [];

  get size(): number {
    return this.#ids.length;
  }

  /** Priority of the top item; -Infinity when empty. */
  peekKey(): number {
    return this.#keys[0] ?? -Infinity;
  }

  push(id: number, key: number): void {
    const ids = this.#ids;
    const keys = this.#keys;
    let i = ids.length;
    ids.push(id);
    keys.push(key);
    while (i > 0) {
      const parent = (i - 1) >> 1;
      if (keys[parent]! >= key) break;
      ids[i] = ids[parent]!;
      keys[i] = keys[parent]!;
      i = parent;
    }
    ids[i] = id;
    keys[i] = key;
  }

  /** Removes and returns the id with the largest priority; -1 when empty. */
  pop(): number {
    const ids = this.#ids;
    const keys = this.#keys;
    if (ids.length === 0) return -1;
    const top = ids[0]!;
    const lastId = ids.pop()!;
    const lastKey = keys.pop()!;
    const n = ids.length;
    if (n > 0) {
      let i = 0;
      for (;;) {
        const l = 2 * i + 1;
        if (l >= n) break;
        const r = l + 1;
        const c = r < n && keys[r]! > keys[l]! ? r : l;
        if (keys[c]! <= lastKey) break;
        ids[i] = ids[c]!;
        keys[i] = keys[c]!;
        i = c;
      }
      ids[i] = lastId;
      keys[i] = lastKey;
    }
    return top;
  }
}
