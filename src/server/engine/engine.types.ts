// What crosses the worker boundary: plain, structured-clonable data only.
// The main thread validates every design (designSchema) before it sends a task.
import type { Design } from '@shared/design/design.schema.ts';
import type { DesignSvgOptions } from '@shared/export/designSvg.ts';
import type { Point } from '@shared/geometry/point.ts';
import type { DesignProblem } from '@shared/graph/designProblem.ts';
import type { GapCheck } from '@shared/gap/gapCheck.ts';
import type { DesignCheck } from '@shared/route/checkDesign.ts';
import type { PlanSettings } from '@shared/route/planSettings.ts';
import type { StopsTableRow } from '@shared/route/stopsTable.ts';
import type { ThreadEnd } from '@shared/route/threadEnds.ts';
import type { RouteCheck } from '@shared/route/checkRoute.ts';
import type { ThreadBudget } from '@shared/route/threadBudget.ts';
import type { Stroke } from '@shared/route/routeStrokes.ts';

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

/** Figures of a route (planned or the quilter's own), lengths in the design's units. */
export interface RouteFigures {
  readonly passes: number;
  readonly stops: number;
  readonly pieces: number;
  readonly oddPoints: number;
  readonly stitchLength: number;
  readonly travelLength: number;
  readonly retraceLength: number;
  readonly ditchLength: number;
  readonly edgeLength: number;
}

/** Planner figures: route figures plus the proof status of its travel. */
export interface PlanFigures extends RouteFigures {
  /** No route with this many passes has less travel than this (design units). */
  readonly travelLowerBound: number;
  /** True when the travel is proven least. */
  readonly optimal: boolean;
}

/** Stored with a design for the designs table (jsonb `design.summary`). */
export interface DesignSummary extends PlanFigures {
  readonly units: Design['units'];
  readonly thread: { readonly totalYards: number; readonly topYards: number; readonly bobbinYards: number; readonly bobbins: number; readonly stitches: number; readonly minutes: number };
}

/** Route check of a design as the API returns it (no planar graph, no strokes). */
export type DesignCheckReport = Omit<DesignCheck, 'plan'>;

export interface CheckAnswer {
  readonly check: DesignCheckReport;
  /** The planned route's figures and thread budget (what the planner would achieve). */
  readonly plan: PlanFigures;
  readonly threadBudget: ThreadBudget;
  /** Route check of the design's own `route`; null when it has none. */
  readonly ownRoute: RouteCheck | null;
  /** Widest empty spot vs the batting's spacing limit; null if the gap search refused the design. */
  readonly gap: GapCheck | null;
}

/** A stroke as saved and drawn: one kind, one pass, its polyline and length (design units). */
export interface RouteStroke {
  readonly pass: number;
  readonly kind: Stroke['kind'];
  readonly points: readonly Point[];
  readonly length: number;
}

export interface OwnRouteAnswer {
  readonly check: RouteCheck;
  readonly strokes: readonly RouteStroke[];
}

export interface PlanAnswer extends PlanFigures {
  readonly units: Design['units'];
  readonly route: readonly Stroke[];
  readonly threadBudget: ThreadBudget;
  /** The same bound as `travelLowerBound` (design units), under the name the planner's answer uses. */
  readonly lowerBound: number;
  /** (travel − lower bound) / travel in percent: 0 when proven; how far from best the route may be otherwise. */
  readonly gapPercent: number;
  /** Least travel for 0–3 extra stops (each row proven or with its bound). */
  readonly stopsTable: readonly StopsTableRow[];
  /** Every pass's start and tie-off: where it is (edge, seam, open) and why it is there. */
  readonly threadEnds: readonly ThreadEnd[];
  /** The settings the plan was made with (defaults filled in). */
  readonly settings: PlanSettings;
  /** The exact search's figures: kept vertices of the reduced graph, time spent (ms); null when not needed. */
  readonly exactSearch: { readonly keptVertices: number; readonly ms: number } | null;
}

export type EngineAnswer<T> = { readonly ok: true; readonly value: T } | { readonly ok: false; readonly problem: DesignProblem };

export interface EngineAnswers {
  summary: EngineAnswer<DesignSummary>;
  check: EngineAnswer<CheckAnswer>;
  plan: EngineAnswer<PlanAnswer>;
  /** `invalid`: the route sent as text does not fit the block (paths `route.i.j`, as designSchema names them). */
  ownRoute: EngineAnswer<OwnRouteAnswer> | { readonly ok: false; readonly invalid: readonly PlainIssue[] };
  acceptBody: AcceptBodyAnswer;
  acceptStored: AcceptStoredAnswer;
  exportSvg: string;
}
