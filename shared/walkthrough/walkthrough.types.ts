import type { Units } from '../design/design.schema.ts';
import type { Point } from '../geometry/point.ts';
import type { StrokeDirection } from '../route/strokeDirection.ts';
import type { StrokePath } from '../contract/strokes.ts';
import type { NamedPatch } from './patchNames.ts';

/** What the walkthrough reads of a route's stroke (shared/contract/strokes.ts). */
export type RouteStrokeInput = Pick<StrokePath, 'pass' | 'kind' | 'points'>;

/**
 * What a step asks of the quilter:
 * - `start`: put the needle down where a pass begins (no strokes);
 * - `stitch`: sew quilting lines (stitch strokes);
 * - `travel`: move the needle along lines already there (retrace, ditch or edge strokes);
 * - `tie-off`: a pass ends here (no strokes).
 */
export type StepKind = 'start' | 'stitch' | 'travel' | 'tie-off';

/** Why a hint is given; each hint's text says where the practice comes from in code, not on screen. */
export type StepHintKind = 'turn-block' | 'keep-block-still' | 'stop-at-edge' | 'hide-tails' | 'why-here';

export interface StepHint {
  readonly kind: StepHintKind;
  readonly text: string;
}

/** One move of the walkthrough. */
export interface Step {
  /** 0-based position in `steps`. */
  readonly index: number;
  readonly kind: StepKind;
  readonly pass: number;
  /** Indices into the route, consecutive and ascending; every stroke is in exactly one step. Empty for start/tie-off. */
  readonly strokes: readonly number[];
  /** Short heading: "Start pass 1", "Stitch", "Retrace", "Travel in the ditch", "Tie off". */
  readonly title: string;
  /** The plain-language instruction, one or two sentences. */
  readonly instruction: string;
  /** "Step 7 of 23". */
  readonly counter: string;
  /** "Pass 1 of 2". */
  readonly passCounter: string;
  /** Overall direction for the quilter (see route/strokeDirection); null for start and tie-off. */
  readonly direction: StrokeDirection | null;
  /** Length sewn or travelled in this step, design units (0 for start and tie-off). */
  readonly length: number;
  /** The length as read off a ruler ("2 3/4 in"); empty for start and tie-off. */
  readonly lengthText: string;
  /** Needle position when the step begins and when it ends (design units). */
  readonly from: Point;
  readonly to: Point;
  /** Name of the patch most of the step lies in, if one holds most of it. */
  readonly patch: string | null;
  readonly hints: readonly StepHint[];
}

export interface Walkthrough {
  readonly units: Units;
  readonly passes: number;
  readonly steps: readonly Step[];
  /** The block's patches as found from its seams, with their names (for drawing and labels). */
  readonly patches: readonly NamedPatch[];
}
