import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { placeBlock, planTiles, rowLetter } from './blockPlacement.ts';

const area = { x: 36, y: 80, width: 540, height: 640 };
const tile = { width: 540, height: 680 };

describe('placeBlock', () => {
  it('puts a block that fits at scale 1, centred across the area', () => {
    // A 6 × 4 in block is 432 × 288 pt (72 pt to the inch).
    const p = placeBlock(432, 288, area, 'page', tile, 36);
    expect(p).toEqual({ kind: 'true-size', scale: 1, frame: { x: 36 + (540 - 432) / 2, y: 80, width: 432, height: 288 } });
  });
  it('scales a block that does not fit onto one page, or tiles it at true size when asked', () => {
    const big = 12 * 72;
    const scaled = placeBlock(big, big, area, 'page', tile, 36);
    expect(scaled.kind).toBe('scaled');
    if (scaled.kind === 'scaled') expect(scaled.scale).toBeCloseTo(540 / 864, 12);
    const tiled = placeBlock(big, big, area, 'tiles', tile, 36);
    expect(tiled.kind).toBe('tiled');
    if (tiled.kind === 'tiled') expect([tiled.tiling.rows, tiled.tiling.columns]).toEqual([2, 2]);
  });
});

describe('planTiles', () => {
  it('labels rows with letters and columns with numbers', () => {
    expect(['A', 'B', 'Z', 'AA', 'AB'].map((_, i) => rowLetter([0, 1, 25, 26, 27][i]!))).toEqual(['A', 'B', 'Z', 'AA', 'AB']);
    const t = planTiles(1000, 700, tile, 36);
    expect(t.tiles.map((x) => x.label)).toEqual(['A1', 'A2', 'B1', 'B2']);
    expect(t.tiles[0]!.neighbours).toEqual({ right: 'A2', bottom: 'B1' });
  });

  it('covers the drawing with the fewest tiles, neighbours sharing exactly the overlap, every cross on both neighbours', () => {
    fc.assert(
      fc.property(fc.double({ min: 10, max: 5000, noNaN: true }), fc.double({ min: 10, max: 5000, noNaN: true }), fc.double({ min: 0, max: 60, noNaN: true }), (w, h, overlap) => {
        const t = planTiles(w, h, tile, overlap);
        const last = t.tiles[t.tiles.length - 1]!;
        // Covered: the last tile reaches the drawing's far corner.
        expect(last.source.x + last.source.width).toBeGreaterThanOrEqual(w - 1e-6);
        expect(last.source.y + last.source.height).toBeGreaterThanOrEqual(h - 1e-6);
        // Fewest: one column fewer would not reach across.
        if (t.columns > 1) expect((t.columns - 2) * (tile.width - overlap) + tile.width).toBeLessThan(w);
        if (t.rows > 1) expect((t.rows - 2) * (tile.height - overlap) + tile.height).toBeLessThan(h);
        for (const a of t.tiles) {
          const right = t.tiles.find((b) => b.row === a.row && b.column === a.column + 1);
          if (right) expect(a.source.x + a.source.width - right.source.x).toBeCloseTo(overlap, 9);
          for (const m of a.marks) {
            const holders = t.tiles.filter((b) => b.marks.some((n) => n[0] === m[0] && n[1] === m[1]));
            expect(holders.length).toBeGreaterThanOrEqual(2);
          }
        }
      }),
      { numRuns: 200 },
    );
  });
});
