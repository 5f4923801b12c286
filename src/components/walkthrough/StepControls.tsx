import type { StepPlayer } from './useStepPlayer.ts';

export interface StepControlsProps {
  readonly sp: StepPlayer;
  readonly stepCount: number;
}

/**
 * The bar of large controls (every target at least 48 × 48 CSS px) for a tablet propped beside the machine. It is
 * sticky at the bottom of the screen at every width, so Play and Next never scroll away from the block; the step
 * number in it comes from the same player state as the card's.
 */
export function StepControls({ sp, stepCount }: StepControlsProps) {
  const { stepIndex, phase } = sp;
  const last = stepIndex >= stepCount - 1;
  const big = 'min-h-12 min-w-12 rounded-lg px-3 text-lg font-semibold disabled:opacity-40';
  const plain = `${big} border-2 border-denim-600 bg-white text-denim-700 hover:bg-muslin-100`;
  const strong = `${big} bg-denim-600 text-white hover:bg-denim-700`;
  const playLabel = phase === 'playing' ? '❚❚ Pause' : phase === 'ended' && !last ? '▶ Play next step' : '▶ Play step';
  return (
    <div
      role="group"
      aria-label="Walkthrough controls"
      data-testid="walkthrough-controls"
      className="sticky bottom-0 z-10 -mx-2 flex flex-col gap-2 border-t-2 border-muslin-300 bg-white/95 px-2 py-2 shadow-[0_-4px_12px_rgba(0,0,0,0.08)] print:hidden"
    >
      <p className="text-base font-semibold text-denim-700" data-testid="controls-step" aria-live="off">
        Step {stepIndex + 1} of {stepCount}{phase === 'ended' ? ' · done, ready for the next' : phase === 'playing' ? ' · playing' : ''}
      </p>
      <div className="grid grid-cols-[1fr_1.6fr_1fr] gap-2 @2xl:flex @2xl:flex-wrap">
        <button type="button" className={plain} onClick={() => sp.goTo(stepIndex - 1)} disabled={stepIndex <= 0}>◀ Previous</button>
        <button type="button" className={`${strong} @2xl:min-w-48`} onClick={sp.playPause}>{playLabel}</button>
        <button type="button" className={plain} onClick={() => sp.goTo(stepIndex + 1)} disabled={last}>Next ▶</button>
        <button type="button" className={plain} onClick={sp.replay}>↺ Replay step</button>
        <button type="button" className={plain} onClick={sp.jumpToStepEnd} disabled={phase === 'ended'}>⏭ Step end</button>
        <div role="radiogroup" aria-label="Speed" className="flex gap-1">
          {([1, 2, 4] as const).map((s) => (
            <button
              key={s}
              type="button"
              role="radio"
              aria-checked={sp.speed === s}
              onClick={() => sp.setSpeed(s)}
              className={sp.speed === s ? `${strong} flex-1` : `${plain} flex-1`}
            >
              {s}×
            </button>
          ))}
        </div>
      </div>
    </div>
  );
}
