import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import type { ThreadSettings, Units } from '@shared/design/design.schema.ts';
import { THREAD_DEFAULTS } from '@shared/route/threadBudget.ts';
import {
  findSewingPace, PLAYBACK_SPEEDS, startPlayback, stepPlayback,
  type PlaybackPhase, type StepPlaybackEvent, type StepSpan,
} from '@shared/walkthrough/stepPlayback.ts';
import type { Step } from '@shared/walkthrough/walkthrough.types.ts';
import { buildPlayback, needleAt, type NeedlePosition, type RouteStroke } from '../route/routePlayback.ts';
import { buildStepSpans } from './stepTimeline.ts';

export type PlaybackSpeed = (typeof PLAYBACK_SPEEDS)[number];

export interface StepPlayer {
  readonly stepIndex: number;
  readonly phase: PlaybackPhase;
  readonly spans: readonly StepSpan[];
  /** Needle distance from the route's start and the route's whole length, design units. */
  readonly distance: number;
  readonly total: number;
  readonly needle: NeedlePosition | null;
  readonly pauseAtStepEnd: boolean;
  /** 1× is real sewing time at `stitchesPerMinute`. */
  readonly speed: PlaybackSpeed;
  readonly stitchesPerMinute: number;
  setPauseAtStepEnd(on: boolean): void;
  setSpeed(speed: PlaybackSpeed): void;
  setStitchesPerMinute(spm: number): void;
  goTo(index: number): void;
  playPause(): void;
  replay(): void;
  jumpToStepEnd(): void;
  scrub(distance: number): void;
  changeSpeed(direction: 1 | -1): void;
}

/**
 * The walkthrough's player: the pure machine in shared/walkthrough/stepPlayback.ts, fed animation frames while it
 * plays. This hook only keeps its state, turns frames into `tick`s (real ms × speed at the sewing pace) and draws
 * the needle where the machine says.
 */
export function useStepPlayer(steps: readonly Step[], strokes: readonly RouteStroke[], units: Units, thread: ThreadSettings | undefined, initialStep: number): StepPlayer {
  const playback = useMemo(() => buildPlayback(strokes), [strokes]);
  const spans = useMemo(() => buildStepSpans(steps, playback), [steps, playback]);
  const [state, setState] = useState(() => startPlayback(spans, initialStep));
  const [speed, setSpeed] = useState<PlaybackSpeed>(1);
  const [stitchesPerMinute, setStitchesPerMinute] = useState(thread?.stitchesPerMinute ?? THREAD_DEFAULTS.stitchesPerMinute.value);
  const pace = findSewingPace(units, thread, stitchesPerMinute);
  const spansRef = useRef(spans);

  // A new route (another design) starts over at the first step.
  useEffect(() => {
    if (spansRef.current === spans) return;
    spansRef.current = spans;
    setState((s) => ({ ...startPlayback(spans, 0), pauseAtStepEnd: s.pauseAtStepEnd }));
  }, [spans]);

  const dispatch = useCallback((event: StepPlaybackEvent) => setState((s) => stepPlayback(spansRef.current, s, event)), []);

  const playing = state.phase === 'playing';
  useEffect(() => {
    if (!playing) return;
    let frame = 0;
    let last: number | null = null;
    const onFrame = (t: number) => {
      if (last !== null) dispatch({ type: 'tick', ms: (t - last) * speed, pace });
      last = t;
      frame = requestAnimationFrame(onFrame);
    };
    frame = requestAnimationFrame(onFrame);
    return () => cancelAnimationFrame(frame);
  }, [playing, speed, pace, dispatch]);

  const goTo = useCallback((step: number) => dispatch({ type: 'goTo', step }), [dispatch]);
  const playPause = useCallback(() => dispatch({ type: 'playPause' }), [dispatch]);
  const replay = useCallback(() => dispatch({ type: 'replay' }), [dispatch]);
  const jumpToStepEnd = useCallback(() => dispatch({ type: 'jumpToStepEnd' }), [dispatch]);
  const scrub = useCallback((distance: number) => dispatch({ type: 'scrub', distance }), [dispatch]);
  const setPauseAtStepEnd = useCallback((on: boolean) => dispatch({ type: 'setPauseAtStepEnd', on }), [dispatch]);
  const changeSpeed = useCallback((direction: 1 | -1) => setSpeed((s) => {
    const i = PLAYBACK_SPEEDS.indexOf(s) + direction;
    return PLAYBACK_SPEEDS[Math.min(PLAYBACK_SPEEDS.length - 1, Math.max(0, i))]!;
  }), []);

  // At a step's end the needle belongs to that step's last stroke, not to the next pass's first one (passes follow
  // each other on the distance axis with nothing between them, so the end of one is the start of the next).
  const atEnd = steps[state.step]?.kind !== 'start' && state.distance >= (spans[state.step]?.end ?? 0);
  const needle = useMemo(() => needleAt(playback, atEnd ? state.distance - 1e-9 * Math.max(1, playback.total) : state.distance), [playback, state.distance, atEnd]);
  return {
    stepIndex: state.step, phase: state.phase, spans, distance: state.distance, total: playback.total, needle,
    pauseAtStepEnd: state.pauseAtStepEnd, speed, stitchesPerMinute,
    setPauseAtStepEnd, setSpeed, setStitchesPerMinute, goTo, playPause, replay, jumpToStepEnd, scrub, changeSpeed,
  };
}
