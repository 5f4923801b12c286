/**
 * Shares K extra stops among independent travel groups: the least Σ cost[g][k_g] with Σ k_g ≤ K (dynamic
 * programming over the groups; K is small). `cost[g][k]` is group g's objective with k extra stops (Infinity when
 * not computed). Ties go to fewer stops. Returns the stops per group and the total.
 */
export function allocateStops(cost: readonly (readonly number[])[], maxStops: number): { readonly stops: number[]; readonly total: number } {
  // best[j] = least total over the groups seen so far using exactly j stops; choice[g][j] = stops given to group g.
  let best = [0, ...new Array<number>(maxStops).fill(Infinity)];
  const choice: number[][] = [];
  for (const row of cost) {
    const next = new Array<number>(maxStops + 1).fill(Infinity);
    const pick = new Array<number>(maxStops + 1).fill(0);
    for (let used = 0; used <= maxStops; used++) {
      if (best[used] === Infinity) continue;
      for (let k = 0; used + k <= maxStops && k < row.length; k++) {
        const total = best[used]! + row[k]!;
        if (total < next[used + k]!) {
          next[used + k] = total;
          pick[used + k] = k;
        }
      }
    }
    best = next;
    choice.push(pick);
  }
  let j = 0;
  for (let i = 1; i <= maxStops; i++) if (best[i]! < best[j]!) j = i;
  const total = best[j]!;
  const stops = new Array<number>(cost.length).fill(0);
  for (let g = cost.length - 1; g >= 0; g--) {
    stops[g] = choice[g]![j]!;
    j -= stops[g]!;
  }
  return { stops, total };
}
