import Flatbush from 'flatbush';
import type { Polyline } from '../geometry/point.ts';
import { intersectSegments, type SegmentContact } from '../geometry/intersect.ts';
import { err, ok, type Result } from '../result.ts';
import type { Atoms } from './assemble.ts';
import type { NodedLines, TooManyCrossings } from './noding.ts';

/** Strokes laid onto noded design lines. */
export interface NodedStrokes {
  /** The design's line chains with the strokes' new vertices spliced in (each cut splits one atom in two). */
  readonly lineChains: readonly (readonly number[])[];
  /** The atoms of `lineChains`. */
  readonly atoms: Atoms;
  /** Per stroke, the vertex ids it passes in drawing order (consecutive repeats removed). */
  readonly strokeChains: readonly (readonly number[])[];
}

type Visit = (stroke: number, seg: number, atom: number, contact: SegmentContact, p: number, q: number) => void;

/**
 * Lays strokes (a quilter's route) onto design lines that are already noded, without noding the design again,
 * so the design's own vertices, crossings and atoms stay exactly those of `buildPlanarGraph`:
 * 1. stroke points snap to the vertices already in `noded.grid` (nearest within `tolerance`), else become new vertices;
 * 2. a stroke segment whose two vertices are the ends of one atom *is* that atom (so a planned route replays exactly);
 * 3. any other stroke segment is intersected with the atoms near it (flatbush). First the atoms are cut, only at
 *    *new* vertices (a stroke end or crossing within the tolerance of the atom), never at an existing design vertex,
 *    which would change the design's graph; `atomsOf` rebuilds the atoms from the cut chains. Then each stroke
 *    segment that is still no atom is cut at every atom end lying on it and where it crosses an atom.
 * Cuts add degree-2 vertices only, so odd points, pieces and lengths stay those of the design.
 * Stops with `too-many-crossings` once more than `maxContacts` contacts are found.
 */
