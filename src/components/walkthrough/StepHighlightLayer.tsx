import { useMemo } from 'react';
import { Circle, Group, Layer, Rect, RegularPolygon, Shape, Text } from 'react-konva';
import { LABEL_FONT_PX, LABEL_PADDING, placeLabels, type LabelRequest } from '@shared/walkthrough/labelPlacement.ts';
import type { Step } from '@shared/walkthrough/walkthrough.types.ts';
import type { CanvasTheme } from '../editor/canvasTheme.ts';
import { tracePolylines } from '../editor/canvas/drawPolylines.ts';
import type { Viewport } from '../editor/viewport.ts';
import { arrowMarks, passStarts, type RouteStroke } from '../route/routePlayback.ts';

export interface StepHighlightLayerProps {
  readonly step: Step;
  readonly strokes: readonly RouteStroke[];
  readonly view: Viewport;
  readonly theme: CanvasTheme;
  /** The stage size, px: labels stay inside it. */
  readonly width: number;
  readonly height: number;
  /** Show "Pass n" at each pass start (the marker's own label is always shown). */
  readonly passLabels: boolean;
}

/**
 * The current step over the route drawn by RouteLayer: its strokes under a wide band with large direction
 * arrows, a ring where the step begins and a square where it ends; start and tie-off steps get a ringed marker.
 * Labels ("Start here", "Pass n") are placed in screen pixels by shared/walkthrough/labelPlacement.ts so that none
 * overlaps another or the marker; a label with no free spot is left off. View only (listening off).
 */
export function StepHighlightLayer({ step, strokes, view, theme, width, height, passLabels }: StepHighlightLayerProps) {
  const px = 1 / view.scale;
  const lines = useMemo(() => step.strokes.map((i) => strokes[i]!.points), [step, strokes]);
  const arrows = useMemo(() => lines.flatMap((points) => arrowMarks(points, 70 * px)), [lines, px]);
  const mark = step.kind === 'start' ? 'Start here' : step.kind === 'tie-off' ? 'Tie off here' : null;
  const labels = useMemo(() => {
    const screen = (p: readonly [number, number]): [number, number] => [view.x + p[0] * view.scale, view.y + p[1] * view.scale];
    const starts = passLabels ? passStarts(strokes) : [];
    // The marker's label first, then the current pass, then the others: the first ones win a contested spot.
    const ordered = [...starts.filter((s) => s.pass === step.pass), ...starts.filter((s) => s.pass !== step.pass)];
    const requests: LabelRequest[] = [
      ...(mark ? [{ key: 'mark', text: mark, anchor: screen(step.from) }] : []),
      ...ordered.map((s) => ({ key: `pass-${s.pass}`, text: `Pass ${s.pass}`, anchor: screen(s.point) })),
    ];
    return placeLabels(requests, { minX: 0, minY: 0, maxX: width, maxY: height }, mark ? [screen(step.from)] : []).placed;
  }, [strokes, step, mark, view, width, height, passLabels]);
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
          </Group>
        )}
      </Group>
      {labels.map((l) => (
        <Group key={l.key} x={l.box.minX} y={l.box.minY} name={`label-${l.key}`}>
          <Rect width={l.box.maxX - l.box.minX} height={l.box.maxY - l.box.minY} fill={theme.paper} stroke={l.key === 'mark' ? theme.highlight : theme.stitch} strokeWidth={1} cornerRadius={3} />
          <Text text={l.text} x={LABEL_PADDING} y={LABEL_PADDING} fontSize={LABEL_FONT_PX} fontStyle="bold" fill={l.key === 'mark' ? theme.highlight : theme.stitch} wrap="none" />
        </Group>
      ))}
    </Layer>
  );
}
