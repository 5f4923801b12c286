import { useId } from 'react';
import { formatLength, type UnitPair } from '@shared/units/units.ts';
import { PLAYER_SPEEDS, type RoutePlayer } from './useRoutePlayer.ts';

export interface RoutePlayerControlsProps {
  readonly player: RoutePlayer;
  readonly units: UnitPair;
  /** Accessible name of the control group, e.g. "Route preview". */
  readonly label: string;
}

/** Play, pause, step back/forward by stroke, speed and a scrub slider for a route. Reused by the walkthrough. */
export function RoutePlayerControls({ player, units, label }: RoutePlayerControlsProps) {
  const scrubId = useId();
  const speedId = useId();
  const total = player.playback.total;
  const btn = 'rounded border border-denim-600 px-2 py-1 text-sm font-semibold text-denim-700 hover:bg-muslin-100 disabled:opacity-50';
  return (
    <div role="group" aria-label={label} className="flex flex-wrap items-center gap-2">
      <button type="button" className={btn} onClick={() => player.step(-1)} disabled={total <= 0} aria-label="Step back one stroke">◀◀</button>
      {player.playing ? (
        <button type="button" className={btn} onClick={player.pause} aria-label="Pause">❚❚ Pause</button>
      ) : (
        <button type="button" className={btn} onClick={player.play} disabled={total <= 0} aria-label="Play">▶ Play</button>
      )}
      <button type="button" className={btn} onClick={() => player.step(1)} disabled={total <= 0} aria-label="Step forward one stroke">▶▶</button>
      <label htmlFor={speedId} className="sr-only">Speed</label>
      <select id={speedId} value={player.speed} onChange={(e) => player.setSpeed(Number(e.target.value))} className="rounded border border-muslin-300 bg-white px-1 py-1 text-sm">
        {PLAYER_SPEEDS.map((s) => <option key={s} value={s}>{s}×</option>)}
      </select>
      <label htmlFor={scrubId} className="sr-only">Needle position</label>
      <input
        id={scrubId}
        type="range"
        min={0}
        max={total || 1}
        step={total / 500 || 0.01}
        value={player.distance}
        onChange={(e) => player.seek(Number(e.target.value))}
        className="min-w-32 flex-1"
        aria-valuetext={`${formatLength(player.distance, units.design, units.viewer)} of ${formatLength(total, units.design, units.viewer)}`}
      />
      <span className="text-sm tabular-nums" aria-live="off">
        {player.needle ? `Pass ${player.needle.pass} · ${player.needle.kind === 'stitch' ? 'stitching' : `travel (${player.needle.kind})`}` : 'Ready'}
      </span>
    </div>
  );
}
