/**
 * Exact maximum-weight matching on a general graph: Edmonds' blossom algorithm in the primal–dual O(n³) form
 * of Galil (ACM Computing Surveys 18, 1986), ported to typed arrays from Joris van Rantwijk's public-domain
 * `mwmatching.py` (the same code networkx's `max_weight_matching` uses). The step names and comments follow
 * that file so the two can be read side by side.
 *
 * Why a port of our own: the npm ports rebuild plain arrays every stage and take 2.5 s on a tie-heavy K480
 * (docs/engine.md §3.2); typed arrays reset in place. The file is longer than our usual
 * modules because the algorithm's steps share one mutable state; splitting it would only hide that.
 *
 * Weights must be integers (|w| < 2^50): duals then stay exact in float64 and the result is exactly optimal.
 */

/** Final state of a solve: the matching and the optimal dual solution that certifies it. */
export interface BlossomResult {
  /** mate[v] = matched vertex or -1. */
  readonly mate: Int32Array;
  /** Doubled vertex duals 2·u(v), length n (Van Rantwijk's `dualvar[v]`). */
  readonly vertexDual: Float64Array;
  /** Blossom duals z(b) for b in [n, 2n), indexed b − n; 0 for unused ids. */
  readonly blossomDual: Float64Array;
  /** Parent blossom of each vertex or blossom id (−1 at the top), length 2n. */
  readonly blossomParent: Int32Array;
}

/**
 * Maximum-weight matching; with `maxCardinality` the maximum weight among maximum-cardinality matchings.
 * `eu[k]`, `ev[k]` are the ends of edge k (distinct vertices in [0, n)), `ew[k]` its integer weight.
 * At the end, every edge has slack 2u(i)+2u(j)+2Σz(b ∋ i,j) − 2w ≥ 0 and matched edges have slack 0.
 */
