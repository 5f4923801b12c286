import { execFileSync } from 'node:child_process';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import type { Point } from '@shared/geometry/point.ts';
import { buildPiecedLayout, PIECED_LAYOUTS } from '@shared/layouts/piecedLayouts.ts';
import { buildEchoRings } from '@shared/motifs/echo.ts';
import { seededRandom } from '@shared/seededRandom.ts';

/**
 * Reference check against an independent implementation: Shapely 1.8.5's negative buffer with mitred joins
 * (Debian python3-shapely, tests/reference/echoInset.shapely.py). Our echoes must be exactly k × spacing
 * inside the edge lines: the same rings as buffer(−k·s) at every k, and as many levels. Convex patches use our
 * own half-plane inset (exact to rounding); non-convex ones Clipper2 (npm clipper2-ts, 1e-8 units).
 */
const ORACLE = path.join(import.meta.dirname, 'echoInset.shapely.py');

/** A seeded orthogonal polygon: a rectangle with rectangular notches cut from its top and bottom sides (non-convex). */
function notched(seed: number): Point[] {
  const rnd = seededRandom(seed);
  const w = 6 + rnd() * 6;
  const h = 4 + rnd() * 4;
  const depth = () => 0.5 + rnd() * (h / 2 - 1);
  const a = 1 + rnd() * (w / 2 - 2);
  const b = a + 0.5 + rnd() * 1.5;
  const c = w / 2 + rnd() * (w / 2 - 2);
  const e = c + 0.5 + rnd() * 1;
  const [d1, d2] = [depth(), depth()];
  return [[0, 0], [a, 0], [a, d1], [b, d1], [b, 0], [w, 0], [w, h], [e, h], [e, h - d2], [c, h - d2], [c, h], [0, h]];
}

describe('reference: echo rings against Shapely negative buffers (mitre joins)', () => {
  it('agrees on every pieced layout patch (12 in) and 30 seeded notched patches', () => {
    const cases: { polygon: readonly Point[]; spacing: number; levels: (readonly Point[])[][] }[] = [];
    for (const { id } of PIECED_LAYOUTS) {
      for (const patch of buildPiecedLayout(id, 12, 12).patches) cases.push({ polygon: patch.polygon, spacing: 0.375, levels: [] });
    }
    for (let i = 0; i < 30; i++) cases.push({ polygon: notched(900 + i), spacing: 0.3 + (i % 5) * 0.1, levels: [] });
    for (const c of cases) {
      const rings = buildEchoRings(c.polygon, c.spacing, 100, false);
      const depth = Math.max(0, ...rings.map((r) => r.depth));
      c.levels = Array.from({ length: depth }, (_, k) => rings.filter((r) => r.depth === k + 1).map((r) => r.points));
    }
    const out = JSON.parse(execFileSync('/usr/bin/python3', [ORACLE], { input: JSON.stringify(cases), maxBuffer: 1 << 26 }).toString()) as { levels: number; worst: number }[];
    out.forEach((r, i) => {
      expect({ i, levels: cases[i]!.levels.length }).toEqual({ i, levels: r.levels });
      expect(r.worst).toBeLessThan(1e-6);
    });
  }, 120_000);
});
