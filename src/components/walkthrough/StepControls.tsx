import { useId } from 'react';
import type { Units } from '@shared/design/design.schema.ts';
import { formatRulerLength } from '@shared/walkthrough/rulerLength.ts';
import { PLAYER_SPEEDS } from '../route/useRoutePlayer.ts';
import type { StepPlayer } from './useStepPlayer.ts';

export interface StepControlsProps {
  readonly sp: StepPlayer;
  readonly stepCount: number;
  readonly units: Units;
}

/** Large controls (every target at least 48 × 48 CSS px) for a tablet propped beside the machine. */
export function StepControls({ sp, stepCount, units }: StepControlsProps) {
  const scrubId = useId();
  const speedId = useId();
  const { player, stepIndex } = sp;
  const big = 'min-h-12 min-w-12 rounded-lg px-4 text-lg font-semibold disabled:opacity-40';
  const plain = `${big} border-2 border-denim-600 bg-white text-denim-700 hover:bg-muslin-100`;
  const strong = `${big} bg-denim-600 text-white hover:bg-denim-700`;
  return (
    <div role="group" aria-label="Walkthrough controls" className="flex flex-col gap-3 print:hidden">
      <div className="grid grid-cols-3 gap-2">
        <button type="button" className={plain} onClick={() => sp.goTo(stepIndex - 1)} disabled={stepIndex <= 0}>◀ Previous</button>
        <button type="button" className={strong} onClick={sp.playPause}>{player.playing ? '❚❚ Pause' : '▶ Play step'}</button>
        <button type="button" className={plain} onClick={() => sp.goTo(stepIndex + 1)} disabled={stepIndex >= stepCount - 1}>Next ▶</button>
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <button type="button" className={plain} onClick={sp.replay}>↺ Replay step</button>
        <label htmlFor={speedId} className="text-lg">Speed</label>
        <select id={speedId} value={player.speed} onChange={(e) => player.setSpeed(Number(e.target.value))} className="min-h-12 rounded-lg border-2 border-muslin-300 bg-white px-3 text-lg">
          {PLAYER_SPEEDS.map((s) => <option key={s} value={s}>{s}×</option>)}
        </select>
        <label className="flex min-h-12 items-center gap-2 text-lg">
          <input type="checkbox" className="h-6 w-6" checked={sp.pauseAtStepEnd} onChange={(e) => sp.setPauseAtStepEnd(e.target.checked)} />
          Pause after each step
        </label>
      </div>
      <div className="flex items-center gap-3">
        <label htmlFor={scrubId} className="text-lg">Needle</label>
        <input
          id={scrubId}
          type="range"
          min={0}
          max={player.playback.total || 1}
          step={player.playback.total / 1000 || 0.01}
          value={player.distance}
          onChange={(e) => sp.scrub(Number(e.target.value))}
          className="h-12 flex-1 accent-denim-600"
          aria-valuetext={`${formatRulerLength(player.distance, units)} of ${formatRulerLength(player.playback.total, units)}`}
        />
      </div>
    </div>
  );
}
