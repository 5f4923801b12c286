import type { ReactNode } from 'react';
import { Group, Layer, Rect, Shape } from 'react-konva';
import type { Design } from '@shared/design/design.schema.ts';
import { bindingBandOf } from '@shared/design/design.schema.ts';
import type { CanvasTheme } from '../canvasTheme.ts';
import type { Viewport } from '../viewport.ts';
import { visibleWorld } from '../viewport.ts';
import { RULER_STEPS } from '../rulerTicks.ts';

export interface BlockLayerProps {
  readonly design: Design;
  readonly view: Viewport;
  readonly stageWidth: number;
  readonly stageHeight: number;
  readonly theme: CanvasTheme;
  readonly showGrid: boolean;
  /** Drawn over the block in the same Konva layer (the seams), so the stage needs one layer fewer. */
  readonly children?: ReactNode;
}

/**
 * The block's fabric, its binding band and the marking grid (whole units, plus halves when there is room).
 * Drawn in design units inside a group carrying the viewport; line widths stay in screen pixels.
 */
export function BlockLayer({ design, view, stageWidth, stageHeight, theme, showGrid, children }: BlockLayerProps) {
  const band = bindingBandOf(design);
  return (
    <Layer listening={false}>
      <Group x={view.x} y={view.y} scaleX={view.scale} scaleY={view.scale}>
        <Rect x={0} y={0} width={design.width} height={design.height} fill={theme.fabric} />
        <Rect x={band / 2} y={band / 2} width={design.width - band} height={design.height - band} stroke={theme.gridMajor} strokeWidth={band} opacity={0.6} />
        {showGrid && (
          <Shape
            sceneFunc={(ctx, shape) => {
              const [x0, y0, x1, y1] = visibleWorld(view, stageWidth, stageHeight);
              const sub = RULER_STEPS[design.units][1]!;
              const step = sub * view.scale >= 12 ? sub : 1;
              ctx.beginPath();
              const fromX = Math.max(0, Math.ceil(x0 / step) * step);
              const toX = Math.min(design.width, x1);
              for (let x = fromX; x <= toX + 1e-9; x += step) {
                ctx.moveTo(x, 0);
                ctx.lineTo(x, design.height);
              }
              const fromY = Math.max(0, Math.ceil(y0 / step) * step);
              const toY = Math.min(design.height, y1);
              for (let y = fromY; y <= toY + 1e-9; y += step) {
                ctx.moveTo(0, y);
                ctx.lineTo(design.width, y);
              }
              ctx.strokeShape(shape);
            }}
            stroke={theme.grid}
            strokeWidth={1}
            strokeScaleEnabled={false}
          />
        )}
        <Rect x={0} y={0} width={design.width} height={design.height} stroke={theme.line} strokeWidth={1.5} strokeScaleEnabled={false} />
      </Group>
      {children}
    </Layer>
  );
}
