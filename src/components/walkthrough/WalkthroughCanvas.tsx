import { useEffect, useMemo, useRef, useState } from 'react';
import type { Design } from '@shared/design/design.schema.ts';
import type { NamedPatch } from '@shared/walkthrough/patchNames.ts';
import type { Step } from '@shared/walkthrough/walkthrough.types.ts';
import { readCanvasTheme } from '../editor/canvasTheme.ts';
import { BlockLayer } from '../editor/canvas/BlockLayer.tsx';
import { EditorStage } from '../editor/canvas/EditorStage.tsx';
import { RouteLayer } from '../editor/canvas/RouteLayer.tsx';
import { SeamLines } from '../editor/canvas/SeamLines.tsx';
import { useStageSize } from '../editor/useStageSize.ts';
import { fitViewport, type Viewport } from '../editor/viewport.ts';
import type { NeedlePosition, RouteStroke } from '../route/routePlayback.ts';
import { StepHighlightLayer } from './StepHighlightLayer.tsx';

export interface WalkthroughCanvasProps {
  readonly design: Design;
  readonly strokes: readonly RouteStroke[];
  readonly step: Step;
  readonly patch: NamedPatch | null;
  readonly needle: NeedlePosition | null;
}

const NO_SELECTION: ReadonlySet<number> = new Set();

/**
 * The replay canvas, built from the workbench's layers: the block and binding band (BlockLayer), the seams with the
 * current step's patch tinted (SeamLines, in the block's layer), the route with what is sewn so far solid and what is to come faded
 * (RouteLayer with the needle), and the current step on top (StepHighlightLayer). Wheel, pinch and touch zoom and
 * pan through EditorStage; "Fit" brings the whole block back.
 */
export function WalkthroughCanvas({ design, strokes, step, patch, needle }: WalkthroughCanvasProps) {
  const box = useRef<HTMLDivElement>(null);
  const { width, height } = useStageSize(box);
  const theme = useMemo(() => readCanvasTheme(), []);
  const [view, setView] = useState<Viewport | null>(null);
  const [passLabels, setPassLabels] = useState(true);
  const fitted = useMemo(() => fitViewport(design.width, design.height, width, height, 24), [design.width, design.height, width, height]);
  useEffect(() => setView(null), [width, height]);
  const shown = view ?? fitted;
  return (
    <div className="relative h-full w-full">
      <div ref={box} className="h-full w-full overflow-hidden rounded border border-muslin-300 bg-muslin-50" data-testid="walkthrough-canvas">
        {width > 0 && height > 0 && (
          <EditorStage width={width} height={height} units={design.units} view={shown} onViewChange={setView} onPointer={() => undefined} onDoubleClick={() => setView(null)} cursor="default">
            <BlockLayer design={design} view={shown} stageWidth={width} stageHeight={height} theme={theme} showGrid>
              <SeamLines seams={design.seams} view={shown} theme={theme} patch={patch} selected={NO_SELECTION} />
            </BlockLayer>
            <RouteLayer strokes={strokes} view={shown} theme={theme} needle={needle} passLabels={false} />
            <StepHighlightLayer step={step} strokes={strokes} view={shown} theme={theme} width={width} height={height} passLabels={passLabels} />
          </EditorStage>
        )}
      </div>
      <label className="absolute bottom-2 left-2 flex min-h-12 items-center gap-2 rounded border border-muslin-300 bg-white/90 px-3 text-base">
        <input type="checkbox" className="h-5 w-5" checked={passLabels} onChange={(e) => setPassLabels(e.target.checked)} />
        Pass numbers
      </label>
      {view && (
        <button type="button" onClick={() => setView(null)} className="absolute right-2 top-2 min-h-12 min-w-12 rounded border border-denim-600 bg-white px-3 font-semibold text-denim-700 shadow">
          Fit
        </button>
      )}
    </div>
  );
}
