// POST /api/quilts/:id/plan (200 at once from cached corner costs, else 202 and a job a planning worker runs): the chained route of a quilt whose top is quilted in one piece (shared/quilt/quiltRoute.ts
// planQuiltRoute, run in the engine's worker pool): the quilting order, each block's entry and exit corner, the
// travel inside the blocks and along the links, the proof of that travel and the whole quilt's budget.
// Lengths in the quilt's units; thread in yards.
import { z } from 'zod';
import { unitsSchema } from '../design/design.schema.ts';
import { cellSchema } from '../quilt/quilt.schema.ts';
import { problemDetailSchema } from './errors.ts';
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

/** States of a whole-quilt plan run by a planning worker: waiting for a worker, being planned, planned, given up. */
export const QUILT_PLAN_JOB_STATES = ['queued', 'running', 'done', 'failed'] as const;

/**
 * A whole-quilt plan being made by a planning worker (POST /api/quilts/:id/plan answers 202 with it; GET
 * /api/quilts/:id/plan-jobs/:jobId reads it). `done` / `total` count corner-pair plans; `total` grows while the
 * exact search finds pairs to prove, and is 0 until the worker has looked at the cache.
 */
export const quiltPlanJobSchema = z.object({
  id: z.string(),
  quiltVersion: z.number().int().positive(),
  state: z.enum(QUILT_PLAN_JOB_STATES),
  done: z.number().int().min(0),
  total: z.number().int().min(0),
  /** Why a failed job gave up, as an error body's detail (a 400's `fields` name the cell). */
  failure: problemDetailSchema.nullable(),
});
export type QuiltPlanJob = Wire<z.infer<typeof quiltPlanJobSchema>>;

/** 202: the plan is being made; poll `job`. */
export const quiltPlanQueuedSchema = z.object({ quiltVersion: z.number().int().positive(), job: quiltPlanJobSchema });
export type QuiltPlanQueued = Wire<z.infer<typeof quiltPlanQueuedSchema>>;

/** GET answer: the job, and its plan once it is done. */
export const quiltPlanJobAnswerSchema = z.object({ job: quiltPlanJobSchema, plan: quiltPlanSchema.nullable() });
export type QuiltPlanJobAnswer = Wire<z.infer<typeof quiltPlanJobAnswerSchema>>;
