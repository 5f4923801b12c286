import type { PatchVisit } from './locate.ts';
import type { RouteStrokeInput, StepKind } from './walkthrough.types.ts';

/** A step before it has words: its kind, pass and strokes. */
export interface StepDraft {
  readonly kind: StepKind;
  readonly pass: number;
  readonly strokes: number[];
}

/**
 * Groups a route's strokes into moves, in stitching order. A pass begins with a `start` step and ends with a
 * `tie-off` step (a pass ends wherever the next stroke's pass number differs). Within a pass, consecutive
 * travel strokes (retrace, ditch, edge) form one `travel` step: to the quilter they are one move of the
 * needle to the next place to stitch. Consecutive stitch strokes form one `stitch` step while they run on
 * from one another (end point = next start point) and stay in the same main patch (`mainPatch`, -1 for none);
 * a planner's route already merges a pass's stitching between travels into one stroke.
 * Guarantee: every stroke index appears in exactly one draft, in ascending order.
 */
export function groupSteps(route: readonly RouteStrokeInput[], mainPatch: readonly number[]): StepDraft[] {
  const drafts: StepDraft[] = [];
  let current: StepDraft | null = null;
  route.forEach((stroke, i) => {
    const prev = i > 0 ? route[i - 1]! : null;
    if (prev === null || prev.pass !== stroke.pass) {
      if (prev !== null) drafts.push({ kind: 'tie-off', pass: prev.pass, strokes: [] });
      drafts.push({ kind: 'start', pass: stroke.pass, strokes: [] });
      current = null;
    }
    const kind: StepKind = stroke.kind === 'stitch' ? 'stitch' : 'travel';
    if (current !== null && current.kind === kind && (kind === 'travel' || continuesStitch(route, current, i, mainPatch))) {
      current.strokes.push(i);
      return;
    }
    current = { kind, pass: stroke.pass, strokes: [i] };
    drafts.push(current);
  });
  const last = route[route.length - 1];
  if (last) drafts.push({ kind: 'tie-off', pass: last.pass, strokes: [] });
  return drafts;
}

function continuesStitch(route: readonly RouteStrokeInput[], draft: StepDraft, i: number, mainPatch: readonly number[]): boolean {
  const lastIndex = draft.strokes[draft.strokes.length - 1]!;
  const end = route[lastIndex]!.points[route[lastIndex]!.points.length - 1]!;
  const start = route[i]!.points[0]!;
  return end[0] === start[0] && end[1] === start[1] && mainPatch[lastIndex] === mainPatch[i] && mainPatch[i] !== -1;
}

/**
 * The patch holding at least `share` of a line's length inside patches (default 2/3), or -1 when no one patch
 * does (the line wanders across several).
 */
export function findMainPatch(visits: readonly PatchVisit[], share = 2 / 3): number {
  const totals = new Map<number, number>();
  let all = 0;
  for (const v of visits) {
    totals.set(v.patch, (totals.get(v.patch) ?? 0) + v.length);
    all += v.length;
  }
  for (const [patch, length] of totals) if (all > 0 && length >= share * all) return patch;
  return -1;
}
