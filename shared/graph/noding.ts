import Flatbush from 'flatbush';
import type { Polyline } from '../geometry/point.ts';
import { intersectSegments } from '../geometry/intersect.ts';
import { SnapGrid } from '../geometry/snapGrid.ts';
import { err, ok, type Result } from '../result.ts';

/** Lines noded against each other: shared vertices, and each line as its vertex chain. */
export interface NodedLines {
  /** Vertex x coordinates (design units); index = vertex id. */
  readonly xs: readonly number[];
  readonly ys: readonly number[];
  /**
   * Per input line, the vertex ids it passes in drawing order: its own points plus every crossing,
   * T-junction, touching point and overlap end on it. Consecutive repeats are removed, so a line that
   * collapsed under snapping has a chain of one vertex.
   */
  readonly chains: readonly (readonly number[])[];
  /** The snap grid holding the vertices (`xs`, `ys` are its arrays), so later strokes can snap to them. */
  readonly grid: SnapGrid;
}

export interface TooManyCrossings {
  readonly kind: 'too-many-crossings';
  readonly cap: number;
}

/**
 * Nodes polylines with tolerance `tolerance` (design units):
 * 1. every input point is snapped with a hash grid (points closer than the tolerance become one vertex;
 *    earlier points keep their position);
 * 2. candidate segment pairs come from a flatbush index over bounding boxes grown by the tolerance,
 *    so the work is O(n log n + candidates), not O(n²);
 * 3. each pair is cut where it meets (`intersectSegments`): an end lying on the other segment splits it
 *    at that end's own vertex (T-junctions, touching, collinear overlaps); a proper crossing gets a new
 *    snapped vertex on both.
 * A one-point line (a marker) is a zero-length segment: lines passing within tolerance are split there.
 * Stops with `too-many-crossings` once more than `maxContacts` contacts are found (bounds memory and time).
 * Known limit: snapping is single-pass, so two vertices just over the tolerance apart stay distinct.
 */
export function nodePolylines(lines: readonly Polyline[], tolerance: number, maxContacts: number): Result<NodedLines, TooManyCrossings> {
  const grid = new SnapGrid(tolerance);
  const ends: number[][] = lines.map((line) => dedupe(line.map(([x, y]) => grid.snap(x, y))));
  const { xs, ys } = grid;

  // Segments between snapped vertices; a one-vertex chain gives one zero-length segment.
  const segA: number[] = [];
  const segB: number[] = [];
  const segLine: number[] = [];
  ends.forEach((chain, line) => {
    if (chain.length === 1) push(chain[0]!, chain[0]!, line);
    for (let k = 1; k < chain.length; k++) push(chain[k - 1]!, chain[k]!, line);
  });
  function push(a: number, b: number, line: number): void {
    segA.push(a);
    segB.push(b);
    segLine.push(line);
  }
  const n = segA.length;
  const evSeg: number[] = [];
  const evT: number[] = [];
  const evVid: number[] = [];
  const addEvent = (seg: number, t: number, vid: number): void => {
    if (vid === segA[seg] || vid === segB[seg]) return;
    evSeg.push(seg);
    evT.push(t);
    evVid.push(vid);
  };

  if (n > 0) {
    const index = new Flatbush(n);
    for (let s = 0; s < n; s++) {
      const a = segA[s]!;
      const b = segB[s]!;
      index.add(Math.min(xs[a]!, xs[b]!) - tolerance, Math.min(ys[a]!, ys[b]!) - tolerance, Math.max(xs[a]!, xs[b]!) + tolerance, Math.max(ys[a]!, ys[b]!) + tolerance);
    }
    index.finish();
    let contacts = 0;
    for (let i = 0; i < n; i++) {
      const ai = segA[i]!;
      const bi = segB[i]!;
      const pa0 = [xs[ai]!, ys[ai]!] as const;
      const pa1 = [xs[bi]!, ys[bi]!] as const;
      const dx = pa1[0] - pa0[0];
      const dy = pa1[1] - pa0[1];
      const len = Math.hypot(dx, dy);
      const candidates = index.search(Math.min(pa0[0], pa1[0]), Math.min(pa0[1], pa1[1]), Math.max(pa0[0], pa1[0]), Math.max(pa0[1], pa1[1]));
      for (const j of candidates) {
        if (j <= i) continue;
        const aj = segA[j]!;
        const bj = segB[j]!;
        if (len > 0) {
          // Quick reject: segment j lies wholly on one side of i's supporting line, further than the
          // tolerance, so no point of i is within the tolerance of j (every point of i is on that line).
          const s0 = ((xs[aj]! - pa0[0]) * dy - (ys[aj]! - pa0[1]) * dx) / len;
          const s1 = ((xs[bj]! - pa0[0]) * dy - (ys[bj]! - pa0[1]) * dx) / len;
          if ((s0 > tolerance && s1 > tolerance) || (s0 < -tolerance && s1 < -tolerance)) continue;
        }
        const hit = intersectSegments(pa0, pa1, [xs[aj]!, ys[aj]!], [xs[bj]!, ys[bj]!], tolerance);
        for (const c of hit.contacts) {
          switch (c.end) {
            case 'a0': addEvent(j, c.u, ai); break;
            case 'a1': addEvent(j, c.u, bi); break;
            case 'b0': addEvent(i, c.t, aj); break;
            case 'b1': addEvent(i, c.t, bj); break;
            case null: {
              const vid = grid.snap(c.point[0], c.point[1]);
              addEvent(i, c.t, vid);
              addEvent(j, c.u, vid);
              break;
            }
          }
        }
        contacts += hit.contacts.length;
        if (contacts > maxContacts) return err({ kind: 'too-many-crossings', cap: maxContacts });
      }
    }
  }

  // Order each segment's events along it, then splice them into the line chains.
  const order = Array.from({ length: evSeg.length }, (_, k) => k);
  order.sort((p, q) => evSeg[p]! - evSeg[q]! || evT[p]! - evT[q]! || p - q);
  const firstEvent = new Int32Array(n + 1).fill(-1);
  for (let k = order.length - 1; k >= 0; k--) firstEvent[evSeg[order[k]!]!] = k;
  const chains: number[][] = lines.map(() => []);
  let cursor = 0;
  for (let s = 0; s < n; s++) {
    const chain = chains[segLine[s]!]!;
    append(chain, segA[s]!);
    if (firstEvent[s]! >= 0) {
      for (cursor = firstEvent[s]!; cursor < order.length && evSeg[order[cursor]!] === s; cursor++) append(chain, evVid[order[cursor]!]!);
    }
    append(chain, segB[s]!);
  }
  ends.forEach((chain, line) => {
    if (chains[line]!.length === 0 && chain.length > 0) chains[line]!.push(chain[0]!);
  });
  return ok({ xs, ys, chains, grid });
}

function append(chain: number[], vid: number): void {
  if (chain[chain.length - 1] !== vid) chain.push(vid);
}

function dedupe(vids: number[]): number[] {
  const out: number[] = [];
  for (const v of vids) append(out, v);
  return out;
}
