import type { PathSearch } from './shortestPaths.ts';
import type { EndCosts, EndPlace } from './threadEnds.ts';

/**
 * The cheapest way for a pairing terminal t to become a free thread end: end at t itself (its end cost), or travel
 * from t to a hidden place h on the quilting lines and end there (travel d(t, h) plus the tie). Ends may only sit
 * where quilting lines run (`onLines`); an end in the open is never worth travel, so only hidden places are offered.
 */
export interface EndOffer {
  /** Where the thread end sits. */
  readonly vertex: number;
  /** Integer travel cost from the terminal to `vertex`, and the planar edges of that travel (terminal side first). */
  readonly travel: number;
  readonly path: readonly number[];
  /** Integer end cost at `vertex`. */
  readonly end: number;
}

/**
 * Offers for each terminal, or null where no free end may be (`barred`). One multi-source search from all hidden
 * places on the lines, cut off at the open-end premium, so it costs almost nothing unless the allowance is large.
 */
export function findEndOffers(
  search: PathSearch,
  terminals: readonly number[],
  places: readonly EndPlace[],
  onLines: Uint8Array,
  costs: EndCosts,
  barred: (v: number) => boolean,
): Map<number, EndOffer | null> {
  const offers = new Map<number, EndOffer | null>();
  const hidden: number[] = [];
  for (let v = 0; v < onLines.length; v++) if (onLines[v] && places[v] !== 'open') hidden.push(v);
  const wanted = new Set(terminals.filter((t) => !barred(t) && places[t] === 'open'));
  const searched = hidden.length > 0 && wanted.size > 0;
  if (searched) {
    let left = wanted.size;
    search.run(hidden, (v, d) => {
      if (d >= costs.open) return true;
      if (wanted.has(v)) left--;
      return left === 0;
    });
  }
  for (const t of terminals) {
    if (barred(t)) {
      offers.set(t, null);
      continue;
    }
    const here: EndOffer = { vertex: t, travel: 0, path: [], end: costs.tie + (places[t] === 'open' ? costs.open : 0) };
    const d = searched && wanted.has(t) ? search.distanceTo(t) : Infinity;
    if (d + costs.tie < here.end) {
      offers.set(t, { vertex: search.originOf(t), travel: d, path: search.pathTo(t).reverse(), end: costs.tie });
    } else {
      offers.set(t, here);
    }
  }
  return offers;
}
