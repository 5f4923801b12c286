import { Circle, Group, Label, Layer, Line, Shape, Tag, Text } from 'react-konva';
import type { Point, Polyline } from '@shared/geometry/point.ts';
import type { Guide } from '@shared/editor/guides.ts';
import type { GapView } from '../../route/routeCheckView.ts';
import type { CanvasTheme } from '../canvasTheme.ts';
import type { Viewport } from '../viewport.ts';
import { tracePolylines } from './drawPolylines.ts';

export interface OverlayLayerProps {
  readonly view: Viewport;
  readonly theme: CanvasTheme;
  /** The gesture in progress (a line being drawn, lines being moved, a motif before it is placed). */
  readonly preview: readonly Polyline[];
  readonly snapped: Point | null;
  readonly guides: readonly Guide[];
  /** The widest gap from the gap check, drawn as its empty circle. */
  readonly gap: GapView | null;
  /** A word beside the pointer (which end the start-and-end tool sets next), or null. */
  readonly pointerTag: { readonly point: Point; readonly text: string } | null;
}

/** Ephemeral marks over the design: preview, snap point, marking guides and the widest gap. View only. */
export function OverlayLayer({ view, theme, preview, snapped, guides, gap, pointerTag }: OverlayLayerProps) {
  const px = 1 / view.scale;
  return (
    <Layer listening={false}>
      <Group x={view.x} y={view.y} scaleX={view.scale} scaleY={view.scale}>
        {/* A thin ring, not a filled disc: the quilting inside it stays readable. */}
        {gap && <Circle x={gap.center[0]} y={gap.center[1]} radius={gap.radius} stroke={theme.gap} strokeWidth={1.25} dash={[5, 3]} strokeScaleEnabled={false} />}
        {guides.map((g, i) => (
          <Line key={i} points={[g[0][0], g[0][1], g[1][0], g[1][1]]} stroke={theme.guide} strokeWidth={1.5} dash={[10, 6]} strokeScaleEnabled={false} />
        ))}
        {preview.length > 0 && (
          <Shape
            sceneFunc={(ctx, shape) => {
              tracePolylines(ctx, preview);
              ctx.strokeShape(shape);
            }}
            stroke={theme.preview}
            strokeWidth={2}
            strokeScaleEnabled={false}
            lineCap="round"
            lineJoin="round"
          />
        )}
        {pointerTag && (
          <Label x={pointerTag.point[0] + 10 * px} y={pointerTag.point[1] + 10 * px} scaleX={px} scaleY={px}>
            <Tag fill={theme.paper} stroke={theme.line} strokeWidth={1} cornerRadius={3} />
            <Text text={pointerTag.text} fontSize={12} padding={3} fill={theme.line} />
          </Label>
        )}
        {snapped && <Circle x={snapped[0]} y={snapped[1]} radius={5 * px} stroke={theme.preview} strokeWidth={1.5} strokeScaleEnabled={false} />}
      </Group>
    </Layer>
  );
}
