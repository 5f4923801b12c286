import { describe, expect, it } from 'vitest';
import { arrowMarks, buildPlayback, needleAt, passStarts, stepFrom, type RouteStroke } from './routePlayback.ts';

// A 3-4-5 right triangle walk (Pythagoras: hypotenuse 5) then a second pass along a unit segment.
const strokes: RouteStroke[] = [
  { pass: 1, kind: 'stitch', points: [[0, 0], [3, 0], [3, 4]] },
  { pass: 1, kind: 'retrace', points: [[3, 4], [0, 0]] },
  { pass: 2, kind: 'stitch', points: [[10, 10], [11, 10]] },
];

describe('route playback', () => {
  it('lays strokes end to end: 3 + 4 + 5 + 1 = 13', () => {
    const p = buildPlayback(strokes);
    expect(p.starts).toEqual([0, 7, 12]);
    expect(p.total).toBe(13);
  });

  it('places the needle by distance, with its heading', () => {
    const p = buildPlayback(strokes);
    expect(needleAt(p, 1.5)!.point).toEqual([1.5, 0]);
    const up = needleAt(p, 5)!;
    expect(up.point).toEqual([3, 2]);
    expect(up.angle).toBeCloseTo(Math.PI / 2, 12);
    // halfway down the hypotenuse from (3,4) to (0,0): 2.5 of 5 → (1.5, 2)
    const back = needleAt(p, 9.5)!;
    expect(back.kind).toBe('retrace');
    expect(back.point[0]).toBeCloseTo(1.5, 12);
    expect(back.point[1]).toBeCloseTo(2, 12);
    expect(needleAt(p, 99)!.point).toEqual([11, 10]);
    expect(needleAt(p, -1)!.point).toEqual([0, 0]);
    expect(needleAt(buildPlayback([]), 0)).toBeNull();
  });

  it('steps between stroke boundaries', () => {
    const p = buildPlayback(strokes);
    expect(stepFrom(p, 0, 1)).toBe(7);
    expect(stepFrom(p, 7, 1)).toBe(12);
    expect(stepFrom(p, 12, 1)).toBe(13);
    expect(stepFrom(p, 13, 1)).toBe(13);
    expect(stepFrom(p, 12.5, -1)).toBe(12);
    expect(stepFrom(p, 7, -1)).toBe(0);
  });

  it('puts arrows evenly along a stroke and labels pass starts', () => {
    const arrows = arrowMarks([[0, 0], [4, 0]], 1);
    expect(arrows.map((a) => a.point[0])).toEqual([0.5, 1.5, 2.5, 3.5]);
    expect(arrowMarks([[0, 0], [0.2, 0]], 1)).toHaveLength(1);
    expect(passStarts(strokes)).toEqual([{ pass: 1, point: [0, 0] }, { pass: 2, point: [10, 10] }]);
  });
});
