import { describe, expect, it } from 'vitest';
import { fitViewport, pinchViewport, toScreen, toWorld, trueScale, zoomAt, zoomOf, ZOOM_LIMITS } from './viewport.ts';

describe('viewport', () => {
  it('true size is 96 CSS px per inch and 96/2.54 per cm', () => {
    // CSS Values and Units Level 3 §5.2: 1in = 2.54cm = 96px.
    expect(trueScale('in')).toBe(96);
    expect(trueScale('cm')).toBeCloseTo(96 / 2.54, 12);
  });

  it('fit shows the whole block centred with the margin on the tighter side', () => {
    const v = fitViewport(12, 12, 800, 600, 20);
    expect(v.scale).toBeCloseTo(560 / 12, 12);
    const [x0, y0] = toScreen(v, [0, 0]);
    const [x1, y1] = toScreen(v, [12, 12]);
    expect(y0).toBeCloseTo(20, 9);
    expect(600 - y1).toBeCloseTo(20, 9);
    expect(x0).toBeCloseTo(800 - x1, 9);
  });

  it('zooming keeps the point under the pointer fixed, and round-trips screen ↔ world', () => {
    const v = fitViewport(12, 12, 800, 600);
    const anchor = [313, 207] as const;
    const before = toWorld(v, anchor);
    const z = zoomAt(v, 2, anchor, 'in');
    const after = toWorld(z, anchor);
    expect(after[0]).toBeCloseTo(before[0], 9);
    expect(after[1]).toBeCloseTo(before[1], 9);
    expect(z.scale).toBeCloseTo(v.scale * 2, 9);
    const p = [3.125, 7.5] as const;
    const back = toWorld(z, toScreen(z, p));
    expect(back[0]).toBeCloseTo(3.125, 12);
    expect(back[1]).toBeCloseTo(7.5, 12);
  });

  it('clamps zoom to the limits of true size', () => {
    const v = { scale: 96, x: 0, y: 0 };
    expect(zoomOf(zoomAt(v, 1e6, [0, 0], 'in'), 'in')).toBeCloseTo(ZOOM_LIMITS.max, 12);
    expect(zoomOf(zoomAt(v, 1e-6, [0, 0], 'in'), 'in')).toBeCloseTo(ZOOM_LIMITS.min, 12);
  });

  it('a pinch that spreads the fingers to twice the distance doubles the zoom about their midpoint', () => {
    const v = { scale: 96, x: 10, y: 10 };
    const z = pinchViewport(v, [[100, 100], [200, 100]], [[50, 100], [250, 100]], 'in');
    expect(z.scale).toBeCloseTo(192, 9);
    const mid = toWorld(v, [150, 100]);
    const midAfter = toWorld(z, [150, 100]);
    expect(midAfter[0]).toBeCloseTo(mid[0], 9);
    expect(midAfter[1]).toBeCloseTo(mid[1], 9);
  });
});
