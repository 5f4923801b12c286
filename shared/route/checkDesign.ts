import type { Design } from '../design/design.schema.ts';
import type { Point } from '../geometry/point.ts';
import type { DesignProblem } from '../graph/designProblem.ts';
import { findOddPoints } from '../graph/oddPoints.ts';
import { findPieces } from '../graph/pieces.ts';
import { ok, type Result } from '../result.ts';
import { planDesign, type DesignPlan, type DesignPlanOptions } from './planDesign.ts';

/** Route check of a design (before any route is drawn). Lengths in the design's units. */
export interface DesignCheck {
  readonly units: Design['units'];
  readonly pieces: number;
  /** Each piece's quilting length and its odd points. */
  readonly pieceDetails: readonly { readonly length: number; readonly oddPoints: number }[];
  readonly oddPoints: { readonly count: number; readonly points: readonly Point[] };
  /** Euler's condition: one piece with 0 or 2 odd points can be stitched in one pass with no travel at all. */
  readonly onePassWithoutTravel: boolean;
  /** Σ over pieces of max(1, odd/2): the fewest passes if the needle may never travel (Euler 1736; Listing). */
  readonly passesWithoutTravel: number;
  /** The fewest passes when travel is allowed: one per group of pieces that travel lines connect. */
  readonly passesWithTravel: number;
  readonly stitchLength: number;
  /** The planner's route and figures for this design. */
  readonly plan: DesignPlan;
}

/** Route check of a design; `options` go to the planner (the exact search's solver, settings). */
export function checkDesign(design: Design, options: DesignPlanOptions = {}): Result<DesignCheck, DesignProblem> {
  const planned = planDesign(design, options);
  if (!planned.ok) return planned;
  const plan = planned.value;
  const { graph } = plan;
  const odd = findOddPoints(graph);
  const isOdd = new Set(odd.map((o) => o.vertex));
  const pieceDetails = findPieces(graph).map((p) => ({ length: p.length, oddPoints: p.vertices.filter((v) => isOdd.has(v)).length }));
  const passesWithoutTravel = pieceDetails.reduce((s, p) => s + Math.max(1, p.oddPoints / 2), 0);
  return ok({
    units: design.units,
    pieces: pieceDetails.length,
    pieceDetails,
    oddPoints: { count: odd.length, points: odd.map((o) => o.point) },
    onePassWithoutTravel: passesWithoutTravel === 1,
    passesWithoutTravel,
    passesWithTravel: plan.passes,
    stitchLength: plan.stitchLength,
    plan,
  });
}
