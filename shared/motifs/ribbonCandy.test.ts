import { describe, expect, it } from 'vitest';
import type { Point } from '../geometry/point.ts';
import { generateArches } from './arches.ts';
import { generateRibbonCandy } from './ribbonCandy.ts';

const base = { kind: 'ribbon-candy' as const, margin: 0, chordError: 0.005 };

describe('motifs/ribbonCandy', () => {
  it('fills a 12 × 4 strip with one line of 12 loops alternating about the centre line', () => {
    const strip: Point[] = [[0, 0], [12, 0], [12, 4], [0, 4]];
    const { lines } = generateRibbonCandy(strip, { ...base, pitch: 1, margin: 0.25 });
    expect(lines.length).toBe(1);
    const line = lines[0]!;
    expect(line[0]![0]).toBeCloseTo(0.25, 12);
    expect(line[line.length - 1]![0]).toBeCloseTo(11.75, 12);
    const offsets = line.map((p) => p[1] - 2);
    // Loops reach the margin line 0.25 inside the outline (half an ellipse peaks at its semi-axis).
    expect(Math.max(...offsets.map(Math.abs))).toBeLessThanOrEqual(1.75 + 1e-12);
    expect(Math.max(...offsets)).toBeGreaterThan(1.74);
    expect(Math.min(...offsets)).toBeLessThan(-1.74);
    const signs = offsets.filter((o) => Math.abs(o) > 1e-9).map(Math.sign);
    const changes = signs.slice(1).filter((s, i) => s !== signs[i]).length;
    expect(changes).toBe(11);
  });

  it('grows the loops from the point of a triangle to its base', () => {
    // Apex (6,0), base on y = 6: the axis runs down from the apex; local width at depth y is 2y.
    const triangle: Point[] = [[6, 0], [12, 6], [0, 6]];
    const { lines } = generateRibbonCandy(triangle, { ...base, pitch: 0.75 });
    expect(lines.length).toBe(1);
    const line = lines[0]!;
    const loops = 8;
    const heights = Array.from({ length: loops }, (_, k) =>
      Math.max(...line.filter((p) => p[1] >= k * 0.75 && p[1] <= (k + 1) * 0.75).map((p) => Math.abs(p[0] - 6))),
    );
    heights.slice(1).forEach((h, k) => expect(h).toBeGreaterThan(heights[k]!));
    line.forEach(([x, y]) => expect(Math.abs(x - 6)).toBeLessThanOrEqual(y + 1e-9));
  });
});

describe('motifs/arches', () => {
  it('draws one continuous row per base line, arch tops one row spacing up', () => {
    const rect: Point[] = [[0, 0], [6, 0], [6, 4], [0, 4]];
    const { lines } = generateArches(rect, { kind: 'arches', archWidth: 1, rowSpacing: 1, angle: 0, chordError: 0.005 });
    expect(lines.length).toBe(4);
    lines.forEach((row, r) => {
      const baseY = r + 1;
      expect(row[0]).toEqual([0, baseY]);
      expect(row[row.length - 1]![0]).toBeCloseTo(6, 12);
      // Six arches meet the base line at x = 0 … 6 (seven touch points).
      expect(row.filter((p) => Math.abs(p[1] - baseY) < 1e-12).length).toBe(7);
      expect(Math.min(...row.map((p) => p[1]))).toBeGreaterThanOrEqual(baseY - 1 - 1e-12);
      expect(Math.min(...row.map((p) => p[1]))).toBeLessThan(baseY - 1 + 0.01);
    });
  });
});
