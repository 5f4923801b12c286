import { z } from 'zod';
import type { DesignCommand } from './commands.ts';
import { DESIGN_LIMITS, designSchema, pointSchema, polylineSchema, threadSettingsSchema, unitsSchema } from './design.schema.ts';

/**
 * `DesignCommand` as it comes back from outside (queued edits kept in localStorage, read as `unknown`).
 * It checks the shape and what a command promises on its own: finite numbers, whole non-negative
 * indices, lines of at least 2 points, distinct delete indices, insert entries in ascending order, two
 * different lines to join, a positive block size and binding band, a design that `designSchema` accepts,
 * and the design's caps on line and point counts. Whether an index exists in a given design is for
 * `applyCommand` to decide when the command is replayed.
 */
export const designCommandSchema: z.ZodType<DesignCommand> = z.lazy(() => commandUnion);

const index = z.number().int().min(0);
const target = z.enum(['lines', 'seams']);
const lines = z.array(polylineSchema).max(DESIGN_LIMITS.maxLines).refine((ls) => pointCount(ls) <= DESIGN_LIMITS.maxPoints, {
  message: `more than ${DESIGN_LIMITS.maxPoints} points`,
});
const indexedLine = z.object({ index, line: polylineSchema }).strict();
const entries = z.array(indexedLine).max(DESIGN_LIMITS.maxLines).refine((es) => pointCount(es.map((e) => e.line)) <= DESIGN_LIMITS.maxPoints, {
  message: `more than ${DESIGN_LIMITS.maxPoints} points`,
});
const indices = z.array(index).max(DESIGN_LIMITS.maxLines).refine((is) => new Set(is).size === is.length, { message: 'indices must be distinct' });
const finite = z.number().finite();

/** One schema per kind; the mapped type makes the compiler demand every kind, each with its exact output. */
const variants = {
  addLines: z.object({ kind: z.literal('addLines'), target, lines }).strict(),
  insertLines: z
    .object({ kind: z.literal('insertLines'), target, entries })
    .strict()
    .refine((c) => c.entries.every((e, i) => i === 0 || e.index > c.entries[i - 1]!.index), {
      message: 'insert entries must be in ascending index order',
      path: ['entries'],
    }),
  deleteLines: z.object({ kind: z.literal('deleteLines'), target, indices }).strict(),
  moveLines: z.object({ kind: z.literal('moveLines'), target, indices, dx: finite, dy: finite }).strict(),
  replaceLines: z.object({ kind: z.literal('replaceLines'), target, entries }).strict(),
  splitLine: z.object({ kind: z.literal('splitLine'), target, index, segment: index, point: pointSchema }).strict(),
  joinLines: z
    .object({ kind: z.literal('joinLines'), target, first: index, second: index, reverseFirst: z.boolean(), reverseSecond: z.boolean() })
    .strict()
    .refine((c) => c.first !== c.second, { message: 'cannot join a line to itself', path: ['second'] }),
  setStart: z.object({ kind: z.literal('setStart'), point: pointSchema.nullable() }).strict(),
  setEnd: z.object({ kind: z.literal('setEnd'), point: pointSchema.nullable() }).strict(),
  setSize: z.object({ kind: z.literal('setSize'), width: finite.positive(), height: finite.positive() }).strict(),
  convertUnits: z.object({ kind: z.literal('convertUnits'), units: unitsSchema }).strict(),
  replaceDesign: z.object({ kind: z.literal('replaceDesign'), design: designSchema }).strict(),
  setEdgeTravel: z.object({ kind: z.literal('setEdgeTravel'), value: z.boolean() }).strict(),
  setBindingBand: z.object({ kind: z.literal('setBindingBand'), value: finite.positive().nullable() }).strict(),
  setThread: z.object({ kind: z.literal('setThread'), thread: threadSettingsSchema.nullable() }).strict(),
  setRoute: z.object({ kind: z.literal('setRoute'), route: lines.nullable() }).strict(),
  batch: z
    .object({ kind: z.literal('batch'), commands: z.array(z.lazy(() => designCommandSchema)).max(DESIGN_LIMITS.maxLines) })
    .strict(),
} satisfies { [K in DesignCommand['kind']]: z.ZodType<Extract<DesignCommand, { kind: K }>> };

const commandUnion = z.discriminatedUnion('kind', [
  variants.addLines,
  variants.insertLines,
  variants.deleteLines,
  variants.moveLines,
  variants.replaceLines,
  variants.splitLine,
  variants.joinLines,
  variants.setStart,
  variants.setEnd,
  variants.setSize,
  variants.convertUnits,
  variants.replaceDesign,
  variants.setEdgeTravel,
  variants.setBindingBand,
  variants.setThread,
  variants.setRoute,
  variants.batch,
]);

function pointCount(ls: readonly (readonly unknown[])[]): number {
  return ls.reduce((sum, l) => sum + l.length, 0);
}
