import { execFileSync } from 'node:child_process';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { designSchema, type Design } from '../design/design.schema.ts';
import type { Polyline } from '../geometry/point.ts';
import { buildPiecedLayout, PIECED_LAYOUTS } from '../layouts/piecedLayouts.ts';
import { findPatchFaces } from './patchFaces.ts';
import { namePatches } from './patchNames.ts';

const blockWith = (width: number, height: number, seams: readonly Polyline[]): Design =>
  designSchema.parse({ version: 1, units: 'in', width, height, seams, lines: [] });

describe('findPatchFaces on the pieced layouts', () => {
  it.each(PIECED_LAYOUTS.map((l) => l.id))('%s: one face per patch, with the same areas and centroids', (id) => {
    // The layouts' patches are checked against Shapely in layouts/piecedLayouts.test.ts; the faces found from
    // the seams alone must give the same tiling back.
    const layout = buildPiecedLayout(id, 12, 9);
    const faces = findPatchFaces(blockWith(12, 9, layout.seams));
    expect(faces).toHaveLength(layout.patches.length);
    const key = (a: number, c: readonly [number, number]) => `${a.toFixed(6)}@${c[0].toFixed(6)},${c[1].toFixed(6)}`;
    const mine = faces.map((f) => key(f.area, f.centroid)).sort();
    const theirs = layout.patches
      .map((p) => {
        let a2 = 0;
        let cx = 0;
        let cy = 0;
        p.polygon.forEach(([x0, y0], i) => {
          const [x1, y1] = p.polygon[(i + 1) % p.polygon.length]!;
          const cr = x0 * y1 - x1 * y0;
          a2 += cr;
          cx += (x0 + x1) * cr;
          cy += (y0 + y1) * cr;
        });
        return key(a2 / 2, [cx / (3 * a2), cy / (3 * a2)]);
      })
      .sort();
    expect(mine).toEqual(theirs);
  });

  it('names the patches a quilter would name', () => {
    const names = (id: (typeof PIECED_LAYOUTS)[number]['id']) => {
      const d = blockWith(12, 12, buildPiecedLayout(id, 12, 12).seams);
      return namePatches(findPatchFaces(d), d).map((p) => p.name).sort();
    };
    expect(names('nine-patch')).toEqual([
      'bottom square', 'bottom-left square', 'bottom-right square', 'centre square', 'left square',
      'right square', 'top square', 'top-left square', 'top-right square',
    ]);
    expect(names('half-square-triangle')).toEqual(['bottom-right triangle', 'top-left triangle']);
    expect(names('quarter-square-triangle')).toEqual(['bottom triangle', 'left triangle', 'right triangle', 'top triangle']);
    expect(names('square-in-a-square')).toEqual(['bottom-left triangle', 'bottom-right triangle', 'centre square', 'top-left triangle', 'top-right triangle']);
    expect(names('blank')).toEqual(['block']);
    expect(names('log-cabin')).toContain('centre square');
    for (const { id } of PIECED_LAYOUTS) {
      const list = names(id);
      expect(new Set(list).size).toBe(list.length);
    }
  });
});

describe('findPatchFaces against Shapely polygonize', () => {
  it('finds the same faces as shapely.ops.polygonize on 60 random seam sets', () => {
    // Independent reference: Shapely (GEOS) nodes the lines with unary_union and builds the faces with
    // polygonize. Same count and same sorted areas expected.
    const side = fc.constantFrom(0, 1, 2, 3);
    const onSide = (s: number, t: number, w: number, h: number): [number, number] =>
      s === 0 ? [t * w, 0] : s === 1 ? [w, t * h] : s === 2 ? [t * w, h] : [0, t * h];
    const t = fc.integer({ min: 1, max: 15 }).map((k) => k / 16);
    const seam = fc.tuple(side, t, side, t).filter(([s1, , s2]) => s1 !== s2);
    const cases = fc.sample(fc.array(seam, { minLength: 1, maxLength: 6 }), { numRuns: 60, seed: 20261202 });
    const designs = cases.map((seams) => seams.map(([s1, t1, s2, t2]) => [onSide(s1, t1, 12, 10), onSide(s2, t2, 12, 10)] as Polyline));
    const script = [
      'import json, sys',
      'from shapely.geometry import LineString, box',
      'from shapely.ops import unary_union, polygonize',
      'out = []',
      'for seams in json.load(sys.stdin):',
      '    lines = [LineString(s) for s in seams] + [box(0, 0, 12, 10).exterior]',
      '    out.append(sorted(p.area for p in polygonize(unary_union(lines))))',
      'print(json.dumps(out))',
    ].join('\n');
    const expected = JSON.parse(execFileSync('/usr/bin/python3', ['-c', script], { input: JSON.stringify(designs) }).toString()) as number[][];
    designs.forEach((seams, i) => {
      const areas = findPatchFaces(blockWith(12, 10, seams)).map((f) => f.area).sort((a, b) => a - b);
      expect(areas.length).toBe(expected[i]!.length);
      areas.forEach((a, k) => expect(a).toBeCloseTo(expected[i]![k]!, 6));
    });
  });
});
