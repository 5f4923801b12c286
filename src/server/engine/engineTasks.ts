// The engine work a worker does for one task: calls into shared/ and cuts the answer to the route contract
// (shared/route/routeAnswers.ts: no planar graph, no per-step timings). Runs inside the worker thread; also callable directly.
import type { LpSolver } from '@shared/route/exact/lpSolver.ts';
import { planDesign, type DesignPlanOptions } from '@shared/route/planDesign.ts';
import { buildCheckResult, buildOwnRouteResult, summaryOf, toPlanResult } from '@shared/route/routeAnswers.ts';
import { assertNever } from '@shared/assertNever.ts';
import { designSchema, type Design } from '@shared/design/design.schema.ts';
import { buildDesignSvg } from '@shared/export/designSvg.ts';
import type { DesignPayload, EngineAnswers, EngineTask } from './engine.types.ts';
import { acceptBody, acceptStored, parseDesignText, plainIssues } from './designCodec.ts';
import { planCornerPair } from '@shared/quilt/cornerCosts.ts';

function designOf(payload: DesignPayload): Design {
  return 'designText' in payload ? parseDesignText(payload.designText) : payload.design;
}

/** What a worker holds for every task: the loaded solver for the exact search and a clock for its time budget. */
export interface EngineContext {
  readonly solver: LpSolver | null;
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
      const checked = buildCheckResult(designOf(task), exact);
      return checked.ok ? { ok: true, value: checked.value } : { ok: false, problem: checked.error };
    }
    case 'ownRoute': {
      let design = designOf(task);
      if (task.routeText !== undefined) {
        // The route is checked against the block like the design's lines (designSchema: paths route.i.j).
        const withRoute = designSchema.safeParse({ ...design, route: JSON.parse(task.routeText) as unknown });
        if (!withRoute.success) return { ok: false, invalid: plainIssues(withRoute.error) };
        design = withRoute.data;
      }
      const own = buildOwnRouteResult(design);
      return own.ok ? { ok: true, value: own.value } : { ok: false, problem: own.error };
    }
    case 'plan': {
      const planned = planDesign(designOf(task), { ...exact, stopsTable: true, ...(task.settings ? { settings: task.settings } : {}) });
      return planned.ok ? { ok: true, value: toPlanResult(planned.value) } : { ok: false, problem: planned.error };
    }
    case 'cornerPair': {
      const pair = planCornerPair(parseDesignText(task.designText), task.a, task.b, {
        settings: task.settings,
        clock: context.clock,
        ...(task.exact ? { solver: context.solver } : {}),
      });
      return pair.ok ? { ok: true, value: pair.value } : { ok: false, problem: pair.error };
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
