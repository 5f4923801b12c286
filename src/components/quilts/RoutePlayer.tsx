import { useEffect, useState } from 'react';
import type { ChainLeg } from '@shared/quilt/chainOverview.ts';
import { CORNERS } from '@shared/quilt/cornerMap.ts';
import { frameAt, playbackSeconds, type PlaybackFrame } from './routePlayback.ts';

const CORNER_WORDS: Record<(typeof CORNERS)[number], string> = { 'top-left': 'top left', 'top-right': 'top right', 'bottom-right': 'bottom right', 'bottom-left': 'bottom left' };

/** Whether the viewer asked for reduced motion (the operating system's setting), followed as it changes. */
function useReducedMotion(): boolean {
  const query = '(prefers-reduced-motion: reduce)';
  const [reduce, setReduce] = useState(() => window.matchMedia(query).matches);
  useEffect(() => {
    const list = window.matchMedia(query);
    const change = () => setReduce(list.matches);
    list.addEventListener('change', change);
    return () => list.removeEventListener('change', change);
  }, []);
  return reduce;
}

/**
 * Plays the chained route on the map on request: `t` seconds advance with animation frames while playing and the
 * frame is computed by routePlayback.ts (no motion with reduced motion: the needle stands on corners, a block at a
 * time). Reports the frame to the map through `onFrame` (null when not started).
 */
export function useRoutePlayback(legs: readonly ChainLeg[]) {
  const reduceMotion = useReducedMotion();
  const [state, setState] = useState<{ playing: boolean; t: number | null }>({ playing: false, t: null });
  const total = playbackSeconds(legs);
  useEffect(() => {
    if (!state.playing) return;
    let last: number | null = null;
    let id = requestAnimationFrame(function tick(now) {
      const dt = last === null ? 0 : (now - last) / 1000;
      last = now;
      setState((s) => {
        const t = (s.t ?? 0) + dt;
        return t >= total ? { playing: false, t: total } : { playing: true, t };
      });
      id = requestAnimationFrame(tick);
    });
    return () => cancelAnimationFrame(id);
  }, [state.playing, total]);
  const frame: PlaybackFrame | null = state.t === null ? null : frameAt(legs, state.t, reduceMotion);
  return {
    frame,
    playing: state.playing,
    play: () => setState((s) => ({ playing: true, t: s.t === null || s.t >= total ? 0 : s.t })),
    pause: () => setState((s) => ({ ...s, playing: false })),
    reset: () => setState({ playing: false, t: null }),
    reduceMotion,
  };
}

export interface RoutePlayerProps {
  readonly legs: readonly ChainLeg[];
  readonly player: ReturnType<typeof useRoutePlayback>;
  /** Placed corner of each leg's entry and exit (0–3, clockwise from the top left), as the plan gives them. */
  readonly corners: readonly { readonly entry: 0 | 1 | 2 | 3; readonly exit: 0 | 1 | 2 | 3 }[];
}

/** Play / Pause and Back to start under the map, and one line saying which block the needle is on. */
export function RoutePlayer({ legs, player, corners }: RoutePlayerProps) {
  const { frame, playing } = player;
  const leg = frame ? legs[frame.leg] : undefined;
  const c = frame ? corners[frame.leg] : undefined;
  const words = leg && c
    ? `Block ${leg.step} of ${legs.length}: row ${leg.cell.row + 1}, column ${leg.cell.column + 1}, in at the ${CORNER_WORDS[CORNERS[c.entry]]} corner, out at the ${CORNER_WORDS[CORNERS[c.exit]]}.`
    : `The route runs through ${legs.length} ${legs.length === 1 ? 'block' : 'blocks'}; arrows show where the thread enters and leaves each one.`;
  return (
    <div className="mt-2 flex flex-wrap items-center gap-2" data-testid="route-player">
      <button type="button" onClick={playing ? player.pause : player.play} className="rounded bg-denim-600 px-4 py-1.5 font-semibold text-white hover:bg-denim-700">
        {playing ? 'Pause' : 'Play the route'}
      </button>
      <button type="button" onClick={player.reset} disabled={frame === null} className="rounded border border-denim-600 px-3 py-1.5 font-semibold text-denim-700 disabled:opacity-50">
        Back to start
      </button>
      <p className="min-w-0 basis-full text-sm" aria-live="polite" data-testid="route-caption">
        {words}
        {player.reduceMotion && ' (Reduced motion: the needle moves a block at a time.)'}
      </p>
    </div>
  );
}
