import type { Design, Units } from '../design/design.schema.ts';
import { polylineLength } from '../geometry/polyline.ts';
import { computeThreadBudget, type ThreadBudget } from '../route/threadBudget.ts';
import type { ThreadEnd } from '../route/threadEnds.ts';
import { convertLength } from '../units/units.ts';
import { convertDesign, convertStrokes } from '../units/convertDesign.ts';
import { buildWalkthrough } from '../walkthrough/buildWalkthrough.ts';
import { findSafetyCautions, type SafetyCaution } from '../walkthrough/safetyCautions.ts';
import type { RouteStrokeInput, Walkthrough } from '../walkthrough/walkthrough.types.ts';
import { findStepMarks, type StepMark } from './stepMarks.ts';

/** Everything a printed block page shows, in the viewer's units. */
export interface BlockSheet {
  readonly title: string;
  /** The design redrawn in the viewer's units. */
  readonly design: Design;
  readonly route: readonly RouteStrokeInput[];
  readonly walkthrough: Walkthrough;
  readonly marks: readonly StepMark[];
  /** The block's thread budget (threadBudget.ts's model, the design's own settings), lengths in the viewer's units. */
  readonly budget: ThreadBudget;
  readonly stitchLength: number;
  readonly travelLength: number;
  readonly cautions: readonly SafetyCaution[];
  /** Lines about where the route comes from or where the block is used ("Row 1, column 2, turned 90°"). */
  readonly notes: readonly string[];
}

export interface BlockSheetInput {
  readonly title: string;
  readonly design: Design;
  /** The route in the design's units (the route contract's strokes). */
  readonly route: readonly RouteStrokeInput[];
  readonly viewerUnits: Units;
  /** Words of the lesson or plan around the block: they decide which cautions beyond the needle apply. */
  readonly texts?: readonly string[];
  readonly threadEnds?: readonly Pick<ThreadEnd, 'pass' | 'end' | 'place' | 'reason'>[];
  readonly notes?: readonly string[];
}

/**
 * Builds a block's printed sheet from its design and route: the walkthrough's steps (buildWalkthrough) and the step
 * marks over the drawing, the thread budget over everything the route sews (stitching and travel) with the design's
 * thread settings, and the safety cautions for the words around it. The walkthrough is built in the viewer's units,
 * so every length on the page reads in them.
 */
export function buildBlockSheet(input: BlockSheetInput): BlockSheet {
  const { viewerUnits: units } = input;
  const design = convertDesign(input.design, units);
  const route = convertStrokes(input.route, input.design.units, units);
  const walkthrough = buildWalkthrough(design, route, input.threadEnds ?? []);
  let stitchLength = 0;
  let travelLength = 0;
  let passes = 0;
  for (const s of route) {
    const length = polylineLength(s.points);
    if (s.kind === 'stitch') stitchLength += length;
    else travelLength += length;
    passes = Math.max(passes, s.pass);
  }
  const budget = computeThreadBudget(stitchLength + travelLength, passes, units, design.thread ?? {});
  const words = [...(input.texts ?? []), ...walkthrough.steps.map((s) => s.instruction)];
  return {
    title: input.title,
    design,
    route,
    walkthrough,
    marks: findStepMarks(walkthrough, route),
    budget,
    stitchLength,
    travelLength,
    cautions: findSafetyCautions(words),
    notes: input.notes ?? [],
  };
}

/** Block width and height in points at true size (the drawing's own units, 72 pt to the inch). */
export function blockSizeInPoints(design: Pick<Design, 'width' | 'height' | 'units'>): { width: number; height: number } {
  const k = convertLength(1, design.units, 'in') * 72;
  return { width: design.width * k, height: design.height * k };
}
