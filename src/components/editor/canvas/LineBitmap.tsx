import { useEffect, useMemo, useRef, useState } from 'react';
import type Konva from 'konva';
import { Image } from 'react-konva';
import type { Point, Polyline } from '@shared/geometry/point.ts';
import type { Viewport } from '../viewport.ts';

/** Lines drawn alike: one colour and width (CSS px). */
export interface LineGroup {
  readonly color: string;
  readonly width: number;
  readonly lines: readonly Polyline[];
  /** Points marked with a 10 px square (odd points), drawn in the same colour. */
  readonly markers?: readonly Point[];
}

/** Wait after the last zoom or pan before redrawing the lines sharp (ms). */
const SETTLE_MS = 120;

/**
 * Many lines as one bitmap: drawn once for a viewport, then only moved and scaled while the quilter pans or
 * zooms, and redrawn sharp SETTLE_MS after the view stops changing. Stroking tens of thousands of segments
 * every frame is what makes a dense design stutter (especially with software raster); a bitmap moves in
 * well under a millisecond. Must be placed in a Layer with no transform of its own.
 */
export function LineBitmap({ groups, view, stageWidth, stageHeight }: { groups: readonly LineGroup[]; view: Viewport; stageWidth: number; stageHeight: number }) {
  const canvas = useMemo(() => document.createElement('canvas'), []);
  const [rendered, setRendered] = useState<Viewport>(view);
  const node = useRef<Konva.Image>(null);
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);

  useEffect(() => {
    clearTimeout(timer.current);
    timer.current = setTimeout(() => setRendered(view), SETTLE_MS);
    return () => clearTimeout(timer.current);
  }, [view]);

  useEffect(() => {
    const dpr = window.devicePixelRatio || 1;
    canvas.width = Math.max(1, Math.round(stageWidth * dpr));
    canvas.height = Math.max(1, Math.round(stageHeight * dpr));
    const ctx = canvas.getContext('2d');
    if (!ctx) return;
    ctx.setTransform(1, 0, 0, 1, 0, 0);
    ctx.clearRect(0, 0, canvas.width, canvas.height);
    ctx.lineCap = 'round';
    ctx.lineJoin = 'round';
    for (const g of groups) {
      ctx.setTransform(dpr * rendered.scale, 0, 0, dpr * rendered.scale, dpr * rendered.x, dpr * rendered.y);
      ctx.beginPath();
      for (const line of g.lines) {
        const first = line[0];
        if (!first) continue;
        ctx.moveTo(first[0], first[1]);
        for (let i = 1; i < line.length; i++) ctx.lineTo(line[i]![0], line[i]![1]);
      }
      ctx.setTransform(dpr, 0, 0, dpr, 0, 0);
      for (const [x, y] of g.markers ?? []) ctx.rect(x * rendered.scale + rendered.x - 5, y * rendered.scale + rendered.y - 5, 10, 10);
      ctx.strokeStyle = g.color;
      ctx.lineWidth = g.width;
      ctx.stroke();
    }
    // The bitmap changed under the same Konva node: ask its layer to redraw.
    node.current?.getLayer()?.batchDraw();
  }, [canvas, groups, rendered, stageWidth, stageHeight]);

  const k = view.scale / rendered.scale;
  return <Image ref={node} image={canvas} x={view.x - rendered.x * k} y={view.y - rendered.y * k} width={stageWidth} height={stageHeight} scaleX={k} scaleY={k} listening={false} />;
}
