import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import type { Design } from '@shared/design/design.schema.ts';
import type { Point, Polyline } from '@shared/geometry/point.ts';
import { buildPlanarGraph } from '@shared/graph/planarGraph.ts';
import type { PlanarGraph } from '@shared/graph/planarGraph.types.ts';
import { blockOutline } from '@shared/graph/prepareGraph.ts';
import { mulberry32 } from '../../bench/generators.ts';

/**
 * Reference check against an independent library: shapely 1.8.5 (GEOS 3.11) `unary_union` noding and
 * networkx 2.8.8 components, both from Debian, run once over all designs (tests/reference/planarGraph.shapely.py).
 * Comparable quantities (independent of where each side puts degree-2 vertices):
 * - total length of the dissolved arrangement (overlaps counted once);
 * - number of straight segments (GEOS keeps input bends inside its pieces, as our edges do);
 * - number of odd-degree nodes and of nodes with degree ≥ 3 over all lines;
 * - connected components;
 * - kind priority: our quilting length = length of the union of the quilting lines alone, and
 *   quilting + seam length = length of the union of quilting lines and seams.
 */
interface Figures {
  length: number;
  segments: number;
  odd: number;
  junctions: number;
  components: number;
  quiltingLength: number;
  quiltingSeamLength: number;
}

function randomDesign(seed: number): Design {
  const rnd = mulberry32(seed);
  const onGrid = seed % 2 === 0; // quarter-inch grid: forces overlaps, T-junctions and touching ends
  const coord = (): number => (onGrid ? Math.round(rnd() * 48) / 4 : rnd() * 12);
  const line = (): Polyline => {
    const n = 2 + Math.floor(rnd() * 3);
    const pts: Point[] = [];
    while (pts.length < n) {
      const p: Point = rnd() < 0.15 && pts.length > 0 ? [pts[0]![0], coord()] : [coord(), coord()];
      const last = pts[pts.length - 1];
      if (last === undefined || last[0] !== p[0] || last[1] !== p[1]) pts.push(p);
    }
    return pts;
  };
  const edgeLine = (): Polyline => {
    // a line from one block side to another, so lines meet the outline
    const side = (k: number): Point => [[coord(), 0], [12, coord()], [coord(), 12], [0, coord()]][k % 4] as unknown as Point;
    const k = Math.floor(rnd() * 4);
    return [side(k), side(k + 1 + Math.floor(rnd() * 3))];
  };
  const lines = Array.from({ length: 2 + Math.floor(rnd() * 6) }, () => (rnd() < 0.3 ? edgeLine() : line()));
  const seams = Array.from({ length: Math.floor(rnd() * 4) }, () => (rnd() < 0.5 ? edgeLine() : line()));
  if (onGrid && lines.length > 0 && rnd() < 0.5) seams.push(lines[0]!.slice(0, 2)); // a seam under a quilting line
  return { version: 1, units: 'in', width: 12, height: 12, seams, lines, edgeTravel: rnd() < 0.6 };
}

function ourFigures(g: PlanarGraph): Figures {
  const degree = new Map<number, number>();
  const parent = g.vertices.map((_, i) => i);
  const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i]!)));
  let segments = 0;
  const sum = (kinds: string[]): number => g.edges.filter((e) => kinds.includes(e.kind)).reduce((s, e) => s + e.length, 0);
  for (const e of g.edges) {
    segments += e.points.length - 1;
    degree.set(e.u, (degree.get(e.u) ?? 0) + 1);
    degree.set(e.v, (degree.get(e.v) ?? 0) + 1);
    parent[find(e.u)] = find(e.v);
  }
  const used = [...degree.keys()];
  return {
    length: sum(['quilting', 'seam', 'edge']),
    segments,
    odd: used.filter((v) => degree.get(v)! % 2 === 1).length,
    junctions: used.filter((v) => degree.get(v)! >= 3).length,
    components: new Set(used.map(find)).size,
    quiltingLength: sum(['quilting']),
    quiltingSeamLength: sum(['quilting', 'seam']),
  };
}

describe('reference: planar graph against shapely unary_union', () => {
  it('matches shapely on 240 seeded random designs', () => {
    const designs = Array.from({ length: 240 }, (_, i) => randomDesign(1000 + i));
    const input = designs.map((d) => ({ quilting: d.lines, seams: d.seams, outline: d.edgeTravel ? blockOutline(d) : null }));
    const out = execFileSync('/usr/bin/python3', [new URL('./planarGraph.shapely.py', import.meta.url).pathname], {
      input: JSON.stringify(input),
      encoding: 'utf8',
      maxBuffer: 64 * 1024 * 1024,
    });
    const reference = JSON.parse(out) as Figures[];
    expect(reference).toHaveLength(designs.length);
    let segments = 0;
    designs.forEach((d, i) => {
      const built = buildPlanarGraph(d);
      if (!built.ok) throw new Error(`design ${i}: ${built.error.message}`);
      const ours = ourFigures(built.value);
      const ref = reference[i]!;
      const context = `design seed ${1000 + i}`;
      expect(ours.segments, context).toBe(ref.segments);
      expect(ours.odd, context).toBe(ref.odd);
      expect(ours.junctions, context).toBe(ref.junctions);
      expect(ours.components, context).toBe(ref.components);
      for (const key of ['length', 'quiltingLength', 'quiltingSeamLength'] as const) {
        expect(Math.abs(ours[key] - ref[key]), `${context} ${key}`).toBeLessThanOrEqual(1e-9 * Math.max(1, ref[key]));
      }
      segments += ref.segments;
    });
    expect(segments).toBeGreaterThan(240 * 5); // the designs are not trivial
  }, 180_000);
});
