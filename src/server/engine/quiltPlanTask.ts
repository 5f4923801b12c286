// The quilt-plan task inside a worker: parses the placed designs (validated by designSchema), runs planQuiltRoute with
// a corner-cost cache of its own (one per task: nothing is remembered between requests yet) and cuts the answer to
// the contract (shared/contract/quiltPlan.ts).
import type { QuiltPlan } from '@shared/contract/quiltPlan.ts';
import type { DesignPlanOptions } from '@shared/route/planDesign.ts';
import { CornerCostCache } from '@shared/quilt/cornerCostCache.ts';
import { planQuiltRoute, type QuiltDesign, type QuiltRoute } from '@shared/quilt/quiltRoute.ts';
import type { EngineAnswers, EngineTask } from './engine.types.ts';
import { parseDesignText } from './designCodec.ts';

/** Travel within this much of its lower bound counts as proven (rounding of sums in quilt units). */
const PROVEN_TOLERANCE = 1e-6;

export function planQuiltOf(task: Extract<EngineTask, { op: 'quiltPlan' }>, exact: DesignPlanOptions): EngineAnswers['quiltPlan'] {
  const designs = new Map<string, QuiltDesign>(task.designs.map((d) => [d.id, { design: parseDesignText(d.designText), revision: d.revision }]));
  const planned = planQuiltRoute(task.quilt, designs, new CornerCostCache(), {
    solver: exact.solver ?? null,
    ...(exact.clock ? { clock: exact.clock } : {}),
    ...(task.settings ? { settings: task.settings } : {}),
  });
  if (!planned.ok) return { ok: false, quiltProblem: planned.error };
  return { ok: true, value: quiltPlanOf(planned.value) };
}

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
