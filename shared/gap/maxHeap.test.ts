import { describe, expect, it } from 'vitest';
import { MaxHeap } from './maxHeap.ts';

describe('gap/maxHeap', () => {
  it('pops ids by descending priority, like sorting', () => {
    const h = new MaxHeap();
    const keys = [5, 1, 9, 3, 3, 7, 0, 8, 2, 6];
    keys.forEach((k, id) => h.push(id, k));
    const order: number[] = [];
    while (h.size > 0) {
      expect(h.peekKey()).toBe(Math.max(...order.length ? keys.filter((_, id) => !order.includes(id)) : keys));
      order.push(h.pop());
    }
    expect(order.map((id) => keys[id])).toEqual([...keys].sort((a, b) => b - a));
    expect(h.pop()).toBe(-1);
    expect(h.peekKey()).toBe(-Infinity);
  });
});
