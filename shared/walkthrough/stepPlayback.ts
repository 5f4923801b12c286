import { assertNever } from '../assertNever.ts';
import { inchesPerUnit, type ThreadSettings, type Units } from '../design/design.schema.ts';
import { THREAD_DEFAULTS } from '../route/threadBudget.ts';

/**
 * Where one step lies on the playback's distance axis (design units from the route's start). `moving` steps
 * (stitch, travel) have `end > start`; start and tie-off steps sit at one point and are shown for a dwell.
 */
export interface StepSpan {
  readonly start: number;
  readonly end: number;
  readonly moving: boolean;
}

/**
 * - `ready`: at the step's start, not played yet;
 * - `playing`: the needle is moving (or a start/tie-off is being shown);
 * - `paused`: stopped inside the step by the quilter (pause, scrub);
 * - `ended`: the step has been played to its end; the card still shows it until the quilter asks for the next.
 */
export type PlaybackPhase = 'ready' | 'playing' | 'paused' | 'ended';

export interface StepPlaybackState {
  /** The step on the card (0-based). */
  readonly step: number;
  /** The needle, design units from the route's start; always inside the current step's span. */
  readonly distance: number;
  /** Playback time spent on a start or tie-off step, ms at 1× (0 for moving steps). */
  readonly dwell: number;
  readonly phase: PlaybackPhase;
  /** Stop at the end of every step (the default): a step's text is never replaced while it plays. */
  readonly pauseAtStepEnd: boolean;
}

export type StepPlaybackEvent =
  /** Play or pause. From `ended` it moves on to the next step and plays it (from the last step: replays it). */
  | { readonly type: 'playPause' }
  | { readonly type: 'pause' }
  /** Time passed while playing: `ms` of playback time (real time × speed), `pace` design units per ms at 1×. */
  | { readonly type: 'tick'; readonly ms: number; readonly pace: number }
  | { readonly type: 'goTo'; readonly step: number }
  | { readonly type: 'replay' }
  | { readonly type: 'jumpToStepEnd' }
  | { readonly type: 'scrub'; readonly distance: number }
  | { readonly type: 'setPauseAtStepEnd'; readonly on: boolean };

/**
 * How long a start or tie-off step is shown while playing, ms at 1×: about the time to take one stitch and pull up
 * the bobbin thread, or to lock the stitches (common practice, no source).
 */
export const DWELL_MS = 2500;

/** Speeds offered beside 1× (real sewing time). */
export const PLAYBACK_SPEEDS = [1, 2, 4] as const;

/**
 * Needle pace at 1×, design units per millisecond: real sewing time at `stitchesPerMinute` and `spi` (the design's
 * thread settings, else the thread budget's defaults). 600 stitches/min at 10 SPI is 1 in/s.
 */
export function findSewingPace(units: Units, thread: ThreadSettings | undefined, stitchesPerMinute?: number): number {
  const spm = stitchesPerMinute ?? thread?.stitchesPerMinute ?? THREAD_DEFAULTS.stitchesPerMinute.value;
  const spi = thread?.spi ?? THREAD_DEFAULTS.spi.value;
  const inchesPerMs = spm / spi / 60_000;
  return inchesPerMs / inchesPerUnit(units);
}

/** The state when a walkthrough opens at `step` (clamped). */
export function startPlayback(spans: readonly StepSpan[], step: number): StepPlaybackState {
  const i = clampStep(spans, step);
  return { step: i, distance: spans[i]?.start ?? 0, dwell: 0, phase: 'ready', pauseAtStepEnd: true };
}

/**
 * The walkthrough player as a pure step function, no clock of its own: the caller feeds `tick`s while `phase` is
 * `playing`. Guarantees (stepPlayback.test.ts): the needle is always inside the current step's span; with
 * `pauseAtStepEnd` the step changes only by the quilter's own events (next/previous/scrub, or Play after a step
 * ended, which moves exactly one step on); `ended` means the needle is at the step's end.
 */
