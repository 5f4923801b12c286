import { bindingBandOf, type Design } from '../design/design.schema.ts';
import type { Point } from '../geometry/point.ts';
import { polylineLength } from '../geometry/polyline.ts';
import { findStrokeDirection } from '../route/strokeDirection.ts';
import { groupSteps, findMainPatch, type StepDraft } from './groupSteps.ts';
import { findLineShape } from './lineShape.ts';
import { buildBlockPlaces, describePlace, findPatchVisits, type BlockPlaces } from './locate.ts';
import { findPatchFaces } from './patchFaces.ts';
import { namePatches } from './patchNames.ts';
import { formatRulerLength } from './rulerLength.ts';
import type { ThreadEnd } from '../route/threadEnds.ts';
import { passEndHints, RESTART_AT_EDGE_HINT, stitchHints, threadEndHint } from './stepHints.ts';
import { joinPoints, patchWords, stitchInstruction, travelText, type TravelPart } from './stepText.ts';
import type { RouteStrokeInput, Step, StepHint, Walkthrough } from './walkthrough.types.ts';

/**
 * Builds the step-by-step walkthrough of a route over a design (both in the design's units).
 * Steps follow the route's order; every stroke lies in exactly one step (see groupSteps); each pass opens with a
 * `start` step and closes with a `tie-off` step. Texts name the patch (faces of the seams and outline, see
 * patchFaces/patchNames), the direction from the quilter's seat (route/strokeDirection), lengths as read off a
 * ruler (rulerLength) and the place where the needle ends up (locate). An empty route gives no steps.
 * `threadEnds` (the planner's, when the route is planned) add why each start and tie-off is where it is.
 * Throws (a caller bug) on a stroke with fewer than 2 points or a non-finite coordinate.
 */
export function buildWalkthrough(
  design: Design,
  route: readonly RouteStrokeInput[],
  threadEnds: readonly Pick<ThreadEnd, 'pass' | 'end' | 'place' | 'reason'>[] = [],
): Walkthrough {
  route.forEach((stroke, i) => {
    if (stroke.points.length < 2 || stroke.points.some(([x, y]) => !Number.isFinite(x) || !Number.isFinite(y))) {
      throw new Error(`walkthrough/buildWalkthrough: stroke ${i} needs at least 2 finite points`);
    }
  });
  const patches = namePatches(findPatchFaces(design), design);
  const places = buildBlockPlaces(design, patches);
  const mainPatch = route.map((s) => (s.kind === 'stitch' ? findMainPatch(findPatchVisits(places, s.points)) : -1));
  const drafts = groupSteps(route, mainPatch);
  const passOrdinal = new Map<number, number>();
  let passCount = 0;
  drafts.forEach((d, i) => {
    if (d.kind === 'start') passOrdinal.set(i, ++passCount);
  });
  const edgeBand = Math.max(bindingBandOf(design), places.near);
  const atEdge = (p: Point): boolean => Math.min(p[0], p[1], design.width - p[0], design.height - p[1]) <= edgeBand;

  let pass = 0;
  let restartHintGiven = false;
  let lastTurnHint = '';
  const steps: Step[] = drafts.map((draft, index) => {
    if (draft.kind === 'start') {
      pass = passOrdinal.get(index)!;
      restartHintGiven = false;
      lastTurnHint = '';
    }
    const common = { index, pass, counter: `Step ${index + 1} of ${drafts.length}`, passCounter: `Pass ${pass} of ${passCount}` };
    const body = describeDraft(draft, route, drafts, index, places, pass, passCount, atEdge);
    const endsMidPass = drafts[index + 1]?.kind !== 'tie-off';
    // A turn hint is given once for a run of straight lines that need the same turn, not on every line.
    const hints: StepHint[] = body.hints.filter((h) => h.kind !== 'turn-block' || h.text !== lastTurnHint);
    if (draft.kind === 'start' || draft.kind === 'tie-off') {
      const end = draft.kind === 'start' ? 'start' : 'tie-off';
      const note = threadEnds.find((t) => t.pass === pass && t.end === end);
      const why = note ? threadEndHint(note) : null;
      if (why) hints.push(why);
    }
    if (draft.kind === 'stitch') lastTurnHint = body.hints.find((h) => h.kind === 'turn-block')?.text ?? '';
    if (draft.kind !== 'start' && draft.kind !== 'tie-off' && endsMidPass && !restartHintGiven && atEdge(body.to)) {
      hints.push(RESTART_AT_EDGE_HINT);
      restartHintGiven = true;
    }
    return { ...common, ...body, kind: draft.kind, strokes: [...draft.strokes], hints };
  });
  return { units: design.units, passes: passCount, steps, patches };
}

