// The whole-quilt plan cut to the contract (shared/contract/quiltPlan.ts): order, entry and exit corners, travel,
// the proof of that travel and the quilt's budget. Used by the planning worker and by the cached answer.
import type { QuiltPlan } from '@shared/contract/quiltPlan.ts';
import type { QuiltRoute } from '@shared/quilt/quiltRoute.ts';

/** Travel within this much of its lower bound counts as proven (rounding of sums in quilt units). */
const PROVEN_TOLERANCE = 1e-6;

/** The quilt route cut to the contract: order, corners, travel, proof and budget. */
export function quiltPlanOf(route: QuiltRoute): QuiltPlan {
  const { chain, budget, lowerBound } = route;
  return {
    units: budget.units,
    steps: chain.steps.map((s) => ({ cell: s.cell, entry: s.entry, exit: s.exit, blockCost: s.blockCost, linkBefore: s.linkBefore })),
    blockTravel: chain.blockTravel,
    linkTravel: chain.linkTravel,
    totalTravel: chain.total,
    lowerBound,
    proven: chain.total - lowerBound <= PROVEN_TOLERANCE * Math.max(1, chain.total),
    passes: budget.passes,
    stops: budget.stops,
    stitchLength: budget.stitchLength,
    stitchCount: budget.total.stitchCount,
    topThreadYards: budget.total.topThreadYards,
    bobbinThreadYards: budget.total.bobbinThreadYards,
    bobbins: budget.total.bobbins,
    sewingMinutes: budget.total.sewingMinutes,
    assumptions: budget.total.assumptions.map((a) => ({ setting: a.setting, value: a.value, source: a.source })),
    linkModel: budget.linkModel,
  };
}
