import Flatbush from 'flatbush';
import type { Polyline } from '../geometry/point.ts';
import { CONTACT_STRIDE, createContactBuffer, END_A0, END_A1, END_B0, END_B1, intersectSegmentsInto } from '../geometry/intersect.ts';
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
 * 3. each pair is cut where it meets (`intersectSegmentsInto`): an end lying on the other segment splits it
 *    at that end's own vertex (T-junctions, touching, collinear overlaps); a proper crossing gets a new
 *    snapped vertex on both.
 * A one-point line (a marker) is a zero-length segment: lines passing within tolerance are split there.
 * Stops with `too-many-crossings` once more than `maxContacts` contacts are found (bounds memory and time).
 * Known limit: snapping is single-pass, so two vertices just over the tolerance apart stay distinct.
 */
export function nodePolylines(lines: readonly Polyline[], tolerance: number, maxContacts: number): Result<NodedLines, TooManyCrossings> {
  const grid = new SnapGrid(tolerance);
  let points = 0;
  for (const line of lines) points += line.length;
  // Segments between snapped vertices (at most one per input point); a one-vertex chain gives one zero-length segment.
  const segA = new Int32Array(points);
  const segB = new Int32Array(points);
  const segLine = new Int32Array(points);
  const ends: number[][] = [];
  let n = 0;
  for (let line = 0; line < lines.length; line++) {
    const chain: number[] = [];
    for (const [x, y] of lines[line]!) append(chain, grid.snap(x, y));
    ends.push(chain);
    if (chain.length === 1) {
      segA[n] = segB[n] = chain[0]!;
      segLine[n++] = line;
    }
    for (let k = 1; k < chain.length; k++) {
      segA[n] = chain[k - 1]!;
      segB[n] = chain[k]!;
      segLine[n++] = line;
    }
  }
  const { xs, ys } = grid;
  const events = new EventList();

  if (n > 0) {
    // Node size 8 (default 16): long thin boxes of dense fills prune better with smaller nodes (measured in bench/).
    const index = new Flatbush(n, 8);
    for (let s = 0; s < n; s++) {
      const a = segA[s]!;
      const b = segB[s]!;
      index.add(Math.min(xs[a]!, xs[b]!) - tolerance, Math.min(ys[a]!, ys[b]!) - tolerance, Math.max(xs[a]!, xs[b]!) + tolerance, Math.max(ys[a]!, ys[b]!) + tolerance);
    }
    index.finish();
    const buf = createContactBuffer();
    let contacts = 0;
    for (let i = 0; i < n; i++) {
      const ai = segA[i]!;
      const bi = segB[i]!;
      const x0 = xs[ai]!;
      const y0 = ys[ai]!;
      const x1 = xs[bi]!;
      const y1 = ys[bi]!;
      const dx = x1 - x0;
      const dy = y1 - y0;
      const len = Math.hypot(dx, dy);
      const candidates = index.search(Math.min(x0, x1), Math.min(y0, y1), Math.max(x0, x1), Math.max(y0, y1));
      for (let c = 0; c < candidates.length; c++) {
        const j = candidates[c]!;
        if (j <= i) continue;
        const aj = segA[j]!;
        const bj = segB[j]!;
        const xa = xs[aj]!;
        const ya = ys[aj]!;
        const xb = xs[bj]!;
        const yb = ys[bj]!;
        if (len > 0) {
          // Quick reject: segment j lies wholly on one side of i's supporting line, further than the
          // tolerance, so no point of i is within the tolerance of j (every point of i is on that line).
          const s0 = ((xa - x0) * dy - (ya - y0) * dx) / len;
          const s1 = ((xb - x0) * dy - (yb - y0) * dx) / len;
          if ((s0 > tolerance && s1 > tolerance) || (s0 < -tolerance && s1 < -tolerance)) continue;
        }
        const count = intersectSegmentsInto(x0, y0, x1, y1, xa, ya, xb, yb, tolerance, buf);
        for (let k = 0; k < count; k++) {
          const o = k * CONTACT_STRIDE;
          const t = buf[o + 1]!;
          const u = buf[o + 2]!;
          switch (buf[o]) {
            case END_A0: events.add(j, u, ai, segA, segB); break;
            case END_A1: events.add(j, u, bi, segA, segB); break;
            case END_B0: events.add(i, t, aj, segA, segB); break;
            case END_B1: events.add(i, t, bj, segA, segB); break;
            default: {
              const vid = grid.snap(buf[o + 3]!, buf[o + 4]!);
              events.add(i, t, vid, segA, segB);
              events.add(j, u, vid, segA, segB);
            }
          }
        }
        contacts += count;
        if (contacts > maxContacts) return err({ kind: 'too-many-crossings', cap: maxContacts });
      }
    }
  }

  // Order each segment's events along it (ties in the order found), then splice them into the line chains.
  const { first, vid } = events.sortBySegment(n);
  const chains: number[][] = lines.map(() => []);
  for (let s = 0; s < n; s++) {
    const chain = chains[segLine[s]!]!;
    append(chain, segA[s]!);
    for (let k = first[s]!; k < first[s + 1]!; k++) append(chain, vid[k]!);
    append(chain, segB[s]!);
  }
  ends.forEach((chain, line) => {
    if (chains[line]!.length === 0 && chain.length > 0) chains[line]!.push(chain[0]!);
  });
  return ok({ xs, ys, chains, grid });
}

