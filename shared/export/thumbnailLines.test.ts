import { describe, expect, it } from 'vitest';
import type { Point, Polyline } from '../geometry/point.ts';
import { pointSegmentDistance } from '../geometry/distance.ts';
import { designSchema } from '../design/design.schema.ts';
import { seededRandom as mulberry32 } from '../seededRandom.ts';
import { buildDesignThumbnailSvg } from './designSvg.ts';
import { THUMBNAIL_POINT_BUDGET, thumbnailLines } from './thumbnailLines.ts';

const count = (lines: readonly Polyline[]) => lines.reduce((n, l) => n + l.length, 0);

/** Freehand-like random walks (seeded), `lines` × `points` on a 12 in block. */
function walks(lines: number, points: number, seed = 1): Point[][] {
  const rand = mulberry32(seed);
  return Array.from({ length: lines }, () => {
    let p: Point = [0.5 + rand() * 11, 0.5 + rand() * 11];
    return Array.from({ length: points }, () => (p = [Math.min(11.9, Math.max(0.1, p[0] + (rand() - 0.5) * 0.4)), Math.min(11.9, Math.max(0.1, p[1] + (rand() - 0.5) * 0.4))]));
  });
}

describe('thumbnailLines', () => {
  it('leaves a light design as drawn (within half a pixel) and keeps every line end', () => {
    const wave: Point[] = Array.from({ length: 200 }, (_, i) => [i * 0.06, 6 + Math.sin(i / 15)]);
    const t = thumbnailLines([wave, [[0, 1], [12, 1]]], 12, 96);
    expect(t.shadedCells).toEqual([]);
    expect(t.lines[0]![0]).toEqual(wave[0]);
    expect(t.lines[0]!.at(-1)).toEqual(wave.at(-1));
    expect(t.lines[1]).toEqual([[0, 1], [12, 1]]);
    // Ramer–Douglas–Peucker guarantee: every dropped point lies within the tolerance (half a pixel = 1/16 in here)
    // of the kept polyline.
    const kept = t.lines[0]!;
    for (const p of wave) {
      const d = Math.min(...kept.slice(1).map((q, k) => pointSegmentDistance(p, kept[k]!, q)));
      expect(d).toBeLessThanOrEqual(12 / 96 / 2 + 1e-12);
    }
  });

  it('holds a design at the 200,000-point cap to the budget, shading what it leaves out', () => {
    const lines = walks(2_000, 100);
    expect(count(lines)).toBe(200_000);
    const t = thumbnailLines(lines, 12, 96);
    expect(count(t.lines)).toBeLessThanOrEqual(THUMBNAIL_POINT_BUDGET);
    expect(t.lines.every((l) => l.length >= 2)).toBe(true);
    expect(t.shadedCells.length).toBeGreaterThan(100); // the walks cover most of the 24 × 24 cells
    expect(t.shadedCells.every(([c, r]) => c >= 0 && r >= 0 && c < 24 && r < 24)).toBe(true);
  });

  it('keeps the longest lines when thousands of short ones cannot all fit', () => {
    const shorts: Point[][] = Array.from({ length: 3_000 }, (_, i) => [[(i % 60) * 0.2, Math.floor(i / 60) * 0.2], [(i % 60) * 0.2 + 0.1, Math.floor(i / 60) * 0.2]]);
    const long: Point[] = [[0, 11.5], [12, 11.5]];
    const t = thumbnailLines([...shorts, long], 12, 96);
    expect(t.lines).toContainEqual(long);
    expect(count(t.lines)).toBeLessThanOrEqual(THUMBNAIL_POINT_BUDGET);
  });
});

describe('buildDesignThumbnailSvg at the cap', () => {
  it('is a few kilobytes for a 200,000-point design (it was 2.6 MB before the budget)', () => {
    const design = designSchema.parse({ version: 1, units: 'in', width: 12, height: 12, seams: [], lines: walks(2_000, 100) });
    const svg = buildDesignThumbnailSvg(design);
    expect(svg.length).toBeLessThan(16 * 1024);
    expect(svg).toContain('class="dense"');
  });
});
