// What a copy of a template version keeps besides the drawing. A version carries one route and that route's
// figures (shared/contract/figures.ts savedRouteSummarySchema), which are either the planner's (a planned route:
// `optimal` true/false, `travelLowerBound` set) or those of the teacher's own stitching order (`optimal: null`, no
// lower bound). The copy's two stores differ:
// - design.summary (the designs table) always holds the planner's figures for the drawing (designSummarySchema);
//   a planned route's figures are exactly that, an own order's are not, so those are computed by the engine;
// - design_route holds the route itself, kept with its kind ('own' when the figures carry no proof status).
// Anything that does not fit the stored shapes is left out rather than written half-valid.
import type { DesignRouteKind } from '@db/schema.ts';
import { designSummarySchema, savedRouteSummarySchema, type DesignSummary, type SavedRouteSummary } from '@shared/contract/figures.ts';
import { strokePathsSchema, type StrokePath } from '@shared/contract/strokes.ts';

export interface CopiedRoute {
  readonly kind: DesignRouteKind;
  readonly strokes: readonly StrokePath[];
  readonly summary: SavedRouteSummary;
}

/** The version's route as a design_route row, or null when its strokes or figures are not in the saved-route shape. */
export function copiedRoute(route: unknown, figures: unknown): CopiedRoute | null {
  const strokes = strokePathsSchema.safeParse(route);
  const summary = savedRouteSummarySchema.safeParse(figures);
  if (!strokes.success || !summary.success || strokes.data.length === 0) return null;
  return { kind: summary.data.optimal === null ? 'own' : 'planned', strokes: strokes.data, summary: summary.data };
}

/**
 * The planner's figures for the copied drawing when the version's own figures are the planner's (a planned route);
 * otherwise null, and the engine computes them after the copy is saved (designDerive.ts), as for any save.
 */
export function copiedDesignSummary(figures: unknown): DesignSummary | null {
  const planned = designSummarySchema.safeParse(figures);
  return planned.success ? planned.data : null;
}