export function stepPlayback(spans: readonly StepSpan[], state: StepPlaybackState, event: StepPlaybackEvent): StepPlaybackState {
  if (spans.length === 0) return state;
  switch (event.type) {
    case 'playPause':
      return playPause(spans, state);
    case 'pause':
      return state.phase === 'playing' ? { ...state, phase: 'paused' } : state;
    case 'tick':
      return state.phase === 'playing' ? advance(spans, state, Math.max(0, event.ms), event.pace) : state;
    case 'goTo':
      return { ...atStepStart(spans, clampStep(spans, event.step)), phase: 'ready', pauseAtStepEnd: state.pauseAtStepEnd };
    case 'replay':
      return { ...atStepStart(spans, state.step), phase: 'playing', pauseAtStepEnd: state.pauseAtStepEnd };
    case 'jumpToStepEnd':
      return { ...state, distance: spans[state.step]!.end, dwell: spans[state.step]!.moving ? 0 : DWELL_MS, phase: 'ended' };
    case 'scrub': {
      const total = spans[spans.length - 1]!.end;
      const distance = Math.min(total, Math.max(0, event.distance));
      const step = findStepAt(spans, distance);
      const span = spans[step]!;
      return { ...state, step, distance: Math.min(span.end, Math.max(span.start, distance)), dwell: 0, phase: 'paused' };
    }
    case 'setPauseAtStepEnd':
      return { ...state, pauseAtStepEnd: event.on };
    default:
      return assertNever(event);
  }
}

function playPause(spans: readonly StepSpan[], state: StepPlaybackState): StepPlaybackState {
  switch (state.phase) {
    case 'playing':
      return { ...state, phase: 'paused' };
    case 'ended': {
      const next = state.step < spans.length - 1 ? state.step + 1 : state.step;
      return { ...atStepStart(spans, next), phase: 'playing', pauseAtStepEnd: state.pauseAtStepEnd };
    }
    case 'ready':
    case 'paused':
      return { ...state, phase: 'playing' };
    default:
      return assertNever(state.phase);
  }
}

/** Moves the needle on by `ms` of playback time; with `pauseAtStepEnd` it stops at the step's end. */
function advance(spans: readonly StepSpan[], state: StepPlaybackState, ms: number, pace: number): StepPlaybackState {
  let { step, distance, dwell } = state;
  let left = ms;
  for (;;) {
    const span = spans[step]!;
    // Time still needed to finish this step.
    const need = span.moving ? (span.end - distance) / pace : DWELL_MS - dwell;
    if (left < need) {
      if (span.moving) distance += left * pace;
      else dwell += left;
      return { ...state, step, distance, dwell, phase: 'playing' };
    }
    left -= need;
    distance = span.end;
    dwell = span.moving ? 0 : DWELL_MS;
    if (state.pauseAtStepEnd || step === spans.length - 1) return { ...state, step, distance, dwell, phase: 'ended' };
    step += 1;
    distance = spans[step]!.start;
    dwell = 0;
  }
}

function atStepStart(spans: readonly StepSpan[], step: number): Pick<StepPlaybackState, 'step' | 'distance' | 'dwell'> {
  return { step, distance: spans[step]!.start, dwell: 0 };
}

function clampStep(spans: readonly StepSpan[], step: number): number {
  return Math.min(Math.max(0, Math.trunc(step)), Math.max(0, spans.length - 1));
}

/**
 * The step a scrubbed needle belongs to: the moving step whose span holds `distance` (a boundary belongs to the
 * step that begins there); the first step at 0 and the last step at the very end.
 */
export function findStepAt(spans: readonly StepSpan[], distance: number): number {
  if (spans.length === 0 || distance <= 0) return 0;
  if (distance >= spans[spans.length - 1]!.end) return spans.length - 1;
  let found = 0;
  spans.forEach((span, i) => {
    if (span.moving && span.start <= distance && distance < span.end) found = i;
  });
  return found;
}
