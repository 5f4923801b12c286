import type { Units } from '../design/design.schema.ts';
import { ok, type Result } from '../result.ts';
import { placeCornerCosts, type Corner, type CornerCosts } from './cornerMap.ts';
import { costTableOf, unitScale, type CornerPairPlan, type DesignCornerCosts } from './cornerCosts.ts';
import type { Orientation } from './quilt.schema.ts';

/**
 * Remembers corner-pair costs so a re-plan of the quilt costs only the dynamic programme. The design's own table is
 * planned once per design and revision (turning and mirroring keep lengths, so all eight orientations share it);
 * each placed table is kept under design, revision and orientation (`cornerCostKey`). A design the planner refuses
 * is not remembered.
 */
export class CornerCostCache {
  private readonly designs = new Map<string, DesignCornerCosts>();
  private readonly placed = new Map<string, CornerCosts>();

  /** Whether this design revision's table is known already. */
  has(designId: string, revision: string): boolean {
    return this.designs.has(`${designId}@${revision}`);
  }

  /** The design's table, computed by `compute` the first time this design revision is asked for. */
  design<E>(designId: string, revision: string, compute: () => Result<DesignCornerCosts, E>): Result<DesignCornerCosts, E> {
    const key = `${designId}@${revision}`;
    const found = this.designs.get(key);
    if (found) return ok(found);
    const computed = compute();
    if (computed.ok) this.designs.set(key, computed.value);
    return computed;
  }

  /** The placed table in quilt units (`quiltUnits`), from the design's table. */
  placedCosts<E>(designId: string, revision: string, o: Orientation, quiltUnits: Units, compute: () => Result<DesignCornerCosts, E>): Result<CornerCosts, E> {
    const key = `${cornerCostKey(designId, revision, o)}:${quiltUnits}`;
    const found = this.placed.get(key);
    if (found) return ok(found);
    const own = this.design(designId, revision, compute);
    if (!own.ok) return own;
    const table = placeCornerCosts(costTableOf(own.value), o, unitScale(own.value.units, quiltUnits));
    this.placed.set(key, table);
    return ok(table);
  }

  /**
   * Puts a better plan of pair {a, b} (design corners) into a known table, both ways round, and forgets the placed
   * tables made from the old one.
   */
  refinePair(designId: string, revision: string, a: Corner, b: Corner, plan: CornerPairPlan): void {
    const key = `${designId}@${revision}`;
    const known = this.designs.get(key);
    if (!known) throw new Error(`quilt/cornerCostCache: no table for ${key}`);
    const pairs = known.pairs.map((row, e) => row.map((p, x) => ((e === a && x === b) || (e === b && x === a) ? plan : p)));
    this.designs.set(key, { units: known.units, pairs });
    for (const k of [...this.placed.keys()]) if (k.startsWith(`${key}/`)) this.placed.delete(k);
  }

  /** How many design tables have been planned (each is `PLANS_PER_DESIGN` plans). */
  get plannedDesigns(): number {
    return this.designs.size;
  }
}

/** Cache key of a placed design: id, revision and orientation ("r90m" = mirrored, then a quarter turn). */
export function cornerCostKey(designId: string, revision: string, o: Orientation): string {
  return `${designId}@${revision}/r${o.rotation}${o.mirror ? 'm' : ''}`;
}
