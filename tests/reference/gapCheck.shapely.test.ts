import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import type { Design } from '@shared/design/design.schema.ts';
import type { Point, Polyline } from '@shared/geometry/point.ts';
import { findWidestGap } from '@shared/gap/gapCheck.ts';
import { mulberry32 } from '../../bench/generators.ts';

/**
 * Reference check against an independent implementation: shapely 1.8.5's `polylabel` (Debian
 * python3-shapely) run on every face of the arrangement (tests/reference/gapCheck.shapely.py). Designs use
 * chords and closed rings only, so every line bounds faces and polylabel (which takes polygons) applies.
 * Both answers are certified lower bounds of the true radius (ours within 1e-3, polylabel within 1e-3),
 * so they must agree within 1e-3; shapely also measures the clearance around our centre.
 */
function randomDesign(seed: number): Design {
  const rnd = mulberry32(seed);
  const w = 6 + Math.round(rnd() * 12);
  const h = 6 + Math.round(rnd() * 12);
  const onSide = (k: number): Point => [[rnd() * w, 0], [w, rnd() * h], [rnd() * w, h], [0, rnd() * h]][k % 4] as unknown as Point;
  const lines: Polyline[] = [];
  const chords = Math.floor(rnd() * 5);
  for (let i = 0; i < chords; i++) {
    const k = Math.floor(rnd() * 4);
    lines.push([onSide(k), onSide(k + 1 + Math.floor(rnd() * 3))]);
  }
  const rings = Math.floor(rnd() * 3);
  for (let i = 0; i < rings; i++) {
    const cx = w * (0.2 + 0.6 * rnd());
    const cy = h * (0.2 + 0.6 * rnd());
    const r = 0.3 + rnd() * Math.min(w, h) * 0.15;
    const ring: Point[] = [0, 1, 2].map((j) => [cx + r * Math.cos(j * 2.1 + rnd()), cy + r * Math.sin(j * 2.1 + rnd())]);
    lines.push([...ring, ring[0]!]);
  }
  if (lines.length === 0) lines.push([onSide(0), onSide(2)]);
  return { version: 1, units: 'in', width: w, height: h, seams: [], lines, edgeTravel: true };
}

describe('reference: gap check against shapely polylabel', () => {
  it('agrees on 60 seeded random designs', () => {
    const designs = Array.from({ length: 60 }, (_, i) => randomDesign(500 + i));
    const ours = designs.map((d) => {
      const r = findWidestGap(d, { precision: 1e-3 });
      if (!r.ok) throw new Error(r.error.message);
      return r.value;
    });
    const input = designs.map((d, i) => ({ width: d.width, height: d.height, lines: d.lines, center: ours[i]!.center }));
    const out = execFileSync('/usr/bin/python3', [new URL('./gapCheck.shapely.py', import.meta.url).pathname], { input: JSON.stringify(input), encoding: 'utf8' });
    const reference = JSON.parse(out) as { radius: number; centerClearance: number }[];
    designs.forEach((_, i) => {
      const context = `design seed ${500 + i}`;
      expect(ours[i]!.precision, context).toBeLessThanOrEqual(1e-3);
      expect(Math.abs(ours[i]!.radius - reference[i]!.radius), context).toBeLessThanOrEqual(1e-3 + 1e-9);
      // Our disc is empty: its centre is at least `radius` from every line and the border.
      expect(reference[i]!.centerClearance, context).toBeGreaterThanOrEqual(ours[i]!.radius - 1e-9);
    });
  }, 180_000);
});
