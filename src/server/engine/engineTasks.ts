// The engine work a worker does for one task: calls into shared/ and trims the answer to what the API
// sends (no planar graph, no per-step timings). Runs inside the worker thread; also callable directly.
import { checkDesign } from '../../../shared/route/checkDesign.ts';
import { planDesign } from '../../../shared/route/planDesign.ts';
import { assertNever } from '../../../shared/assertNever.ts';
import type { EngineAnswers, EngineTask } from './engine.types.ts';
import { figuresOf, summaryOf } from './engineSummaries.ts';

export function runEngineTask<T extends EngineTask>(task: T): EngineAnswers[T['op']];
export function runEngineTask(task: EngineTask): EngineAnswers[EngineTask['op']] {
  switch (task.op) {
    case 'summary': {
      const planned = planDesign(task.design);
      return planned.ok ? { ok: true, value: summaryOf(planned.value) } : { ok: false, problem: planned.error };
    }
    case 'check': {
      const checked = checkDesign(task.design);
      if (!checked.ok) return { ok: false, problem: checked.error };
      const { plan, ...check } = checked.value;
      return { ok: true, value: { check, plan: figuresOf(plan), threadBudget: plan.threadBudget } };
    }
    case 'plan': {
      const planned = planDesign(task.design);
      if (!planned.ok) return { ok: false, problem: planned.error };
      const plan = planned.value;
      return { ok: true, value: { ...figuresOf(plan), units: plan.units, route: plan.route, threadBudget: plan.threadBudget } };
    }
    default:
      return assertNever(task);
  }
}
