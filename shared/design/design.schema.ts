import { z } from 'zod';
import { isLineInsideBlock } from './blockBounds.ts';

/**
 * The stored design format (version 1). Everything from outside (request bodies, jsonb read back,
 * local drafts, imported files) is parsed through `designSchema` before the engine sees it.
 * Coordinates are in the design's own `units`; origin top-left, x right, y down (toward the quilter).
 */
export const DESIGN_VERSION = 1 as const;

/** Caps that keep one request from stalling the server; also stated in DEVELOPERS.md. */
export const DESIGN_LIMITS = {
  maxPoints: 200_000,
  maxLines: 20_000,
  maxSide: { in: 120, cm: 305 },
  /** How far outside the block a point may lie before it is refused (a fraction of the longer side). */
  outsideSlack: 0.25,
} as const;

export const unitsSchema = z.enum(['in', 'cm']);
export type Units = z.infer<typeof unitsSchema>;

export const CM_PER_INCH = 2.54;

const coordinate = z.number().finite();
export const pointSchema = z.tuple([coordinate, coordinate]).readonly();
export const polylineSchema = z.array(pointSchema).min(2, 'A line needs at least 2 points.').readonly();

/** Thread-budget settings; every field has a default (see threadBudget.ts for their sources). */
export const threadSettingsSchema = z
  .object({
    /** Stitches per inch. */
    spi: z.number().finite().min(4).max(30).optional(),
    /** Quilt sandwich thickness in inches (top + batting + backing, compressed under the foot). */
    sandwichThickness: z.number().finite().min(0).max(1).optional(),
    /** Thread tail left at each tie-off, per thread (top and bobbin), in inches. */
    tieOffTail: z.number().finite().min(0).max(12).optional(),
    /** Bobbin capacity in yards. */
    bobbinCapacity: z.number().finite().positive().max(1000).optional(),
    /** Sewing speed in stitches per minute. */
    stitchesPerMinute: z.number().finite().positive().max(3000).optional(),
    /** Widest spacing the batting allows between quilting lines, in design units. */
    battingSpacing: z.number().finite().positive().optional(),
  })
  .strict();
export type ThreadSettings = z.infer<typeof threadSettingsSchema>;

export const designSchema = z
  .object({
    version: z.literal(DESIGN_VERSION),
    units: unitsSchema,
    width: z.number().finite().positive(),
    height: z.number().finite().positive(),
    seams: z.array(polylineSchema).readonly(),
    lines: z.array(polylineSchema).readonly(),
    start: pointSchema.optional(),
    end: pointSchema.optional(),
    edgeTravel: z.boolean().default(true),
    /** Width of the binding band along the edge, in design units (default 1/8 in). */
    bindingBand: z.number().finite().positive().optional(),
    thread: threadSettingsSchema.optional(),
    /** A quilter's own stitching order: polylines in the order they are sewn. */
    route: z.array(polylineSchema).readonly().optional(),
  })
  .strict()
  .superRefine((design, ctx) => {
    const maxSide = DESIGN_LIMITS.maxSide[design.units];
    if (design.width > maxSide) ctx.addIssue({ code: 'custom', path: ['width'], message: `Width can be at most ${maxSide} ${design.units}.` });
    if (design.height > maxSide) ctx.addIssue({ code: 'custom', path: ['height'], message: `Height can be at most ${maxSide} ${design.units}.` });
    const slack = DESIGN_LIMITS.outsideSlack * Math.max(design.width, design.height);
    let points = 0;
    const groups = [['seams', design.seams], ['lines', design.lines], ['route', design.route ?? []]] as const;
    for (const [name, group] of groups) {
      if (group.length > DESIGN_LIMITS.maxLines) {
        ctx.addIssue({ code: 'custom', path: [name], message: `${LINE_WORDS[name]}s: at most ${DESIGN_LIMITS.maxLines.toLocaleString('en-GB')} in one design.` });
      }
      group.forEach((line, i) => {
        points += line.length;
        const far = line.findIndex(([x, y]) => x < -slack || y < -slack || x > design.width + slack || y > design.height + slack);
        if (far >= 0) ctx.addIssue({ code: 'custom', path: [name, i, far], message: `${LINE_WORDS[name]} ${i + 1} has a point far outside the block.` });
        if (!hasTwoDistinctPoints(line)) ctx.addIssue({ code: 'custom', path: [name, i], message: `${LINE_WORDS[name]} ${i + 1} needs two different points.` });
      });
    }
    if (points > DESIGN_LIMITS.maxPoints) {
      ctx.addIssue({ code: 'custom', path: [], message: `The drawing has ${points.toLocaleString('en-GB')} points; a design may have at most ${DESIGN_LIMITS.maxPoints.toLocaleString('en-GB')}.` });
    }
  });

/** Each line list in words, for messages. */
const LINE_WORDS = { seams: 'Seam line', lines: 'Quilting line', route: 'Stitching order stroke' } as const;

/**
 * Largest batting spacing limit accepted, per design unit. From memory, not a cited source: batting packages state
 * spacings from about 2 in to about 10 in between quilting lines; 12 in (30.5 cm) leaves room above the widest we
 * recall and refuses typing slips such as 99,999 in.
 */
export const BATTING_SPACING_MAX = { in: 12, cm: 30.5 } as const;

/**
 * What the server takes in a new or saved design and the workbench lets through (stored designs are read with the
 * laxer `designSchema`, so an older drawing still opens): the batting spacing limit within BATTING_SPACING_MAX and
 * every quilting line and stitching-order stroke inside the block (shared/design/blockBounds.ts).
 */
export const designInputSchema = designSchema.superRefine((design, ctx) => {
  const battingMax = BATTING_SPACING_MAX[design.units];
  if ((design.thread?.battingSpacing ?? 0) > battingMax) {
    ctx.addIssue({ code: 'custom', path: ['thread', 'battingSpacing'], message: `Batting spacing limit can be at most ${battingMax} ${design.units}; check the spacing printed on your batting's package.` });
  }
  for (const name of ['lines', 'route'] as const) {
    (design[name] ?? []).forEach((line, i) => {
      if (!isLineInsideBlock(line, design)) {
        ctx.addIssue({ code: 'custom', path: [name, i], message: `${LINE_WORDS[name]} ${i + 1} runs outside the block; quilting lines stay inside the ${design.width} × ${design.height} ${design.units} block.` });
      }
    });
  }
});

/** A validated design as the engine uses it (defaults applied). */
export type Design = z.infer<typeof designSchema>;
/** A design as it may arrive (defaults not yet applied). */
export type DesignInput = z.input<typeof designSchema>;

function hasTwoDistinctPoints(line: readonly (readonly [number, number])[]): boolean {
  const [x0, y0] = line[0]!;
  return line.some(([x, y]) => x !== x0 || y !== y0);
}

/** The binding band width in the design's units (default 1/8 in). */
export function bindingBandOf(design: Pick<Design, 'units' | 'bindingBand'>): number {
  return design.bindingBand ?? (design.units === 'in' ? 0.125 : 0.125 * CM_PER_INCH);
}

/** Factor that turns the design's units into inches. */
export function inchesPerUnit(units: Units): number {
  return units === 'in' ? 1 : 1 / CM_PER_INCH;
}
