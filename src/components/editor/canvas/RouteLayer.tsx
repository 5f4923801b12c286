import { useMemo } from 'react';
import { Circle, Group, Layer, Label, Shape, Tag, Text } from 'react-konva';
import { STROKE_KINDS, type StrokeKind } from '@shared/contract/strokes.ts';
import { arrowMarks, passStarts, type NeedlePosition, type RouteStroke } from '../../route/routePlayback.ts';
import { dashFor, LINE_STYLES } from '@shared/style/lineStyles.ts';
import type { CanvasTheme } from '../canvasTheme.ts';
import type { Viewport } from '../viewport.ts';
import { tracePolylines } from './drawPolylines.ts';

export interface RouteLayerProps {
  readonly strokes: readonly RouteStroke[];
  readonly view: Viewport;
  readonly theme: CanvasTheme;
  /** The needle, when a player is running or paused; strokes before it are drawn as sewn. */
  readonly needle: NeedlePosition | null;
  /** Only this pass at full strength (a walkthrough step); null shows every pass alike. */
  readonly focusPass?: number | null;
  /** Draw "Pass n" at each pass start (default); the walkthrough places its own labels around its markers. */
  readonly passLabels?: boolean;
}

/** How each stroke kind is drawn: the shared visual language (stitching solid, each travel kind its own dash). */
function strokeStyle(kind: StrokeKind, theme: CanvasTheme): { color: string; dash: number[]; width: number } {
  const style = LINE_STYLES[kind];
  return { color: theme[kind], dash: dashFor(style), width: style.width };
}

/** Above this many passes the labels would cover the block; the check card still counts them. */
const MAX_PASS_LABELS = 60;

/**
 * A route on the canvas: strokes styled by kind, direction arrows, pass numbers at each pass start and the needle.
 * Reusable: the workbench's route preview and the student walkthrough both draw routes with it. View only.
 */
export function RouteLayer({ strokes, view, theme, needle, focusPass = null, passLabels = true }: RouteLayerProps) {
  const px = 1 / view.scale;
  const arrowSpacing = 90 * px;
  const arrows = useMemo(() => strokes.flatMap((s, i) => arrowMarks(s.points, arrowSpacing).map((a) => ({ ...a, kind: s.kind, key: i }))), [strokes, arrowSpacing]);
  const labels = useMemo(() => passStarts(strokes), [strokes]);
  const sewnUpTo = needle ? needle.strokeIndex : -1;
  return (
    <Layer listening={false}>
      <Group x={view.x} y={view.y} scaleX={view.scale} scaleY={view.scale}>
        {STROKE_KINDS.map((kind) => {
          const style = strokeStyle(kind, theme);
          const mine = strokes.filter((s) => s.kind === kind && (focusPass === null || s.pass === focusPass));
          const others = focusPass === null ? [] : strokes.filter((s) => s.kind === kind && s.pass !== focusPass);
          return (
            <Group key={kind}>
              {others.length > 0 && (
                <Shape sceneFunc={(ctx, shape) => { tracePolylines(ctx, others.map((s) => s.points)); ctx.strokeShape(shape); }} stroke={style.color} strokeWidth={style.width} dash={style.dash} opacity={0.2} strokeScaleEnabled={false} lineCap="round" lineJoin="round" />
              )}
              <Shape sceneFunc={(ctx, shape) => { tracePolylines(ctx, mine.map((s) => s.points)); ctx.strokeShape(shape); }} stroke={style.color} strokeWidth={style.width} dash={style.dash} opacity={needle ? 0.35 : 1} strokeScaleEnabled={false} lineCap="round" lineJoin="round" />
            </Group>
          );
        })}
        {needle && (
          <Shape
            sceneFunc={(ctx, shape) => {
              tracePolylines(ctx, strokes.slice(0, sewnUpTo).map((s) => s.points));
              const current = strokes[sewnUpTo];
              if (current) {
                const pts = current.points;
                ctx.moveTo(pts[0]![0], pts[0]![1]);
                for (let i = 1; i < needle.segment; i++) ctx.lineTo(pts[i]![0], pts[i]![1]);
                ctx.lineTo(needle.point[0], needle.point[1]);
              }
              ctx.strokeShape(shape);
            }}
            stroke={theme.stitch}
            strokeWidth={3.5}
            strokeScaleEnabled={false}
            lineCap="round"
            lineJoin="round"
          />
        )}
        {STROKE_KINDS.map((kind) => {
          const mine = arrows.filter((a) => a.kind === kind);
          if (mine.length === 0) return null;
          // One shape per kind for all arrows: routes over dense designs have thousands of them.
          return (
            <Shape
              key={`arrows-${kind}`}
              sceneFunc={(ctx, shape) => {
                ctx.beginPath();
                const r = 5 * px;
                for (const { point: [x, y], angle } of mine) {
                  const c = Math.cos(angle);
                  const s = Math.sin(angle);
                  ctx.moveTo(x + c * r, y + s * r);
                  ctx.lineTo(x - c * r - s * r * 0.8, y - s * r + c * r * 0.8);
                  ctx.lineTo(x - c * r + s * r * 0.8, y - s * r - c * r * 0.8);
                  ctx.closePath();
                }
                ctx.fillShape(shape);
              }}
              fill={strokeStyle(kind, theme).color}
              opacity={needle ? 0.4 : 0.9}
            />
          );
        })}
        {passLabels && labels.length <= MAX_PASS_LABELS && labels.map((l) => (
          <Label key={l.pass} x={l.point[0]} y={l.point[1]} opacity={focusPass === null || focusPass === l.pass ? 1 : 0.3}>
            <Tag fill={theme.paper} stroke={theme.stitch} strokeWidth={1} strokeScaleEnabled={false} cornerRadius={3 * px} pointerDirection="down" pointerWidth={6 * px} pointerHeight={5 * px} />
            <Text text={`Pass ${l.pass}`} fontSize={12 * px} padding={3 * px} fill={theme.stitch} fontStyle="bold" />
          </Label>
        ))}
        {needle && <Circle x={needle.point[0]} y={needle.point[1]} radius={6 * px} fill={theme.needle} stroke={theme.paper} strokeWidth={2} strokeScaleEnabled={false} />}
      </Group>
    </Layer>
  );
}