export function nodeStrokes(
  noded: NodedLines,
  designAtoms: Atoms,
  strokes: readonly Polyline[],
  tolerance: number,
  maxContacts: number,
  atomsOf: (chains: readonly (readonly number[])[]) => Atoms,
): Result<NodedStrokes, TooManyCrossings> {
  const { grid } = noded;
  const firstNew = grid.size;
  const own = strokes.map((line) => {
    const out: number[] = [];
    for (const [x, y] of line) append(out, grid.snap(x, y));
    return out;
  });
  const { xs, ys } = grid;
  let contacts = 0;
  /** Calls `visit` for every contact of a stroke segment that is not an atom with the atoms near it; false past the cap. */
  const scan = (atoms: Atoms, visit: Visit): boolean => {
    let index: Flatbush | null = null;
    for (let s = 0; s < own.length; s++) {
      const chain = own[s]!;
      for (let k = 1; k < chain.length; k++) {
        const p = chain[k - 1]!;
        const q = chain[k]!;
        if (atoms.byPair.get(p, q) >= 0) continue;
        index ??= atomIndex(atoms, xs, ys, tolerance);
        const p0 = [xs[p]!, ys[p]!] as const;
        const p1 = [xs[q]!, ys[q]!] as const;
        for (const a of index.search(Math.min(p0[0], p1[0]), Math.min(p0[1], p1[1]), Math.max(p0[0], p1[0]), Math.max(p0[1], p1[1]))) {
          if (a >= atoms.u.length) continue;
          const u = atoms.u[a]!;
          const v = atoms.v[a]!;
          const hit = intersectSegments(p0, p1, [xs[u]!, ys[u]!], [xs[v]!, ys[v]!], tolerance);
          for (const c of hit.contacts) visit(s, k, a, c, p, q);
          contacts += hit.contacts.length;
          if (contacts > maxContacts) return false;
        }
      }
    }
    return true;
  };

  // 1. Cut atoms at new vertices; splice the cuts into every design chain passing the atom, in its direction.
  const atomCuts: { atom: number; t: number; vid: number }[] = [];
  const cutAtoms = scan(designAtoms, (_s, _k, a, c, p, q) => {
    if (c.end === 'b0' || c.end === 'b1') return;
    const vid = c.end === 'a0' ? p : c.end === 'a1' ? q : grid.snap(c.point[0], c.point[1]);
    if (vid >= firstNew && vid !== designAtoms.u[a] && vid !== designAtoms.v[a]) atomCuts.push({ atom: a, t: c.u, vid });
  });
  if (!cutAtoms) return err({ kind: 'too-many-crossings', cap: maxContacts });
  let lineChains = noded.chains;
  let atoms = designAtoms;
  if (atomCuts.length > 0) {
    atomCuts.sort((x, y) => x.atom - y.atom || x.t - y.t);
    const cutsOf = new Map<number, number[]>();
    for (const c of atomCuts) {
      const list = cutsOf.get(c.atom);
      if (list === undefined) cutsOf.set(c.atom, [c.vid]);
      else list.push(c.vid);
    }
    lineChains = noded.chains.map((chain) => {
      const out: number[] = [];
      for (let k = 0; k < chain.length; k++) {
        if (k > 0) {
          const a = designAtoms.byPair.get(chain[k - 1]!, chain[k]!);
          const cuts = a >= 0 ? cutsOf.get(a) : undefined;
          if (cuts !== undefined) {
            if (designAtoms.u[a] === chain[k - 1]) for (const vid of cuts) append(out, vid);
            else for (let i = cuts.length - 1; i >= 0; i--) append(out, cuts[i]!);
          }
        }
        append(out, chain[k]!);
      }
      return out;
    });
    atoms = atomsOf(lineChains);
  }

  // 2. Cut the strokes at the (cut) atoms' ends lying on them and where they cross atoms.
  const strokeCuts: { stroke: number; seg: number; t: number; vid: number }[] = [];
  const cutStrokes = scan(atoms, (s, k, a, c, p, q) => {
    if (c.end === 'a0' || c.end === 'a1') return;
    const vid = c.end === 'b0' ? atoms.u[a]! : c.end === 'b1' ? atoms.v[a]! : grid.snap(c.point[0], c.point[1]);
    if (vid !== p && vid !== q) strokeCuts.push({ stroke: s, seg: k, t: c.t, vid });
  });
  if (!cutStrokes) return err({ kind: 'too-many-crossings', cap: maxContacts });
  strokeCuts.sort((x, y) => x.stroke - y.stroke || x.seg - y.seg || x.t - y.t);
  let cursor = 0;
  const strokeChains = own.map((chain, s) => {
    const out: number[] = [];
    for (let k = 0; k < chain.length; k++) {
      for (; cursor < strokeCuts.length && strokeCuts[cursor]!.stroke === s && strokeCuts[cursor]!.seg === k; cursor++) append(out, strokeCuts[cursor]!.vid);
      append(out, chain[k]!);
    }
    return out;
  });
  return ok({ lineChains, atoms, strokeChains });
}

function atomIndex(atoms: Atoms, xs: readonly number[], ys: readonly number[], tolerance: number): Flatbush {
  const nA = atoms.u.length;
  const f = new Flatbush(Math.max(1, nA));
  for (let a = 0; a < nA; a++) {
    const u = atoms.u[a]!;
    const v = atoms.v[a]!;
    f.add(Math.min(xs[u]!, xs[v]!) - tolerance, Math.min(ys[u]!, ys[v]!) - tolerance, Math.max(xs[u]!, xs[v]!) + tolerance, Math.max(ys[u]!, ys[v]!) + tolerance);
  }
  if (nA === 0) f.add(0, 0, 0, 0);
  f.finish();
  return f;
}

function append(chain: number[], vid: number): void {
  if (chain[chain.length - 1] !== vid) chain.push(vid);
}
