import { useMemo } from 'react';
import { Circle, Group, Layer, RegularPolygon, Shape, Text } from 'react-konva';
import type { Step } from '@shared/walkthrough/walkthrough.types.ts';
import type { CanvasTheme } from '../editor/canvasTheme.ts';
import { tracePolylines } from '../editor/canvas/drawPolylines.ts';
import type { Viewport } from '../editor/viewport.ts';
import { arrowMarks, type RouteStroke } from '../route/routePlayback.ts';

export interface StepHighlightLayerProps {
  readonly step: Step;
  readonly strokes: readonly RouteStroke[];
  readonly view: Viewport;
  readonly theme: CanvasTheme;
}

/**
 * The current step over the route drawn by RouteLayer: its strokes under a wide band with large direction
 * arrows, a ring where the step begins and a square where it ends; start and tie-off steps get a labelled ring.
 * View only (listening off).
 */
export function StepHighlightLayer({ step, strokes, view, theme }: StepHighlightLayerProps) {
  const px = 1 / view.scale;
  const lines = useMemo(() => step.strokes.map((i) => strokes[i]!.points), [step, strokes]);
  const arrows = useMemo(() => lines.flatMap((points) => arrowMarks(points, 70 * px)), [lines, px]);
  const mark = step.kind === 'start' ? 'Start here' : step.kind === 'tie-off' ? 'Tie off here' : null;
  return (
    <Layer listening={false}>
      <Group x={view.x} y={view.y} scaleX={view.scale} scaleY={view.scale}>
        {lines.length > 0 && (
          <Shape
            sceneFunc={(ctx, shape) => {
              tracePolylines(ctx, lines);
              ctx.strokeShape(shape);
            }}
            stroke={theme.selected}
            strokeWidth={12}
            opacity={0.45}
            strokeScaleEnabled={false}
            lineCap="round"
            lineJoin="round"
          />
        )}
        {arrows.map((a, i) => (
          <RegularPolygon key={i} x={a.point[0]} y={a.point[1]} sides={3} radius={9 * px} rotation={(a.angle * 180) / Math.PI + 90} fill={theme.highlight} stroke={theme.paper} strokeWidth={1.5} strokeScaleEnabled={false} />
        ))}
        {lines.length > 0 && (
          <>
            <Circle x={step.from[0]} y={step.from[1]} radius={10 * px} stroke={theme.highlight} strokeWidth={3} strokeScaleEnabled={false} />
            <RegularPolygon x={step.to[0]} y={step.to[1]} sides={4} radius={9 * px} rotation={45} stroke={theme.highlight} strokeWidth={3} strokeScaleEnabled={false} />
          </>
        )}
        {mark && (
          <Group x={step.from[0]} y={step.from[1]}>
            <Circle radius={16 * px} stroke={theme.highlight} strokeWidth={4} strokeScaleEnabled={false} />
            <Circle radius={6 * px} fill={theme.needle} />
            <Text text={mark} x={20 * px} y={-9 * px} fontSize={16 * px} fontStyle="bold" fill={theme.highlight} />
          </Group>
        )}
      </Group>
    </Layer>
  );
}
