// What crosses the worker boundary: plain, structured-clonable data only.
// The main thread validates every design (designSchema) before it sends a task.
// Answers are the route contract's types (shared/contract): the worker builds them with shared/route/routeAnswers.ts.
import type { CheckResult } from '@shared/contract/check.ts';
import type { DesignSummary } from '@shared/contract/figures.ts';
import type { PlanResult } from '@shared/contract/plan.ts';
import type { Design } from '@shared/design/design.schema.ts';
import type { DesignSvgOptions } from '@shared/export/designSvg.ts';
import type { DesignProblem } from '@shared/graph/designProblem.ts';
import type { PlanSettings } from '@shared/route/planSettings.ts';
import type { OwnRouteResult } from '@shared/route/routeAnswers.ts';
import type { CornerPairPlan } from '@shared/quilt/cornerCosts.ts';

/** A design for the engine: parsed and validated by the caller, or JSON text the worker parses and validates
 * itself (designSchema), so a heavy design is never parsed on the request thread. */
export type DesignPayload = { readonly design: Design } | { readonly designText: string };

/** Request bodies the design endpoints take (designApi.schema.ts): create, update, draft (check), plan, route. */
export type BodyShape = 'create' | 'update' | 'draft' | 'plan' | 'route';

/**
 * Engine tasks:
 * - `summary`: the figures stored with a saved design (for the designs table);
 * - `check`: route check of the design, of its own `route` if it has one, thread budget, gap check;
 * - `plan`: the planner's route with its figures, the proof of its travel and the stops-vs-travel table; `settings`
 *   (time budget, extra stops, hidden-end allowance) were checked by planSettingsSchema; missing: the defaults;
 * - `ownRoute`: route check of the design's own `route` with drawing strokes (for saving it); the route comes
 *   inside the design, or as JSON text (`routeText`) checked against the design here;
 * - `cornerPair`: one (entry corner, exit corner) pair of a design (design corners, a ≤ b) planned as
 *   shared/quilt/cornerCosts.ts planCornerPair does, with the exact search when `exact` (a planning worker process
 *   sends these one by one so its threads share a whole quilt's pairs);
 * Design codec tasks (the codec pool, never behind planning):
 * - `acceptBody`: parse and validate a heavy request body; the design comes back as canonical JSON text;
 * - `acceptStored`: validate a stored design's JSON text (and build its thumbnail when asked);
 * - `exportSvg`: the print SVG of a design.
 */
export type EngineTask =
  | ({ readonly op: 'summary' } & DesignPayload)
  | ({ readonly op: 'check' } & DesignPayload)
  | ({ readonly op: 'plan'; readonly settings?: PlanSettings } & DesignPayload)
  | ({ readonly op: 'ownRoute'; readonly routeText?: string } & DesignPayload)
  | {
      readonly op: 'cornerPair';
      readonly designText: string;
      readonly a: 0 | 1 | 2 | 3;
      readonly b: 0 | 1 | 2 | 3;
      readonly exact: boolean;
      readonly settings: PlanSettings;
    }
  | { readonly op: 'acceptBody'; readonly text: string; readonly shape: BodyShape }
  | { readonly op: 'acceptStored'; readonly text: string; readonly thumbnail: boolean }
  | { readonly op: 'exportSvg'; readonly designText: string; readonly options: DesignSvgOptions };

/** A zod issue as it crosses the thread boundary: no input values (they may be megabytes of points). */
export interface PlainIssue {
  readonly code: string;
  readonly path: readonly (string | number)[];
  readonly message: string;
  readonly keys?: readonly string[];
}

/** A body the codec read: small fields as parsed, the design (or route) as canonical JSON text. */
export type AcceptBodyAnswer =
  | {
      readonly ok: true;
      readonly fields: Readonly<Record<string, unknown>>;
      readonly designText: string | null;
      /** For create/update bodies: the list thumbnail of the design. */
      readonly thumbnailSvg: string | null;
      readonly routeText: string | null;
    }
  | { readonly ok: false; readonly reason: 'invalid-json' }
  | { readonly ok: false; readonly reason: 'invalid'; readonly issues: readonly PlainIssue[] };

export interface AcceptStoredAnswer {
  readonly designText: string;
  readonly thumbnailSvg: string | null;
}

export type EngineAnswer<T> = { readonly ok: true; readonly value: T } | { readonly ok: false; readonly problem: DesignProblem };

export interface EngineAnswers {
  summary: EngineAnswer<DesignSummary>;
  check: EngineAnswer<CheckResult>;
  plan: EngineAnswer<PlanResult>;
  /** `invalid`: the route sent as text does not fit the block (paths `route.i.j`, as designSchema names them). */
  ownRoute: EngineAnswer<OwnRouteResult> | { readonly ok: false; readonly invalid: readonly PlainIssue[] };
  acceptBody: AcceptBodyAnswer;
  acceptStored: AcceptStoredAnswer;
  exportSvg: string;
  cornerPair: EngineAnswer<CornerPairPlan>;
}
