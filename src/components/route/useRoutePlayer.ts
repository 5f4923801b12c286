import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { buildPlayback, needleAt, stepFrom, type NeedlePosition, type Playback, type RouteStroke } from './routePlayback.ts';

/** Speeds the player offers, in design units per second at 1×. */
export const PLAYER_SPEEDS = [0.5, 1, 2, 4, 8] as const;

export interface RoutePlayer {
  readonly playback: Playback;
  /** Distance sewn so far, in design units. */
  readonly distance: number;
  readonly needle: NeedlePosition | null;
  readonly playing: boolean;
  readonly speed: number;
  play(): void;
  pause(): void;
  step(direction: 1 | -1): void;
  /** Moves the needle to `distance` (clamped), as the scrub slider does. */
  seek(distance: number): void;
  setSpeed(speed: number): void;
}

/**
 * Animates a needle along a route with requestAnimationFrame. `unitsPerSecond` is the pace at 1×
 * (e.g. 2 in/s). Restarts from the beginning when the strokes change. Reused by the walkthrough.
 */
export function useRoutePlayer(strokes: readonly RouteStroke[], unitsPerSecond: number): RoutePlayer {
  const playback = useMemo(() => buildPlayback(strokes), [strokes]);
  const [distance, setDistance] = useState(0);
  const [playing, setPlaying] = useState(false);
  const [speed, setSpeed] = useState(1);
  const last = useRef<number | null>(null);

  useEffect(() => {
    setDistance(0);
    setPlaying(false);
  }, [playback]);

  useEffect(() => {
    if (!playing) return;
    let frame = 0;
    const tick = (t: number) => {
      const prev = last.current ?? t;
      last.current = t;
      setDistance((d) => {
        const next = d + ((t - prev) / 1000) * unitsPerSecond * speed;
        if (next >= playback.total) {
          setPlaying(false);
          return playback.total;
        }
        return next;
      });
      frame = requestAnimationFrame(tick);
    };
    frame = requestAnimationFrame(tick);
    return () => {
      cancelAnimationFrame(frame);
      last.current = null;
    };
  }, [playing, playback, unitsPerSecond, speed]);

  const play = useCallback(() => {
    if (playback.total <= 0) return;
    setDistance((d) => (d >= playback.total ? 0 : d));
    setPlaying(true);
  }, [playback]);
  const pause = useCallback(() => setPlaying(false), []);
  const step = useCallback((direction: 1 | -1) => {
    setPlaying(false);
    setDistance((d) => stepFrom(playback, d, direction));
  }, [playback]);
  const seek = useCallback((d: number) => setDistance(Math.min(playback.total, Math.max(0, d))), [playback]);

  const needle = useMemo(() => (distance > 0 || playing ? needleAt(playback, distance) : null), [playback, distance, playing]);
  return { playback, distance, needle, playing, speed, play, pause, step, seek, setSpeed };
}
