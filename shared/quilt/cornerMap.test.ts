import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Point } from '../geometry/point.ts';
import { CORNERS, designCorner, placeCornerCosts, placedCorner, placedSize, placePoint, type Corner } from './cornerMap.ts';
import type { Orientation, Rotation } from './quilt.schema.ts';

const orientationArb = fc.record({ rotation: fc.constantFrom<Rotation>(0, 90, 180, 270), mirror: fc.boolean() });
const cornerArb = fc.constantFrom<Corner>(0, 1, 2, 3);
const cornerPoint = (c: Corner, w: number, h: number): Point => [[0, 0], [w, 0], [w, h], [0, h]][c] as unknown as Point;

describe('placePoint', () => {
  it('a quarter turn clockwise on the page takes the top edge to the right edge', () => {
    // A 4 × 2 block: the top-left corner goes to the top-right of the 2 × 4 block, the point (1, 0) on the top edge
    // to (2, 1) on its right edge; worked by hand from a paper square turned clockwise.
    expect(placePoint([0, 0], 4, 2, { rotation: 90, mirror: false })).toEqual([2, 0]);
    expect(placePoint([1, 0], 4, 2, { rotation: 90, mirror: false })).toEqual([2, 1]);
    expect(placePoint([1, 0], 4, 2, { rotation: 0, mirror: true })).toEqual([3, 0]);
  });

  it('keeps distances and lands inside the placed size (an isometry onto the placed block)', () => {
    const p = fc.tuple(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }));
    fc.assert(
      fc.property(orientationArb, fc.integer({ min: 1, max: 20 }), fc.integer({ min: 1, max: 20 }), p, p, (o, w, h, a, b) => {
        const pa = placePoint([a[0] * w, a[1] * h], w, h, o);
        const pb = placePoint([b[0] * w, b[1] * h], w, h, o);
        const size = placedSize(w, h, o);
        expect(Math.hypot(pa[0] - pb[0], pa[1] - pb[1])).toBeCloseTo(Math.hypot((a[0] - b[0]) * w, (a[1] - b[1]) * h), 9);
        for (const q of [pa, pb]) {
          expect(q[0]).toBeGreaterThanOrEqual(-1e-9);
          expect(q[0]).toBeLessThanOrEqual(size.width + 1e-9);
          expect(q[1]).toBeLessThanOrEqual(size.height + 1e-9);
        }
      }),
    );
  });
});

describe('placedCorner and designCorner', () => {
  it('the corner names follow the points: a design corner lands where placePoint takes its point', () => {
    fc.assert(
      fc.property(orientationArb, cornerArb, fc.integer({ min: 1, max: 9 }), fc.integer({ min: 1, max: 9 }), (o, c, w, h) => {
        const size = placedSize(w, h, o);
        expect(placePoint(cornerPoint(c, w, h), w, h, o)).toEqual(cornerPoint(placedCorner(c, o), size.width, size.height));
      }),
    );
  });

  it('designCorner undoes placedCorner; mirroring twice or four quarter turns change nothing', () => {
    fc.assert(
      fc.property(orientationArb, cornerArb, (o, c) => {
        expect(designCorner(placedCorner(c, o), o)).toBe(c);
        expect(placedCorner(designCorner(c, o), o)).toBe(c);
        const once = placedCorner(c, { rotation: 90, mirror: false });
        const four = [1, 2, 3].reduce<Corner>((k) => placedCorner(k, { rotation: 90, mirror: false }), once);
        expect(four).toBe(c);
        expect(placedCorner(placedCorner(c, { rotation: 0, mirror: true }), { rotation: 0, mirror: true })).toBe(c);
      }),
    );
  });

  it('names: a mirrored block turned a half turn puts its top-left at the bottom-left', () => {
    expect(CORNERS[placedCorner(0, { rotation: 180, mirror: true })]).toBe('bottom-left');
  });
});

describe('placeCornerCosts', () => {
  it('reads each placed pair from the design pair it came from, scaled', () => {
    const design = [0, 1, 2, 3].map((e) => [0, 1, 2, 3].map((x) => 10 * e + x));
    fc.assert(
      fc.property(orientationArb, cornerArb, cornerArb, (o: Orientation, e, x) => {
        const placed = placeCornerCosts(design, o, 2);
        expect(placed[placedCorner(e, o)]![placedCorner(x, o)]).toBe(2 * (10 * e + x));
      }),
    );
  });

  it('refuses a table that is not 4 × 4 finite lengths', () => {
    expect(() => placeCornerCosts([[1, 2, 3, 4]], { rotation: 0, mirror: false })).toThrow(/quilt\/cornerMap/);
    expect(() => placeCornerCosts(Array.from({ length: 4 }, () => [0, 0, 0, Number.NaN]), { rotation: 0, mirror: false })).toThrow();
  });
});