export function maxWeightMatching(
  n: number,
  eu: Int32Array,
  ev: Int32Array,
  ew: Float64Array,
  maxCardinality: boolean,
): BlossomResult {
  const nedge = eu.length;
  const blossomParent = new Int32Array(2 * n).fill(-1);
  const dualvar = new Float64Array(2 * n);
  const mate = new Int32Array(n).fill(-1);
  if (nedge === 0 || n === 0) {
    return { mate, vertexDual: dualvar.slice(0, n), blossomDual: new Float64Array(n), blossomParent };
  }
  let maxweight = 0;
  for (let k = 0; k < nedge; k++) maxweight = Math.max(maxweight, ew[k]!);

  // endpoint[p] = vertex at end p of edge p>>1; neighbend: CSR list of remote endpoints per vertex.
  const endpoint = new Int32Array(2 * nedge);
  const degree = new Int32Array(n + 1);
  for (let k = 0; k < nedge; k++) {
    endpoint[2 * k] = eu[k]!;
    endpoint[2 * k + 1] = ev[k]!;
    degree[eu[k]!]!++;
    degree[ev[k]!]!++;
  }
  const nbStart = new Int32Array(n + 1);
  for (let v = 0; v < n; v++) nbStart[v + 1] = nbStart[v]! + degree[v]!;
  const nbFill = nbStart.slice(0, n);
  const neighbend = new Int32Array(2 * nedge);
  for (let k = 0; k < nedge; k++) {
    neighbend[nbFill[eu[k]!]!++] = 2 * k + 1;
    neighbend[nbFill[ev[k]!]!++] = 2 * k;
  }

  const label = new Int32Array(2 * n);
  const labelend = new Int32Array(2 * n).fill(-1);
  const inblossom = new Int32Array(n);
  for (let v = 0; v < n; v++) inblossom[v] = v;
  const blossomchilds: (number[] | null)[] = new Array<number[] | null>(2 * n).fill(null);
  const blossomendps: (number[] | null)[] = new Array<number[] | null>(2 * n).fill(null);
  const blossombase = new Int32Array(2 * n).fill(-1);
  for (let v = 0; v < n; v++) blossombase[v] = v;
  const bestedge = new Int32Array(2 * n).fill(-1);
  const blossombestedges: (number[] | null)[] = new Array<number[] | null>(2 * n).fill(null);
  const unusedblossoms: number[] = [];
  for (let b = n; b < 2 * n; b++) unusedblossoms.push(b);
  for (let v = 0; v < n; v++) dualvar[v] = maxweight;
  const allowedge = new Uint8Array(nedge);
  // A vertex can be queued again when an expanded blossom relabels it, so the queue is a growable stack.
  const queue: number[] = [];
  const bestedgeto = new Int32Array(2 * n).fill(-1);

  const slack = (k: number): number => dualvar[eu[k]!]! + dualvar[ev[k]!]! - 2 * ew[k]!;

  const leaves: number[] = [];
  /** Appends the vertices inside blossom b to `out`. */
  const blossomLeaves = (b: number, out: number[]): void => {
    if (b < n) {
      out.push(b);
      return;
    }
    for (const t of blossomchilds[b]!) {
      if (t < n) out.push(t);
      else blossomLeaves(t, out);
    }
  };

  const assignLabel = (w0: number, t0: number, p0: number): void => {
    let w = w0;
    let t = t0;
    let p = p0;
    for (;;) {
      const b = inblossom[w]!;
      label[w] = label[b] = t;
      labelend[w] = labelend[b] = p;
      bestedge[w] = bestedge[b] = -1;
      if (t === 1) {
        leaves.length = 0;
        blossomLeaves(b, leaves);
        for (const x of leaves) queue.push(x);
        return;
      }
      const base = blossombase[b]!;
      const mb = mate[base]!;
      w = endpoint[mb]!;
      t = 1;
      p = mb ^ 1;
    }
  };

  const scanPath: number[] = [];
  const scanBlossom = (v0: number, w0: number): number => {
    let v = v0;
    let w = w0;
    scanPath.length = 0;
    let base = -1;
    while (v !== -1 || w !== -1) {
      let b = inblossom[v]!;
      if (label[b]! & 4) {
        base = blossombase[b]!;
        break;
      }
      scanPath.push(b);
      label[b] = 5;
      if (labelend[b] === -1) {
        v = -1;
      } else {
        v = endpoint[labelend[b]!]!;
        b = inblossom[v]!;
        v = endpoint[labelend[b]!]!;
      }
      if (w !== -1) {
        const tmp = v;
        v = w;
        w = tmp;
      }
    }
    for (const b of scanPath) label[b] = 1;
    return base;
  };

  const addBlossom = (base: number, k: number): void => {
    let v = eu[k]!;
    let w = ev[k]!;
    const bb = inblossom[base]!;
    let bv = inblossom[v]!;
    let bw = inblossom[w]!;
    const b = unusedblossoms.pop()!;
    blossombase[b] = base;
    blossomParent[b] = -1;
    blossomParent[bb] = b;
    const path: number[] = [];
    const endps: number[] = [];
    while (bv !== bb) {
      blossomParent[bv] = b;
      path.push(bv);
      endps.push(labelend[bv]!);
      v = endpoint[labelend[bv]!]!;
      bv = inblossom[v]!;
    }
    path.push(bb);
    path.reverse();
    endps.reverse();
    endps.push(2 * k);
    while (bw !== bb) {
      blossomParent[bw] = b;
      path.push(bw);
      endps.push(labelend[bw]! ^ 1);
      w = endpoint[labelend[bw]!]!;
      bw = inblossom[w]!;
    }
    blossomchilds[b] = path;
    blossomendps[b] = endps;
    label[b] = 1;
    labelend[b] = labelend[bb]!;
    dualvar[b] = 0;
    const inner: number[] = [];
    blossomLeaves(b, inner);
    for (const x of inner) {
      if (label[inblossom[x]!] === 2) queue.push(x);
      inblossom[x] = b;
    }
    const touched: number[] = [];
    const consider = (kk: number): void => {
      let j = ev[kk]!;
      if (inblossom[j] === b) j = eu[kk]!;
      const bj = inblossom[j]!;
      if (bj !== b && label[bj] === 1 && (bestedgeto[bj] === -1 || slack(kk) < slack(bestedgeto[bj]!))) {
        if (bestedgeto[bj] === -1) touched.push(bj);
        bestedgeto[bj] = kk;
      }
    };
    for (const sub of path) {
      const list = blossombestedges[sub];
      if (list === null || list === undefined) {
        const subLeaves: number[] = [];
        blossomLeaves(sub, subLeaves);
        for (const x of subLeaves) {
          for (let q = nbStart[x]!; q < nbStart[x + 1]!; q++) consider(neighbend[q]! >> 1);
        }
      } else {
        for (const kk of list) consider(kk);
      }
      blossombestedges[sub] = null;
      bestedge[sub] = -1;
    }
    const best: number[] = [];
    let bestK = -1;
    for (const bj of touched) {
      const kk = bestedgeto[bj]!;
      bestedgeto[bj] = -1;
      best.push(kk);
      if (bestK === -1 || slack(kk) < slack(bestK)) bestK = kk;
    }
    blossombestedges[b] = best;
    bestedge[b] = bestK;
  };

  const expandBlossom = (b: number, endstage: boolean): void => {
    const childs = blossomchilds[b]!;
    const endps = blossomendps[b]!;
    for (const s of childs) {
      blossomParent[s] = -1;
      if (s < n) inblossom[s] = s;
      else if (endstage && dualvar[s] === 0) expandBlossom(s, endstage);
      else {
        leaves.length = 0;
        blossomLeaves(s, leaves);
        for (const x of leaves) inblossom[x] = s;
      }
    }
    if (!endstage && label[b] === 2) {
      const len = childs.length;
      const at = (j: number): number => childs[(j + len) % len]!;
      const endAt = (j: number): number => endps[(j + len) % len]!;
      const entrychild = inblossom[endpoint[labelend[b]! ^ 1]!]!;
      let j = childs.indexOf(entrychild);
      let jstep: number;
      let endptrick: number;
      if (j & 1) {
        j -= len;
        jstep = 1;
        endptrick = 0;
      } else {
        jstep = -1;
        endptrick = 1;
      }
      let p = labelend[b]!;
      while (j !== 0) {
        label[endpoint[p ^ 1]!] = 0;
        label[endpoint[endAt(j - endptrick) ^ endptrick ^ 1]!] = 0;
        assignLabel(endpoint[p ^ 1]!, 2, p);
        allowedge[endAt(j - endptrick) >> 1] = 1;
        j += jstep;
        p = endAt(j - endptrick) ^ endptrick;
        allowedge[p >> 1] = 1;
        j += jstep;
      }
      let bv = at(j);
      label[endpoint[p ^ 1]!] = label[bv] = 2;
      labelend[endpoint[p ^ 1]!] = labelend[bv] = p;
      bestedge[bv] = -1;
      j += jstep;
      while (at(j) !== entrychild) {
        bv = at(j);
        if (label[bv] === 1) {
          j += jstep;
          continue;
        }
        leaves.length = 0;
        blossomLeaves(bv, leaves);
        let found = -1;
        for (const x of leaves) {
          if (label[x] !== 0) {
            found = x;
            break;
          }
        }
        if (found >= 0) {
          label[found] = 0;
          label[endpoint[mate[blossombase[bv]!]!]!] = 0;
          assignLabel(found, 2, labelend[found]!);
        }
        j += jstep;
      }
    }
    label[b] = labelend[b] = -1;
    blossomchilds[b] = blossomendps[b] = null;
    blossombase[b] = -1;
    blossombestedges[b] = null;
    bestedge[b] = -1;
    unusedblossoms.push(b);
  };

  const augmentBlossom = (b: number, v: number): void => {
    let t = v;
    while (blossomParent[t] !== b) t = blossomParent[t]!;
    if (t >= n) augmentBlossom(t, v);
    const childs = blossomchilds[b]!;
    const endps = blossomendps[b]!;
    const len = childs.length;
    const i = childs.indexOf(t);
    let j = i;
    let jstep: number;
    let endptrick: number;
    if (i & 1) {
      j -= len;
      jstep = 1;
      endptrick = 0;
    } else {
      jstep = -1;
      endptrick = 1;
    }
    while (j !== 0) {
      j += jstep;
      t = childs[(j + len) % len]!;
      const p = endps[(j - endptrick + len) % len]! ^ endptrick;
      if (t >= n) augmentBlossom(t, endpoint[p]!);
      j += jstep;
      t = childs[(j + len) % len]!;
      if (t >= n) augmentBlossom(t, endpoint[p ^ 1]!);
      mate[endpoint[p]!] = p ^ 1;
      mate[endpoint[p ^ 1]!] = p;
    }
    blossomchilds[b] = childs.slice(i).concat(childs.slice(0, i));
    blossomendps[b] = endps.slice(i).concat(endps.slice(0, i));
    blossombase[b] = blossombase[blossomchilds[b]![0]!]!;
  };

  const augmentMatching = (k: number): void => {
    const starts: [number, number][] = [
      [eu[k]!, 2 * k + 1],
      [ev[k]!, 2 * k],
    ];
    for (const [s0, p0] of starts) {
      let s = s0;
      let p = p0;
      for (;;) {
        const bs = inblossom[s]!;
        if (bs >= n) augmentBlossom(bs, s);
        mate[s] = p;
        if (labelend[bs] === -1) break;
        const t = endpoint[labelend[bs]!]!;
        const bt = inblossom[t]!;
        s = endpoint[labelend[bt]!]!;
        const j = endpoint[labelend[bt]! ^ 1]!;
        if (bt >= n) augmentBlossom(bt, j);
        mate[j] = labelend[bt]!;
        p = labelend[bt]! ^ 1;
      }
    }
  };

  for (let stage = 0; stage < n; stage++) {
    label.fill(0);
    bestedge.fill(-1);
    for (let b = n; b < 2 * n; b++) blossombestedges[b] = null;
    allowedge.fill(0);
    queue.length = 0;
    for (let v = 0; v < n; v++) {
      if (mate[v] === -1 && label[inblossom[v]!] === 0) assignLabel(v, 1, -1);
    }
    let augmented = false;
    for (;;) {
      while (queue.length > 0 && !augmented) {
        const v = queue.pop()!;
        for (let q = nbStart[v]!; q < nbStart[v + 1]!; q++) {
          const p = neighbend[q]!;
          const k = p >> 1;
          const w = endpoint[p]!;
          if (inblossom[v] === inblossom[w]) continue;
          let kslack = 0;
          if (!allowedge[k]) {
            kslack = slack(k);
            if (kslack <= 0) allowedge[k] = 1;
          }
          if (allowedge[k]) {
            if (label[inblossom[w]!] === 0) {
              assignLabel(w, 2, p ^ 1);
            } else if (label[inblossom[w]!] === 1) {
              const base = scanBlossom(v, w);
              if (base >= 0) addBlossom(base, k);
              else {
                augmentMatching(k);
                augmented = true;
                break;
              }
            } else if (label[w] === 0) {
              label[w] = 2;
              labelend[w] = p ^ 1;
            }
          } else if (label[inblossom[w]!] === 1) {
            const b = inblossom[v]!;
            if (bestedge[b] === -1 || kslack < slack(bestedge[b]!)) bestedge[b] = k;
          } else if (label[w] === 0) {
            if (bestedge[w] === -1 || kslack < slack(bestedge[w]!)) bestedge[w] = k;
          }
        }
      }
      if (augmented) break;

      let deltatype = -1;
      let delta = 0;
      let deltaedge = -1;
      let deltablossom = -1;
      if (!maxCardinality) {
        deltatype = 1;
        delta = Infinity;
        for (let v = 0; v < n; v++) delta = Math.min(delta, dualvar[v]!);
      }
      for (let v = 0; v < n; v++) {
        if (label[inblossom[v]!] === 0 && bestedge[v] !== -1) {
          const d = slack(bestedge[v]!);
          if (deltatype === -1 || d < delta) {
            delta = d;
            deltatype = 2;
            deltaedge = bestedge[v]!;
          }
        }
      }
      for (let b = 0; b < 2 * n; b++) {
        if (blossomParent[b] === -1 && label[b] === 1 && bestedge[b] !== -1) {
          // Integer weights keep the slack of an S–S edge even, so the halving stays exact.
          const d = slack(bestedge[b]!) / 2;
          if (deltatype === -1 || d < delta) {
            delta = d;
            deltatype = 3;
            deltaedge = bestedge[b]!;
          }
        }
      }
      for (let b = n; b < 2 * n; b++) {
        if (blossombase[b]! >= 0 && blossomParent[b] === -1 && label[b] === 2 && (deltatype === -1 || dualvar[b]! < delta)) {
          delta = dualvar[b]!;
          deltatype = 4;
          deltablossom = b;
        }
      }
      if (deltatype === -1) {
        deltatype = 1;
        let m = Infinity;
        for (let v = 0; v < n; v++) m = Math.min(m, dualvar[v]!);
        delta = Math.max(0, m);
      }
      for (let v = 0; v < n; v++) {
        const l = label[inblossom[v]!];
        if (l === 1) dualvar[v]! -= delta;
        else if (l === 2) dualvar[v]! += delta;
      }
      for (let b = n; b < 2 * n; b++) {
        if (blossombase[b]! >= 0 && blossomParent[b] === -1) {
          if (label[b] === 1) dualvar[b]! += delta;
          else if (label[b] === 2) dualvar[b]! -= delta;
        }
      }
      if (deltatype === 1) break;
      if (deltatype === 2) {
        allowedge[deltaedge] = 1;
        let i = eu[deltaedge]!;
        if (label[inblossom[i]!] === 0) i = ev[deltaedge]!;
        queue.push(i);
      } else if (deltatype === 3) {
        allowedge[deltaedge] = 1;
        queue.push(eu[deltaedge]!);
      } else {
        expandBlossom(deltablossom, false);
      }
    }
    if (!augmented) break;
    for (let b = n; b < 2 * n; b++) {
      if (blossomParent[b] === -1 && blossombase[b]! >= 0 && label[b] === 1 && dualvar[b] === 0) expandBlossom(b, true);
    }
  }

  for (let v = 0; v < n; v++) if (mate[v]! >= 0) mate[v] = endpoint[mate[v]!]!;
  return { mate, vertexDual: dualvar.slice(0, n), blossomDual: dualvar.slice(n), blossomParent };
}
