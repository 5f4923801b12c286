import { LineLegend } from '../route/LineLegend.tsx';
import { legendEntries } from '../route/legendEntries.ts';
import { useEffect, useMemo } from 'react';
import type { Design } from '@shared/design/design.schema.ts';
import { buildDesignSvg } from '@shared/export/designSvg.ts';
import { buildWalkthrough } from '@shared/walkthrough/buildWalkthrough.ts';
import { findSafetyCautions } from '@shared/walkthrough/safetyCautions.ts';
import type { RouteStrokeInput } from '@shared/walkthrough/walkthrough.types.ts';
import { KeyList } from './KeyList.tsx';
import { PlaybackSettings } from './PlaybackSettings.tsx';
import { StepCard } from './StepCard.tsx';
import { StepControls } from './StepControls.tsx';
import { StepList } from './StepList.tsx';
import type { OfflineReadiness } from './offlineLesson.ts';
import type { ProgressSync } from './useProgressSync.ts';
import { useOnline } from './useOnline.ts';
import { useStepPlayer } from './useStepPlayer.ts';
import { WalkthroughCanvas } from './WalkthroughCanvas.tsx';
import { findWalkthroughAction } from './walkthroughKeys.ts';

export interface WalkthroughViewProps {
  readonly title: string;
  readonly design: Design;
  readonly route: readonly RouteStrokeInput[];
  /** Words from the lesson (notes) that decide which safety notes to add beyond the needle. */
  readonly lessonText: readonly string[];
  readonly initialStep: number;
  readonly progress: ProgressSync;
  /** Whether the lesson is kept on this device for working offline (lessons only; null for templates). */
  readonly offline?: OfflineReadiness | null;
}

const SAVE_LABEL = {
  off: 'Progress is not saved here (open the walkthrough from a class lesson to keep your place).',
  saved: 'Your place is saved.',
  saving: 'Saving your place…',
  kept: 'Your place is kept on this device and will be sent when the connection is back.',
  refused: 'Your place could not be saved for this lesson (it may have been removed). Reload the page.',
} as const;

const OFFLINE_NOTE: Record<OfflineReadiness, string | null> = {
  unsupported: null,
  keeping: 'Keeping this lesson on this device for sewing offline…',
  ready: 'This lesson is kept on this device: it opens and keeps your place without a connection.',
  failed: 'This lesson could not be kept on this device; it needs a connection to open again.',
};

/** The student walkthrough: canvas replay, the current step, controls, keyboard, and the printable step list. */
export function WalkthroughView({ title, design, route, lessonText, initialStep, progress, offline = null }: WalkthroughViewProps) {
  const online = useOnline();
  const walkthrough = useMemo(() => buildWalkthrough(design, route), [design, route]);
  // Printing the page: the canvas does not print well, so a print-only picture of the block with its route (the
  // SVG export's drawing, as an image: no markup from strings) stands in for it.
  const printPicture = useMemo(() => `data:image/svg+xml;charset=utf-8,${encodeURIComponent(buildDesignSvg(design, { route, viewerUnits: design.units }))}`, [design, route]);
  const { steps } = walkthrough;
  const cautions = useMemo(() => findSafetyCautions(lessonText), [lessonText]);
  const sp = useStepPlayer(steps, route, design.units, design.thread, initialStep);
  const step = steps[sp.stepIndex]!;
  const patch = walkthrough.patches.find((p) => p.name === step.patch) ?? null;
  const last = sp.stepIndex === steps.length - 1;
  const { report } = progress;

  useEffect(() => report(sp.stepIndex, steps.length), [report, sp.stepIndex, steps.length]);

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const target = e.target as HTMLElement | null;
      const inField = !!target && (['INPUT', 'SELECT', 'TEXTAREA'].includes(target.tagName) || target.isContentEditable);
      const onButton = target?.tagName === 'BUTTON' && (e.key === ' ' || e.key === 'Enter');
      const action = onButton ? null : findWalkthroughAction(e, inField);
      if (!action) return;
      e.preventDefault();
      if (action === 'play-pause') sp.playPause();
      else if (action === 'next-step') sp.goTo(sp.stepIndex + 1);
      else if (action === 'previous-step') sp.goTo(sp.stepIndex - 1);
      else if (action === 'first-step') sp.goTo(0);
      else if (action === 'last-step') sp.goTo(steps.length - 1);
      else if (action === 'replay-step') sp.replay();
      else if (action === 'step-end') sp.jumpToStepEnd();
      else if (action === 'faster') sp.changeSpeed(1);
      else sp.changeSpeed(-1);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [sp, steps.length]);

  return (
    <div className="@container flex flex-col gap-6" data-testid="walkthrough">
      {!online && (
        <p role="status" data-testid="offline-banner" className="rounded border-2 border-ochre-500 bg-muslin-100 px-4 py-3 text-lg font-semibold">
          You are offline. The walkthrough keeps working{progress.state === 'off' ? '' : ', and your place is kept on this device until the connection is back'}.
        </p>
      )}
      <div className="grid gap-4 @4xl:grid-cols-[minmax(0,1fr)_28rem]">
        {/* Desktop: the block stays put (sticky) while the card column scrolls; the controls bar sits under it. */}
        <div className="h-[40vh] min-h-72 @4xl:sticky @4xl:top-2 @4xl:h-[min(65vh,calc(100dvh-11rem))] @4xl:self-start print:hidden">
          <WalkthroughCanvas design={design} strokes={route} step={step} patch={patch} needle={sp.needle} />
        </div>
        <img src={printPicture} alt={`${title}: the block with its route, pass numbers and arrows`} className="hidden w-full max-w-[17cm] print:block" />
        <div className="flex flex-col gap-4">
          <StepCard step={step} />
          <details className="rounded border border-muslin-200 bg-white p-3 print:hidden">
            <summary className="min-h-11 cursor-pointer font-semibold">What the lines and marks mean</summary>
            <LineLegend entries={legendEntries({ seams: design.seams.length > 0, lines: false, lineGroups: 0, looseEnds: false, start: false, finish: false, widestGap: false, routeKinds: [...new Set(route.map((s) => s.kind))], needle: true })} />
          </details>
          <div className="flex flex-col gap-2 print:hidden">
            {last && progress.state !== 'off' && (
              <button
                type="button"
                onClick={() => progress.setFinished(!progress.finished, steps.length)}
                className={`min-h-12 rounded-lg px-4 text-xl font-bold ${progress.finished ? 'border-2 border-sage-600 bg-white text-sage-600' : 'bg-sage-600 text-white'}`}
              >
                {progress.finished ? '✓ Lesson done (tap to re-open)' : 'Mark lesson done'}
              </button>
            )}
            {progress.state !== 'off' && (
              <p className="text-lg" data-progress>
                {progress.finished ? 'You finished this lesson.' : `You are on step ${sp.stepIndex + 1} of ${steps.length}.`}
              </p>
            )}
            <p className="text-base" role="status" data-testid="save-state" data-state={progress.state}>
              {progress.finished && progress.state !== 'off' ? 'You finished this lesson. ' : ''}{SAVE_LABEL[progress.state]}
            </p>
            {offline && OFFLINE_NOTE[offline] && <p className="text-base" data-testid="offline-ready" data-state={offline}>{OFFLINE_NOTE[offline]}</p>}
          </div>
          <PlaybackSettings sp={sp} units={design.units} />
          <KeyList />
        </div>
      </div>
      <StepList title={title} steps={steps} cautions={cautions} current={sp.stepIndex} onPick={sp.goTo} />
      <StepControls sp={sp} stepCount={steps.length} />
    </div>
  );
}
