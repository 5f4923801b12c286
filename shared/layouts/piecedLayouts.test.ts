import { execFileSync } from 'node:child_process';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { COMMON_BLOCK_SIZES } from './blockSizes.ts';
import { signedArea } from './patch.ts';
import { buildPiecedLayout, PIECED_LAYOUTS, type PiecedLayout } from './piecedLayouts.ts';

const ids = PIECED_LAYOUTS.map((l) => l.id);
const sizes: readonly (readonly [number, number])[] = [[12, 12], [8.5, 11], [30, 30]];

describe('pieced layouts: tiling and seams (analytic)', () => {
  it.each(ids)('%s: patch areas sum to width × height, seams lie inside and off the outline', (id) => {
    for (const [w, h] of sizes) {
      const layout = buildPiecedLayout(id, w, h);
      const areas = layout.patches.map((p) => signedArea(p.polygon));
      // Shoelace formula (Gauss's area formula) gives each patch's area; a tiling sums to the block's.
      expect(areas.every((a) => a > 0)).toBe(true);
      expect(areas.reduce((s, a) => s + a, 0)).toBeCloseTo(w * h, 9);
      for (const seam of layout.seams) {
        expect(seam.every(([x, y]) => x >= 0 && x <= w && y >= 0 && y <= h)).toBe(true);
        const [a, b] = [seam[0]!, seam[seam.length - 1]!];
        const onSameSide = (a[0] === b[0] && (a[0] === 0 || a[0] === w)) || (a[1] === b[1] && (a[1] === 0 || a[1] === h));
        expect(onSameSide).toBe(false);
      }
    }
  });

  it('gives the patch areas of the textbook constructions', () => {
    const [w, h] = [12, 9];
    const area = (l: PiecedLayout, name: string) => signedArea(l.patches.find((p) => p.name === name)!.polygon);
    // Half-square triangle: a diagonal halves a rectangle (elementary geometry).
    expect(area(buildPiecedLayout('half-square-triangle', w, h), 'top-left triangle')).toBeCloseTo(w * h / 2, 12);
    // Quarter-square triangle: the diagonals quarter it.
    expect(area(buildPiecedLayout('quarter-square-triangle', w, h), 'left triangle')).toBeCloseTo(w * h / 4, 12);
    // Square in a square: the midpoint rhombus has half the area (Varignon's theorem).
    expect(area(buildPiecedLayout('square-in-a-square', w, h), 'centre square')).toBeCloseTo(w * h / 2, 12);
    expect(area(buildPiecedLayout('nine-patch', w, h), 'middle-centre square')).toBeCloseTo(w * h / 9, 12);
    expect(area(buildPiecedLayout('log-cabin', w, h, { rounds: 2 }), 'centre square')).toBeCloseTo(w * h / 25, 12);
    expect(area(buildPiecedLayout('sawtooth-star', w, h), 'centre square')).toBeCloseTo(w * h / 4, 12);
    expect(area(buildPiecedLayout('sawtooth-star', w, h), 'top star point')).toBeCloseTo(w * h / 16, 12);
  });

  it('has the seam and patch counts a quilter would count', () => {
    const count = (id: (typeof ids)[number], o = {}) => {
      const l = buildPiecedLayout(id, 12, 12, o);
      return [l.seams.length, l.patches.length];
    };
    expect(count('blank')).toEqual([0, 1]);
    expect(count('half-square-triangle')).toEqual([1, 2]);
    expect(count('quarter-square-triangle')).toEqual([2, 4]);
    expect(count('four-patch')).toEqual([2, 4]);
    expect(count('nine-patch')).toEqual([4, 9]);
    expect(count('pinwheel')).toEqual([4, 8]);
    expect(count('square-in-a-square')).toEqual([4, 5]);
    expect(count('flying-geese', { geese: 3 })).toEqual([2 + 3 * 2, 9]);
    expect(count('ohio-star')[1]).toBe(21);
    expect(count('sawtooth-star')[1]).toBe(17);
    expect(count('log-cabin', { rounds: 3 })).toEqual([4 * 3 * 1, 13]);
  });

  it('names shapes from the geometry', () => {
    const nine = buildPiecedLayout('nine-patch', 9, 9);
    expect(new Set(nine.patches.map((p) => p.shape))).toEqual(new Set(['square']));
    const cabin = buildPiecedLayout('log-cabin', 14, 14, { rounds: 3 });
    expect(cabin.patches.find((p) => p.name === 'round 3 top log')!.shape).toBe('strip');
    expect(buildPiecedLayout('square-in-a-square', 12, 8).patches[0]!.shape).toBe('polygon');
    expect(buildPiecedLayout('square-in-a-square', 12, 12).patches[0]!.shape).toBe('square');
  });

  it('offers common block sizes in both units', () => {
    expect(COMMON_BLOCK_SIZES.in).toContain(12);
    expect(COMMON_BLOCK_SIZES.cm.every((s) => s > 0)).toBe(true);
  });
});

