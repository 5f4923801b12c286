// POST /api/quilts/:id/plan: the chained route of a quilt whose top is quilted in one piece (shared/quilt/quiltRoute.ts
// planQuiltRoute, run in the engine's worker pool): the quilting order, each block's entry and exit corner, the
// travel inside the blocks and along the links, the proof of that travel and the whole quilt's budget.
// Lengths in the quilt's units; thread in yards.
import { z } from 'zod';
import { unitsSchema } from '../design/design.schema.ts';
import { cellSchema } from '../quilt/quilt.schema.ts';
import type { Wire } from './wire.ts';

/** Corners clockwise from the block's top left as it sits in the quilt (shared/quilt/cornerMap.ts). */
const cornerSchema = z.union([z.literal(0), z.literal(1), z.literal(2), z.literal(3)]);
const figure = z.number();

export const quiltPlanStepSchema = z.object({
  cell: cellSchema,
  entry: cornerSchema,
  exit: cornerSchema,
  /** Travel inside the block for this entry and exit. */
  blockCost: figure,
  /** Travel from the previous block's exit to this entry (0 for the first block). */
  linkBefore: figure,
});

export const quiltPlanSchema = z.object({
  units: unitsSchema,
  steps: z.array(quiltPlanStepSchema),
  blockTravel: figure,
  linkTravel: figure,
  /** blockTravel + linkTravel. */
  totalTravel: figure,
  /** No choice of corners costs less than this; equal to totalTravel (within rounding) when `proven`. */
  lowerBound: figure,
  proven: z.boolean(),
  passes: figure,
  stops: figure,
  stitchLength: figure,
  stitchCount: figure,
  topThreadYards: figure,
  bobbinThreadYards: figure,
  bobbins: figure,
  sewingMinutes: figure,
  /** Where the budget's numbers come from (threadBudget.ts) and how links are counted (quiltBudget.ts). */
  assumptions: z.array(z.object({ setting: z.string(), value: z.union([figure, z.string()]), source: z.string() })),
  linkModel: z.string(),
});
export type QuiltPlan = Wire<z.infer<typeof quiltPlanSchema>>;

/** The answer: the plan of the quilt at `quiltVersion`. */
export const quiltPlanAnswerSchema = z.object({ quiltVersion: z.number().int().positive(), plan: quiltPlanSchema });
export type QuiltPlanAnswer = Wire<z.infer<typeof quiltPlanAnswerSchema>>;