/** Cut events (segment, parameter t along it, vertex id) in growable typed arrays. */
class EventList {
  seg: Int32Array<ArrayBuffer> = new Int32Array(1024);
  t = new Float64Array(1024);
  vid: Int32Array<ArrayBuffer> = new Int32Array(1024);
  size = 0;

  /** Adds a cut unless the vertex is one of the segment's own ends. */
  add(seg: number, t: number, vid: number, segA: Int32Array, segB: Int32Array): void {
    if (vid === segA[seg] || vid === segB[seg]) return;
    if (this.size === this.seg.length) {
      this.seg = grow(this.seg, this.size * 2);
      const tt = new Float64Array(this.size * 2);
      tt.set(this.t);
      this.t = tt;
      this.vid = grow(this.vid, this.size * 2);
    }
    this.seg[this.size] = seg;
    this.t[this.size] = t;
    this.vid[this.size++] = vid;
  }

  /**
   * Vertex ids of the events grouped by segment (counting sort), each group by t, ties in the order added
   * (insertion sort: groups are short). Group s is vid[first[s] .. first[s+1]).
   */
  sortBySegment(segments: number): { first: Int32Array; vid: Int32Array } {
    const first = new Int32Array(segments + 1);
    for (let e = 0; e < this.size; e++) first[this.seg[e]! + 1]!++;
    for (let s = 0; s < segments; s++) first[s + 1]! += first[s]!;
    const fill = first.slice(0, segments);
    const vid = new Int32Array(this.size);
    const t = new Float64Array(this.size);
    for (let e = 0; e < this.size; e++) {
      const at = fill[this.seg[e]!]!++;
      vid[at] = this.vid[e]!;
      t[at] = this.t[e]!;
    }
    for (let s = 0; s < segments; s++) {
      for (let k = first[s]! + 1; k < first[s + 1]!; k++) {
        const tk = t[k]!;
        const vk = vid[k]!;
        let m = k - 1;
        for (; m >= first[s]! && t[m]! > tk; m--) {
          t[m + 1] = t[m]!;
          vid[m + 1] = vid[m]!;
        }
        t[m + 1] = tk;
        vid[m + 1] = vk;
      }
    }
    return { first, vid };
  }
}

function grow(a: Int32Array, size: number): Int32Array<ArrayBuffer> {
  const b = new Int32Array(Math.max(size, 2 * a.length));
  b.set(a);
  return b;
}

function append(chain: number[], vid: number): void {
  if (chain[chain.length - 1] !== vid) chain.push(vid);
}
