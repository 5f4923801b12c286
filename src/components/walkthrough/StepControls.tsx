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
  const big = 'min-h-12 min-w-12 rounded-lg px-2 text-lg font-semibold disabled:opacity-40 @md:px-3';
  const plain = `${big} border-2 border-denim-600 bg-white text-denim-700 hover:bg-muslin-100`;
  const strong = `${big} bg-denim-600 text-white hover:bg-denim-700`;
  const playLabel = phase === 'playing' ? '❚❚ Pause' : phase === 'ended' && !last ? '▶ Play next step' : '▶ Play step';
  // On a phone the secondary buttons show their sign only; the words stay for screen readers.
  const words = (text: string) => <span className="sr-only @md:not-sr-only">{text}</span>;
  return (
    <div
      role="group"
      aria-label="Walkthrough controls"
      data-testid="walkthrough-controls"
      className="sticky bottom-0 z-10 -mx-2 flex flex-col gap-2 border-t-2 border-muslin-300 bg-white/95 px-2 py-2 shadow-[0_-4px_12px_rgba(0,0,0,0.08)] print:hidden"
    >
      <p className="text-sm font-semibold text-denim-700 @md:text-base" data-testid="controls-step">
        Step {stepIndex + 1} of {stepCount}{phase === 'ended' ? ' · done, ready for the next' : phase === 'playing' ? ' · playing' : ''}
      </p>
      <div className="flex flex-wrap gap-2">
        <div className="grid flex-[1_1_20rem] grid-cols-[auto_1fr_auto] gap-2">
          <button type="button" className={plain} onClick={() => sp.goTo(stepIndex - 1)} disabled={stepIndex <= 0}>◀ {words('Previous')}</button>
          <button type="button" className={strong} onClick={sp.playPause}>{playLabel}</button>
          <button type="button" className={plain} onClick={() => sp.goTo(stepIndex + 1)} disabled={last}>{words('Next')} ▶</button>
        </div>
        <div className="flex flex-[1_1_16rem] gap-2">
          <button type="button" className={`${plain} flex-1`} onClick={sp.replay}>↺ {words('Replay step')}</button>
          <button type="button" className={`${plain} flex-1`} onClick={sp.jumpToStepEnd} disabled={phase === 'ended'}>» {words('Step end')}</button>
          <div role="radiogroup" aria-label="Speed" className="flex gap-1">
            {([1, 2, 4] as const).map((s) => (
              <button key={s} type="button" role="radio" aria-checked={sp.speed === s} onClick={() => sp.setSpeed(s)} className={sp.speed === s ? strong : plain}>
                {s}×
              </button>
            ))}
          </div>
        </div>
      </div>
    </div>
  );
}
