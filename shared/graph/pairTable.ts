/**
 * Hash map from an unordered vertex pair {a, b} (non-negative int32 ids) to a non-negative int value,
 * on Int32Arrays with linear probing. Plain Map keys a·n + b exceed 2³¹ on large graphs and then hash as
 * slow heap doubles; this keeps the noder's hot path allocation-free.
 */
export class PairTable {
  #lo: Int32Array;
  #hi: Int32Array;
  #val: Int32Array;
  #mask: number;
  #size = 0;

  constructor(expected = 1024) {
    let cap = 1024;
    while (cap < expected * 2) cap *= 2;
    this.#lo = new Int32Array(cap).fill(-1);
    this.#hi = new Int32Array(cap);
    this.#val = new Int32Array(cap);
    this.#mask = cap - 1;
  }

  /** The value stored for {a, b}, or -1. */
  get(a: number, b: number): number {
    const lo = a < b ? a : b;
    const hi = a < b ? b : a;
    for (let slot = pairHash(lo, hi) & this.#mask; ; slot = (slot + 1) & this.#mask) {
      const k = this.#lo[slot]!;
      if (k < 0) return -1;
      if (k === lo && this.#hi[slot] === hi) return this.#val[slot]!;
    }
  }

  /** Stores `value` (≥ 0) for {a, b}; the pair must not be stored yet. */
  insert(a: number, b: number, value: number): void {
    if ((this.#size + 1) * 2 > this.#lo.length) this.#grow();
    this.#place(a < b ? a : b, a < b ? b : a, value);
    this.#size++;
  }

  #place(lo: number, hi: number, value: number): void {
    let slot = pairHash(lo, hi) & this.#mask;
    while (this.#lo[slot]! >= 0) slot = (slot + 1) & this.#mask;
    this.#lo[slot] = lo;
    this.#hi[slot] = hi;
    this.#val[slot] = value;
  }

  #grow(): void {
    const [lo, hi, val] = [this.#lo, this.#hi, this.#val];
    this.#lo = new Int32Array(lo.length * 2).fill(-1);
    this.#hi = new Int32Array(lo.length * 2);
    this.#val = new Int32Array(lo.length * 2);
    this.#mask = lo.length * 2 - 1;
    for (let s = 0; s < lo.length; s++) if (lo[s]! >= 0) this.#place(lo[s]!, hi[s]!, val[s]!);
  }
}

function pairHash(lo: number, hi: number): number {
  return (Math.imul(lo, 0x9e3779b1) ^ Math.imul(hi, 0x85ebca77)) >>> 0;
}
