import { z } from 'zod';
import { designSchema, type Design } from '../design/design.schema.ts';
import type { Polyline } from '../geometry/point.ts';
import { err, ok, type Result } from '../result.ts';
import { findPatchFaces, type PatchFace } from '../walkthrough/patchFaces.ts';
import { generateMotif, motifParamsSchema } from './motifs.ts';

/**
 * A fills file: which motif goes into which patch. `patch` is "all" or a patch number from
 * `patchesInReadingOrder` (0 = the top-left patch); `motif` is the motif panel's parameters, tagged by `kind`.
 */
export const fillsSchema = z
  .object({
    fills: z
      .array(
        z
          .object({
            patch: z.union([z.literal('all'), z.number().int().min(0)]),
            motif: motifParamsSchema,
          })
          .strict(),
      )
      .min(1, 'list at least one fill'),
  })
  .strict();
export type Fills = z.output<typeof fillsSchema>;

/** Why a fill could not be made; `path` names the field (e.g. "fills.2.patch"). */
export interface FillProblem {
  readonly path: string;
  readonly message: string;
}

/**
 * The design's patches — faces of its seams and the block edge (walkthrough/patchFaces) — numbered in
 * reading order: by their centre, top to bottom, then left to right (centres within a millionth of the
 * block of the same height count as one row).
 */
export function patchesInReadingOrder(design: Design): PatchFace[] {
  const row = 1e-6 * Math.max(design.width, design.height);
  return findPatchFaces(design).sort((a, b) => (Math.abs(a.centroid[1] - b.centroid[1]) > row ? a.centroid[1] - b.centroid[1] : a.centroid[0] - b.centroid[0]));
}

/**
 * Adds each fill's motif lines to the design's quilting lines, in the order the fills are listed (a patch
 * named twice gets both motifs). Returns the new design, checked by `designSchema` (so its caps hold), or the
 * first problem found.
 */
export function fillDesign(design: Design, fills: Fills): Result<Design, FillProblem> {
  const patches = patchesInReadingOrder(design);
  const added: Polyline[] = [];
  for (const [i, fill] of fills.fills.entries()) {
    if (fill.patch !== 'all' && fill.patch >= patches.length) {
      return err({ path: `fills.${i}.patch`, message: `there is no patch ${fill.patch}: the design has ${patches.length} patches, numbered 0 to ${patches.length - 1}` });
    }
    const targets = fill.patch === 'all' ? patches : [patches[fill.patch]!];
    for (const patch of targets) {
      const made = generateMotif(patch.polygon, fill.motif);
      if (!made.ok) {
        const e = made.error;
        const detail = e.kind === 'invalid-params' ? e.issues.map((x) => `${x.path}: ${x.message}`).join('; ') : e.kind;
        return err({ path: `fills.${i}.motif`, message: `the motif does not fit patch ${patches.indexOf(patch)}: ${detail}` });
      }
      added.push(...made.value.lines);
    }
  }
  const parsed = designSchema.safeParse({ ...design, lines: [...design.lines, ...added] });
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    return err({ path: `fills (design ${issue.path.join('.') || 'size'})`, message: `the filled design is refused: ${issue.message}` });
  }
  return ok(parsed.data);
}
