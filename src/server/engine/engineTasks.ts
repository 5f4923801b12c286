// The engine work a worker does for one task: calls into shared/ and trims the answer to what the API
// sends (no planar graph, no per-step timings). Runs inside the worker thread; also callable directly.
import { checkGap } from '@shared/gap/gapCheck.ts';
import { checkDesign } from '@shared/route/checkDesign.ts';
import { checkRoute } from '@shared/route/checkRoute.ts';
import type { MipSolver } from '@shared/route/exact/mipSolver.ts';
import { planDesign, type DesignPlanOptions } from '@shared/route/planDesign.ts';
import { assertNever } from '@shared/assertNever.ts';
import { designSchema, type Design } from '@shared/design/design.schema.ts';
import { buildDesignSvg } from '@shared/export/designSvg.ts';
import type { DesignPayload, EngineAnswers, EngineTask } from './engine.types.ts';
import { acceptBody, acceptStored, parseDesignText, plainIssues } from './designCodec.ts';
import { figuresOf, summaryOf } from './engineSummaries.ts';
import { buildOwnRouteStrokes } from './ownRouteStrokes.ts';

function designOf(payload: DesignPayload): Design {
  return 'designText' in payload ? parseDesignText(payload.designText) : payload.design;
}

/** What a worker holds for every task: the loaded solver for the exact search and a clock for its time budget. */
export interface EngineContext {
  readonly solver: MipSolver | null;
  readonly clock: () => number;
}

export function runEngineTask<T extends EngineTask>(task: T, context: EngineContext): EngineAnswers[T['op']];
export function runEngineTask(task: EngineTask, context: EngineContext): EngineAnswers[EngineTask['op']] {
  const exact: DesignPlanOptions = { solver: context.solver, clock: context.clock };
  switch (task.op) {
    case 'summary': {
      const planned = planDesign(designOf(task), exact);
      return planned.ok ? { ok: true, value: summaryOf(planned.value) } : { ok: false, problem: planned.error };
    }
    case 'check': {
      const design = designOf(task);
      const checked = checkDesign(design, exact);
      if (!checked.ok) return { ok: false, problem: checked.error };
      const { plan, ...check } = checked.value;
      let ownRoute = null;
      if (design.route && design.route.length > 0) {
        const own = checkRoute(design);
        if (!own.ok) return { ok: false, problem: own.error };
        ownRoute = own.value;
      }
      const gap = checkGap(design);
      return { ok: true, value: { check, plan: figuresOf(plan), threadBudget: plan.threadBudget, ownRoute, gap: gap.ok ? gap.value : null } };
    }
    case 'ownRoute': {
      let design = designOf(task);
      if (task.routeText !== undefined) {
        // The route is checked against the block like the design's lines (designSchema: paths route.i.j).
        const withRoute = designSchema.safeParse({ ...design, route: JSON.parse(task.routeText) as unknown });
        if (!withRoute.success) return { ok: false, invalid: plainIssues(withRoute.error) };
        design = withRoute.data;
      }
      const own = checkRoute(design);
      if (!own.ok) return { ok: false, problem: own.error };
      const strokes = buildOwnRouteStrokes(design, own.value);
      return strokes.ok ? { ok: true, value: { check: own.value, strokes: strokes.value } } : { ok: false, problem: strokes.error };
    }
    case 'plan': {
      const planned = planDesign(designOf(task), { ...exact, stopsTable: true, ...(task.settings ? { settings: task.settings } : {}) });
      if (!planned.ok) return { ok: false, problem: planned.error };
      const plan = planned.value;
      return {
        ok: true,
        value: {
          ...figuresOf(plan),
          units: plan.units,
          route: plan.route,
          threadBudget: plan.threadBudget,
          lowerBound: plan.travelLowerBound,
          gapPercent: plan.gapPercent,
          stopsTable: plan.stopsTable ?? [],
          threadEnds: plan.threadEnds,
          settings: plan.settings,
          exactSearch: plan.exactSearch ? { keptVertices: plan.exactSearch.keptVertices, ms: plan.exactSearch.ms } : null,
        },
      };
    }
    case 'acceptBody':
      return acceptBody(task.text, task.shape);
    case 'acceptStored':
      return acceptStored(task.text, task.thumbnail);
    case 'exportSvg':
      return buildDesignSvg(parseDesignText(task.designText), task.options);
    default:
      return assertNever(task);
  }
}
