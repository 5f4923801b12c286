import { Group, Line, Shape } from 'react-konva';
import type { Polyline } from '@shared/geometry/point.ts';
import type { Patch } from '@shared/layouts/patch.ts';
import { LINE_STYLES } from '@shared/style/lineStyles.ts';
import type { CanvasTheme } from '../canvasTheme.ts';
import type { Viewport } from '../viewport.ts';
import { tracePolylines } from './drawPolylines.ts';

export interface SeamLinesProps {
  readonly seams: readonly Polyline[];
  readonly view: Viewport;
  readonly theme: CanvasTheme;
  /** A patch to highlight (the motif tool's target), if any. */
  readonly patch: Patch | null;
  /** Seam indices in the selection. */
  readonly selected: ReadonlySet<number>;
}

/** The seam lines of the pieced layout (where stitch-in-the-ditch travel runs): thin and solid, never dashed like travel. View only; drawn in the block's layer (BlockLayer's children), which keeps the stage within Konva's recommended 3–5 layers. */
export function SeamLines({ seams, view, theme, patch, selected }: SeamLinesProps) {
  return (
      <Group x={view.x} y={view.y} scaleX={view.scale} scaleY={view.scale}>
        {patch && <Line points={patch.polygon.flat()} closed fill={theme.selected} opacity={0.25} stroke={theme.selected} strokeWidth={2} strokeScaleEnabled={false} />}
        <Shape
          sceneFunc={(ctx, shape) => {
            tracePolylines(ctx, seams);
            ctx.strokeShape(shape);
          }}
          stroke={theme.seam}
          strokeWidth={LINE_STYLES.seam.width}
          strokeScaleEnabled={false}
          lineCap="round"
        />
        {selected.size > 0 && (
          <Shape
            sceneFunc={(ctx, shape) => {
              tracePolylines(ctx, seams.filter((_, i) => selected.has(i)));
              ctx.strokeShape(shape);
            }}
            stroke={theme.selected}
            strokeWidth={5}
            opacity={0.7}
            strokeScaleEnabled={false}
            lineCap="round"
          />
        )}
      </Group>
  );
}
