import { Layer, Shape } from 'react-konva';
import type { Units } from '@shared/design/design.schema.ts';
import type { CanvasTheme } from '../canvasTheme.ts';
import { buildRulerTicks } from '../rulerTicks.ts';
import { RULER_PX, toScreen, toWorld, type Viewport } from '../viewport.ts';

export interface RulerLayerProps {
  readonly units: Units;
  readonly view: Viewport;
  readonly stageWidth: number;
  readonly stageHeight: number;
  readonly theme: CanvasTheme;
}

/** Rulers on the top and left edges in screen space, marked to 1/8 in (or mm), numbered at whole units. */
export function RulerLayer({ units, view, stageWidth, stageHeight, theme }: RulerLayerProps) {
  return (
    <Layer listening={false}>
      <Shape
        sceneFunc={(c) => {
          const ctx = c._context;
          ctx.save();
          ctx.fillStyle = theme.ruler;
          ctx.fillRect(0, 0, stageWidth, RULER_PX);
          ctx.fillRect(0, 0, RULER_PX, stageHeight);
          ctx.strokeStyle = theme.rulerInk;
          ctx.fillStyle = theme.rulerInk;
          ctx.lineWidth = 1;
          ctx.font = '10px "Source Sans 3", sans-serif';
          const [wx0, wy0] = toWorld(view, [RULER_PX, RULER_PX]);
          const [wx1, wy1] = toWorld(view, [stageWidth, stageHeight]);
          const lengths = [RULER_PX * 0.6, RULER_PX * 0.45, RULER_PX * 0.3, RULER_PX * 0.2];
          ctx.beginPath();
          for (const t of buildRulerTicks(wx0, wx1, view.scale, units)) {
            const x = Math.round(toScreen(view, [t.at, 0])[0]) + 0.5;
            ctx.moveTo(x, RULER_PX);
            ctx.lineTo(x, RULER_PX - (lengths[t.rank] ?? 3));
            if (t.label !== undefined) ctx.fillText(t.label, x + 2, 9);
          }
          for (const t of buildRulerTicks(wy0, wy1, view.scale, units)) {
            const y = Math.round(toScreen(view, [0, t.at])[1]) + 0.5;
            ctx.moveTo(RULER_PX, y);
            ctx.lineTo(RULER_PX - (lengths[t.rank] ?? 3), y);
            if (t.label !== undefined) ctx.fillText(t.label, 2, y + 10);
          }
          ctx.stroke();
          ctx.fillStyle = theme.ruler;
          ctx.fillRect(0, 0, RULER_PX, RULER_PX);
          ctx.fillStyle = theme.rulerInk;
          ctx.fillText(units, 4, 14);
          ctx.restore();
        }}
      />
    </Layer>
  );
}
