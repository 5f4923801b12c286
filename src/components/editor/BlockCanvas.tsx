import { useMemo, type RefObject } from 'react';
import type { Design, Units } from '@shared/design/design.schema.ts';
import type { Guide } from '@shared/editor/guides.ts';
import type { Polyline } from '@shared/geometry/point.ts';
import type { NamedPatch } from '@shared/walkthrough/patchNames.ts';
import { formatSize } from '@shared/units/units.ts';
import type { RouteCheckView } from '../route/routeCheckView.ts';
import type { NeedlePosition, RouteStroke } from '../route/routePlayback.ts';
import { BlockLayer } from './canvas/BlockLayer.tsx';
import { LineLegend } from '../route/LineLegend.tsx';
import { legendEntries } from '../route/legendEntries.ts';
import { EditorStage } from './canvas/EditorStage.tsx';
import { OverlayLayer } from './canvas/OverlayLayer.tsx';
import { QuiltingLineLayer } from './canvas/QuiltingLineLayer.tsx';
import { RouteLayer } from './canvas/RouteLayer.tsx';
import { RulerLayer } from './canvas/RulerLayer.tsx';
import { SeamLines } from './canvas/SeamLines.tsx';
import type { CanvasTheme } from './canvasTheme.ts';
import { findLinePieces } from './linePieces.ts';
import type { ToolController } from './useToolController.ts';
import type { ViewportControl } from './useViewportControl.ts';

const NO_ORDER: readonly number[] = [];
const NO_POINTS: readonly (readonly [number, number])[] = [];

export interface BlockCanvasProps {
  /** The box the stage fills; the Workbench measures it. */
  readonly boxRef: RefObject<HTMLDivElement | null>;
  readonly size: { readonly width: number; readonly height: number };
  readonly design: Design;
  readonly viewerUnits: Units;
  readonly viewport: ViewportControl;
  readonly theme: CanvasTheme;
  readonly showGrid: boolean;
  readonly controller: ToolController;
  /** The patch the motif tool picked, outlined (null with any other tool). */
  readonly patch: NamedPatch | null;
  /** The stitching order being clicked (order tool only). */
  readonly showOwnOrder: boolean;
  readonly check: RouteCheckView | null;
  /** The route shown over the drawing (planned, or the saved one while current), or null. */
  readonly strokes: readonly RouteStroke[] | null;
  readonly needle: NeedlePosition | null;
  /** Lines drawn over everything without being part of the design: a motif, a join, or the tool's preview. */
  readonly preview: readonly Polyline[];
  readonly guides: readonly Guide[];
}

/** The block on the canvas: paper, seams, quilting lines, route, previews and rulers (Konva is the view only). */
export function BlockCanvas(p: BlockCanvasProps) {
  const { design, viewport: vp, theme, size, controller: ctl } = p;
  const selected = ctl.selection;
  const selectedLines = useMemo(() => new Set(selected?.target === 'lines' ? selected.indices : []), [selected]);
  const selectedSeams = useMemo(() => new Set(selected?.target === 'seams' ? selected.indices : []), [selected]);
  const pieces = useMemo(() => findLinePieces(design), [design]);
  const legend = legendEntries({
    seams: design.seams.length > 0,
    lines: design.lines.length > 0,
    lineGroups: pieces && pieces.length > 0 ? Math.max(...pieces) + 1 : 0,
    looseEnds: (p.check?.oddPointPositions.length ?? 0) > 0,
    start: design.start !== undefined,
    finish: design.end !== undefined,
    widestGap: p.check?.gap != null,
    routeKinds: p.strokes ? [...new Set(p.strokes.map((s) => s.kind))] : [],
    needle: p.needle !== null,
  });
  return (
    <>
    <div
      ref={p.boxRef}
      className="relative h-[62vh] min-h-[22rem] overflow-hidden rounded border border-muslin-300 bg-muslin-50"
      tabIndex={0}
      role="application"
      aria-label={`Block canvas, ${formatSize(design.width, design.height, design.units, p.viewerUnits)}, ${design.lines.length} quilting lines. Press ? for keys.`}
      data-testid="block-canvas"
    >
      {size.width > 0 && (
        <EditorStage width={size.width} height={size.height} units={design.units} view={vp.view} onViewChange={vp.setView} onPointer={ctl.onPointer} onDoubleClick={ctl.onDoubleClick} cursor={ctl.cursor}>
          <BlockLayer design={design} view={vp.view} stageWidth={size.width} stageHeight={size.height} theme={theme} showGrid={p.showGrid}>
            <SeamLines seams={design.seams} view={vp.view} theme={theme} patch={p.patch} selected={selectedSeams} />
          </BlockLayer>
          <QuiltingLineLayer lines={design.lines} view={vp.view} theme={theme} selected={selectedLines} pieceOfLine={pieces} oddPoints={p.check?.oddPointPositions ?? NO_POINTS} start={design.start} end={design.end} ownOrder={p.showOwnOrder ? ctl.ownOrder : NO_ORDER} dimmed={p.strokes !== null} stageWidth={size.width} stageHeight={size.height} />
          {p.strokes && <RouteLayer strokes={p.strokes} view={vp.view} theme={theme} needle={p.needle} />}
          <OverlayLayer view={vp.view} theme={theme} preview={p.preview} snapped={ctl.snapped?.point ?? null} guides={p.guides} gap={p.check?.gap ?? null} pointerTag={ctl.pointerTag} />
          <RulerLayer units={design.units} view={vp.view} stageWidth={size.width} stageHeight={size.height} theme={theme} />
        </EditorStage>
      )}
    </div>
    <LineLegend entries={legend} />
    </>
  );
}
