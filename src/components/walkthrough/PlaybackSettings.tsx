import { useId } from 'react';
import type { Units } from '@shared/design/design.schema.ts';
import { formatRulerLength } from '@shared/walkthrough/rulerLength.ts';
import type { StepPlayer } from './useStepPlayer.ts';

export interface PlaybackSettingsProps {
  readonly sp: StepPlayer;
  readonly units: Units;
}

/** Stitches per minute (1× is real sewing time at that pace), pausing after each step, and the needle slider. */
export function PlaybackSettings({ sp, units }: PlaybackSettingsProps) {
  const spmId = useId();
  const scrubId = useId();
  return (
    <section aria-label="Playback settings" className="flex flex-col gap-3 rounded border border-muslin-300 bg-white p-4 print:hidden">
      <div className="flex flex-wrap items-center gap-3">
        <label htmlFor={spmId} className="text-lg">Stitches per minute</label>
        <input
          id={spmId}
          type="number"
          min={60}
          max={3000}
          step={50}
          value={sp.stitchesPerMinute}
          onChange={(e) => {
            const n = Number(e.target.value);
            if (Number.isFinite(n) && n >= 60 && n <= 3000) sp.setStitchesPerMinute(n);
          }}
          className="min-h-12 w-28 rounded-lg border-2 border-muslin-300 bg-white px-3 text-lg"
        />
        <span className="text-base">1× plays at this pace, as long as the step takes to sew.</span>
      </div>
      <label className="flex min-h-12 items-center gap-2 text-lg">
        <input type="checkbox" className="h-6 w-6" checked={sp.pauseAtStepEnd} onChange={(e) => sp.setPauseAtStepEnd(e.target.checked)} />
        Pause after each step
      </label>
      <div className="flex items-center gap-3">
        <label htmlFor={scrubId} className="text-lg">Needle</label>
        <input
          id={scrubId}
          type="range"
          min={0}
          max={sp.total || 1}
          step={sp.total / 1000 || 0.01}
          value={sp.distance}
          onChange={(e) => sp.scrub(Number(e.target.value))}
          className="h-12 flex-1 accent-denim-600"
          aria-valuetext={`${formatRulerLength(sp.distance, units)} of ${formatRulerLength(sp.total, units)}`}
        />
      </div>
    </section>
  );
}
