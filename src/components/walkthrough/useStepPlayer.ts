import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import type { Units } from '@shared/design/design.schema.ts';
import type { Step } from '@shared/walkthrough/walkthrough.types.ts';
import { needleAt, type NeedlePosition, type RouteStroke } from '../route/routePlayback.ts';
import { PLAYER_SPEEDS, useRoutePlayer, type RoutePlayer } from '../route/useRoutePlayer.ts';
import { buildStepSpans, findStepAt, type StepSpan } from './stepTimeline.ts';

/** Needle pace at 1×: 1 1/2 in (or 4 cm) per second, slow enough to follow at the machine. */
const PACE: Record<Units, number> = { in: 1.5, cm: 4 };

export interface StepPlayer {
  readonly player: RoutePlayer;
  readonly stepIndex: number;
  readonly spans: readonly StepSpan[];
  /** Where to draw the needle (at the route's start before anything is played). */
  readonly needle: NeedlePosition | null;
  readonly pauseAtStepEnd: boolean;
  setPauseAtStepEnd(on: boolean): void;
  goTo(index: number): void;
  playPause(): void;
  replay(): void;
  scrub(distance: number): void;
  changeSpeed(direction: 1 | -1): void;
}

/**
 * The walkthrough's player: U's route player (needle along the route) driven step by step. Play animates the
 * current step and, with `pauseAtStepEnd` (the default), stops where the step ends so the quilter can sew it;
 * without it, play runs on and the current step follows the needle. Scrubbing picks the step under the needle.
 */
export function useStepPlayer(steps: readonly Step[], strokes: readonly RouteStroke[], units: Units, initialStep: number): StepPlayer {
  const player = useRoutePlayer(strokes, PACE[units]);
  const spans = useMemo(() => buildStepSpans(steps, player.playback), [steps, player.playback]);
  const clamp = useCallback((i: number) => Math.min(Math.max(0, i), Math.max(0, steps.length - 1)), [steps.length]);
  const [stepIndex, setStepIndex] = useState(() => clamp(initialStep));
  const [pauseAtStepEnd, setPauseAtStepEnd] = useState(true);
  const { seek, pause, play, playing, distance } = player;
  // True from a continuous play until the quilter takes over (step buttons, scrub): the step follows the needle,
  // including the last update when the player stops itself at the route's end.
  const following = useRef(false);

  // Resume: put the needle at the saved step once (this effect runs after the player's own reset to 0).
  useEffect(() => {
    // Deliberately keyed on the route only: a later change of step must not move the needle back.
    seek(spans[clamp(initialStep)]?.start ?? 0);
    // eslint-disable-next-line react-hooks/exhaustive-deps -- keyed on the route only, as said above.
  }, [player.playback]);

  useEffect(() => {
    const span = spans[stepIndex];
    if (!span) return;
    if (following.current && !pauseAtStepEnd) {
      const at = findStepAt(steps, spans, distance, player.playback.total);
      if (at !== stepIndex) setStepIndex(at);
      if (!playing) following.current = false;
      return;
    }
    const eps = 1e-9 * Math.max(1, player.playback.total);
    if (playing && steps[stepIndex]!.strokes.length > 0 && distance >= span.end - eps) {
      pause();
      seek(span.end);
    }
  }, [distance, playing, pauseAtStepEnd, spans, stepIndex, steps, pause, seek, player.playback.total]);

  const goTo = useCallback((index: number) => {
    following.current = false;
    const i = clamp(index);
    pause();
    setStepIndex(i);
    seek(spans[i]?.start ?? 0);
  }, [clamp, pause, seek, spans]);

  const playPause = useCallback(() => {
    if (playing) return pause();
    let i = stepIndex;
    // A start or tie-off step has nothing to animate: play moves on to the next move and plays it.
    while (i < steps.length - 1 && steps[i]!.strokes.length === 0) i++;
    const span = spans[i];
    if (!span || steps[i]!.strokes.length === 0) return;
    if (i !== stepIndex) setStepIndex(i);
    const eps = 1e-9 * Math.max(1, player.playback.total);
    if (i !== stepIndex || distance >= span.end - eps || distance < span.start - eps) seek(span.start);
    following.current = !pauseAtStepEnd;
    play();
  }, [playing, pause, stepIndex, steps, spans, distance, seek, play, player.playback.total, pauseAtStepEnd]);

  const replay = useCallback(() => {
    const span = spans[stepIndex];
    if (!span) return;
    seek(span.start);
    following.current = false;
    if (steps[stepIndex]!.strokes.length > 0) play();
  }, [spans, stepIndex, steps, seek, play]);

  const scrub = useCallback((d: number) => {
    following.current = false;
    pause();
    seek(d);
    setStepIndex(findStepAt(steps, spans, d, player.playback.total));
  }, [pause, seek, steps, spans, player.playback.total]);

  const changeSpeed = useCallback((direction: 1 | -1) => {
    const i = PLAYER_SPEEDS.indexOf(player.speed as (typeof PLAYER_SPEEDS)[number]);
    const next = PLAYER_SPEEDS[Math.min(PLAYER_SPEEDS.length - 1, Math.max(0, (i < 0 ? 1 : i) + direction))]!;
    player.setSpeed(next);
  }, [player]);

  const needle = player.needle ?? needleAt(player.playback, distance);
  return { player, stepIndex, spans, needle, pauseAtStepEnd, setPauseAtStepEnd, goTo, playPause, replay, scrub, changeSpeed };
}