describe('pieced layouts against Shapely (independent reference library)', () => {
  it('patches union to the block without overlap, and seams are exactly the inner patch edges', () => {
    const layouts = ids.map((id) => buildPiecedLayout(id, 12, 10, { rounds: 4, geese: 5 }));
    const script = `
import json, sys
from shapely.geometry import Polygon, LineString, box
from shapely.ops import unary_union
out = []
for l in json.load(sys.stdin):
    polys = [Polygon(p) for p in l['patches']]
    block = box(0, 0, l['w'], l['h'])
    union = unary_union(polys)
    inner = unary_union([p.exterior for p in polys]).difference(block.exterior)
    seams = unary_union([LineString(s) for s in l['seams']]) if l['seams'] else LineString()
    out.append({
      'union_gap': union.symmetric_difference(block).area,
      'area_sum': sum(p.area for p in polys),
      'inner_len': inner.length, 'seam_len': sum(LineString(s).length for s in l['seams']),
      'seams_off_edges': seams.difference(inner.buffer(1e-9)).length,
      'edges_off_seams': inner.difference(seams.buffer(1e-9)).length,
    })
print(json.dumps(out))`;
    const input = JSON.stringify(layouts.map((l) => ({ w: l.width, h: l.height, patches: l.patches.map((p) => p.polygon), seams: l.seams })));
    const results = JSON.parse(execFileSync('/usr/bin/python3', ['-c', script], { input }).toString()) as Record<string, number>[];
    results.forEach((r, i) => {
      expect({ id: ids[i], gap: r['seam_len']! - r['inner_len']! }).toEqual({ id: ids[i], gap: expect.closeTo(0, 9) });
      expect(r['union_gap']).toBeLessThan(1e-9);
      expect(r['area_sum']).toBeCloseTo(120, 9);
      // Seams neither overlap each other (summed length = length of their union of inner edges) nor miss an edge.
      expect(r['seam_len']).toBeCloseTo(r['inner_len']!, 9);
      expect(r['seams_off_edges']).toBeLessThan(1e-9);
      expect(r['edges_off_seams']).toBeLessThan(1e-9);
    });
  });
});

describe('pieced layouts scale exactly', () => {
  it('layout at size k·s equals k × layout at s (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...ids),
        fc.double({ min: 1, max: 60, noNaN: true }),
        fc.double({ min: 1, max: 60, noNaN: true }),
        fc.double({ min: 0.1, max: 2, noNaN: true }),
        (id, w, h, k) => {
          const small = buildPiecedLayout(id, w, h);
          const large = buildPiecedLayout(id, k * w, k * h);
          const close = (a: readonly (readonly [number, number])[], b: readonly (readonly [number, number])[]) =>
            a.length === b.length && a.every(([x, y], i) => Math.abs(k * x - b[i]![0]) <= 1e-12 * k * w && Math.abs(k * y - b[i]![1]) <= 1e-12 * k * h);
          expect(large.seams.length).toBe(small.seams.length);
          small.seams.forEach((s, i) => expect(close(s, large.seams[i]!)).toBe(true));
          small.patches.forEach((p, i) => expect(close(p.polygon, large.patches[i]!.polygon)).toBe(true));
        },
      ),
      { seed: 4, numRuns: 200 },
    );
  });

  it('refuses a non-positive size', () => {
    expect(() => buildPiecedLayout('nine-patch', 0, 12)).toThrow(/layouts\/piecedLayouts/);
  });
});