type DraftBody = Pick<Step, 'title' | 'instruction' | 'direction' | 'length' | 'lengthText' | 'from' | 'to' | 'patch' | 'hints'>;

function describeDraft(
  draft: StepDraft,
  route: readonly RouteStrokeInput[],
  drafts: readonly StepDraft[],
  index: number,
  places: BlockPlaces,
  pass: number,
  passCount: number,
  atEdge: (p: Point) => boolean,
): DraftBody {
  if (draft.kind === 'start' || draft.kind === 'tie-off') {
    const at = passEndPoint(draft, route, drafts, index);
    const place = describePlace(places, at);
    const none = { direction: null, length: 0, lengthText: '', from: at, to: at, patch: null };
    if (draft.kind === 'start') {
      return {
        ...none,
        title: `Start pass ${pass}`,
        instruction: `Pass ${pass} of ${passCount} starts at ${place}. Lower the needle there, bring the bobbin thread up to the top and take a few tiny stitches to lock the thread.`,
        hints: passEndHints('start', atEdge(at)),
      };
    }
    const lastWords = pass === passCount ? ' That was the last pass: the block is quilted.' : '';
    return {
      ...none,
      title: 'Tie off',
      instruction: `Tie off: pass ${pass} ends at ${place}. Take a few tiny stitches to lock the thread, then cut it.${lastWords}`,
      hints: passEndHints('tie-off', atEdge(at)),
    };
  }
  const lines = draft.strokes.map((i) => route[i]!.points);
  const points = joinPoints(lines);
  const from = points[0]!;
  const to = points[points.length - 1]!;
  if (draft.kind === 'stitch') {
    const shape = findLineShape(points);
    const direction = findStrokeDirection(points);
    const where = patchWords(places, points);
    const length = polylineLength(points);
    return {
      title: 'Stitch',
      instruction: stitchInstruction(places, points, shape, direction, where.words),
      direction,
      length,
      lengthText: formatRulerLength(length, places.units),
      from,
      to,
      patch: where.main,
      hints: stitchHints(shape, direction),
    };
  }
  const parts: TravelPart[] = draft.strokes.map((i) => {
    const kind = route[i]!.kind;
    if (kind === 'stitch') throw new Error('walkthrough/buildWalkthrough: a travel step holds a stitch stroke');
    return { kind, points: route[i]!.points };
  });
  const text = travelText(places, parts);
  return {
    title: text.title,
    instruction: text.instruction,
    direction: findStrokeDirection(points),
    length: text.length,
    lengthText: formatRulerLength(text.length, places.units),
    from,
    to,
    patch: null,
    hints: [],
  };
}

/** Where the needle is at a pass's start (first point of the next step's first stroke) or tie-off (last point of the previous step). */
function passEndPoint(draft: StepDraft, route: readonly RouteStrokeInput[], drafts: readonly StepDraft[], index: number): Point {
  if (draft.kind === 'start') {
    const first = drafts[index + 1]!.strokes[0]!;
    return route[first]!.points[0]!;
  }
  const prev = drafts[index - 1]!;
  const stroke = route[prev.strokes[prev.strokes.length - 1]!]!;
  return stroke.points[stroke.points.length - 1]!;
}
