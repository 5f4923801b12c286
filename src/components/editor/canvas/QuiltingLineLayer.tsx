import { useMemo } from 'react';
import { Circle, Group, Layer, RegularPolygon, Shape, Text } from 'react-konva';
import type { Point, Polyline } from '@shared/geometry/point.ts';
import type { CanvasTheme } from '../canvasTheme.ts';
import type { Viewport } from '../viewport.ts';
import { tracePolylines } from './drawPolylines.ts';
import { LineBitmap, type LineGroup } from './LineBitmap.tsx';
import { buildPlayback, needleAt } from '../../route/routePlayback.ts';

export interface QuiltingLineLayerProps {
  readonly lines: readonly Polyline[];
  readonly view: Viewport;
  readonly theme: CanvasTheme;
  readonly selected: ReadonlySet<number>;
  /** Piece number of each line (same order as `lines`), to colour pieces apart; null draws every line alike. */
  readonly pieceOfLine: readonly number[] | null;
  readonly oddPoints: readonly Point[];
  readonly start: Point | undefined;
  readonly end: Point | undefined;
  /** The quilter's own stitching order so far: line indices, first sewn first. */
  readonly ownOrder: readonly number[];
  /** Dim the lines (while a route is shown on top). */
  readonly dimmed: boolean;
  readonly stageWidth: number;
  readonly stageHeight: number;
}

/** Above this many points the lines are drawn as a bitmap that pans and zooms without restroking (see LineBitmap). */
export const BITMAP_POINTS = 4000;

/** Quilting lines, coloured by piece, with the selection, odd points, start/end marks and the own-order numbers. */
export function QuiltingLineLayer(props: QuiltingLineLayerProps) {
  const { lines, view, theme, selected, pieceOfLine, oddPoints, start, end, ownOrder, dimmed, stageWidth, stageHeight } = props;
  const px = 1 / view.scale;
  const groups = useMemo(() => groupByPiece(lines, pieceOfLine), [lines, pieceOfLine]);
  const asBitmap = useMemo(() => lines.reduce((n, l) => n + l.length, 0) + oddPoints.length * 4 > BITMAP_POINTS, [lines, oddPoints]);
  const bitmapGroups = useMemo<LineGroup[]>(
    () => (asBitmap ? [...groups.map(([piece, group]) => ({ color: piece < 0 ? theme.line : theme.pieces[piece % theme.pieces.length]!, width: 2, lines: group })), { color: theme.oddPoint, width: 2, lines: [], markers: oddPoints }] : []),
    [asBitmap, groups, theme, oddPoints],
  );
  return (
    // One Konva layer for the bitmap (dense designs) and the vector marks over it.
    <Layer listening={false} opacity={dimmed ? 0.35 : 1}>
      {asBitmap && <LineBitmap groups={bitmapGroups} view={view} stageWidth={stageWidth} stageHeight={stageHeight} />}
      <Group x={view.x} y={view.y} scaleX={view.scale} scaleY={view.scale}>
        {!asBitmap && groups.map(([piece, group]) => (
          <Shape
            key={piece}
            sceneFunc={(ctx, shape) => {
              tracePolylines(ctx, group);
              ctx.strokeShape(shape);
            }}
            stroke={piece < 0 ? theme.line : theme.pieces[piece % theme.pieces.length]!}
            strokeWidth={2}
            strokeScaleEnabled={false}
            lineCap="round"
            lineJoin="round"
          />
        ))}
        {selected.size > 0 && (
          <Shape
            sceneFunc={(ctx, shape) => {
              tracePolylines(ctx, lines.filter((_, i) => selected.has(i)));
              ctx.strokeShape(shape);
            }}
            stroke={theme.selected}
            strokeWidth={6}
            opacity={0.6}
            strokeScaleEnabled={false}
            lineCap="round"
          />
        )}
        {oddPoints.length > 0 && !asBitmap && (
          // One shape for all odd points: a dense design can have thousands, and one node each would stall panning.
          <Shape
            sceneFunc={(ctx, shape) => {
              ctx.beginPath();
              for (const [x, y] of oddPoints) ctx.rect(x - 5 * px, y - 5 * px, 10 * px, 10 * px);
              ctx.strokeShape(shape);
            }}
            stroke={theme.oddPoint}
            strokeWidth={2}
            strokeScaleEnabled={false}
          />
        )}
        {/* Start: a ring with a dot; finish: a diamond (shapes from shared/style/lineStyles.ts, as in the legend). */}
        {start && (
          <Group x={start[0]} y={start[1]}>
            <Circle radius={7 * px} fill={theme.paper} stroke={theme.line} strokeWidth={2} strokeScaleEnabled={false} />
            <Circle radius={2.5 * px} fill={theme.line} />
          </Group>
        )}
        {end && <RegularPolygon x={end[0]} y={end[1]} sides={4} radius={8 * px} fill={theme.line} stroke={theme.paper} strokeWidth={1.5} strokeScaleEnabled={false} />}
        {ownOrder.map((li, k) => {
          const at = midpointOf(lines[li]);
          return at ? <Text key={`own${k}`} x={at[0] + 4 * px} y={at[1] - 14 * px} text={String(k + 1)} fontSize={13 * px} fontStyle="bold" fill={theme.retrace} /> : null;
        })}
      </Group>
    </Layer>
  );
}

function groupByPiece(lines: readonly Polyline[], pieceOfLine: readonly number[] | null): [number, Polyline[]][] {
  const map = new Map<number, Polyline[]>();
  lines.forEach((line, i) => {
    const piece = pieceOfLine?.[i] ?? -1;
    const list = map.get(piece);
    if (list) list.push(line);
    else map.set(piece, [line]);
  });
  return [...map.entries()];
}

/** Where the order number goes: halfway along the line. */
function midpointOf(line: Polyline | undefined): Point | null {
  if (!line || line.length < 2) return null;
  const playback = buildPlayback([{ pass: 1, kind: 'stitch', points: line }]);
  return needleAt(playback, playback.total / 2)?.point ?? null;
}
