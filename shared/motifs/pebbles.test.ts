import { describe, expect, it } from 'vitest';
import type { Point } from '../geometry/point.ts';
import { generatePebbles, packPebbles } from './pebbles.ts';
import { distanceToOutline, isInsideOrOn } from './polygon.ts';

// The separate (older) look: disjoint pebbles `gap` apart. Joined pebbles are tested in pebbleChain.test.ts.
const params = { kind: 'pebbles' as const, minRadius: 0.2, maxRadius: 0.6, gap: 0.05, overlap: 0, seed: 7, chordError: 0.005, separate: true };

describe('motifs/pebbles (separate)', () => {
  const shapes: Point[][] = [
    [[0, 0], [6, 0], [6, 6], [0, 6]],
    [[0, 0], [8, 0], [0, 5]],
    [[0, 0], [4, 0], [4, 1], [1, 1], [1, 4], [0, 4]],
  ];

  it.each(shapes.map((s, i) => [i, s] as const))('shape %s: pebbles are disjoint and inside', (_, shape) => {
    const pebbles = packPebbles(shape, params);
    expect(pebbles.length).toBeGreaterThan(3);
    pebbles.forEach((p, i) => {
      expect(p.radius).toBeGreaterThanOrEqual(params.minRadius);
      expect(p.radius).toBeLessThanOrEqual(params.maxRadius);
      expect(isInsideOrOn(p.center, shape, 0)).toBe(true);
      expect(distanceToOutline(p.center, shape)).toBeGreaterThanOrEqual(p.radius + params.gap - 1e-12);
      pebbles.slice(i + 1).forEach((q) => {
        expect(Math.hypot(p.center[0] - q.center[0], p.center[1] - q.center[1])).toBeGreaterThanOrEqual(p.radius + q.radius + params.gap - 1e-12);
      });
    });
  });

  it('flattens each pebble to a closed loop within the chord error of its circle', () => {
    const shape = shapes[0]!;
    const { lines } = generatePebbles(shape, params);
    const pebbles = packPebbles(shape, params);
    lines.forEach((loop, i) => {
      const { center, radius } = pebbles[i]!;
      expect(loop[0]).toEqual(loop[loop.length - 1]);
      for (let k = 1; k < loop.length; k++) {
        const [a, b] = [loop[k - 1]!, loop[k]!];
        const mid: Point = [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];
        // A chord's midpoint sits the sagitta inside the circle: at most chordError.
        expect(radius - Math.hypot(mid[0] - center[0], mid[1] - center[1])).toBeLessThanOrEqual(params.chordError + 1e-12);
      }
    });
  });

  it('is deterministic for a seed and changes with it', () => {
    const shape = shapes[1]!;
    expect(packPebbles(shape, params)).toEqual(packPebbles(shape, params));
    expect(packPebbles(shape, { ...params, seed: 8 })).not.toEqual(packPebbles(shape, params));
  });
});
