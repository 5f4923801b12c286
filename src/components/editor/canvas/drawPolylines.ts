import type { Context } from 'konva/lib/Context';
import type { Polyline } from '@shared/geometry/point.ts';

/** Adds each polyline as a sub-path of the current path (one stroke call draws them all: thousands of lines stay cheap). */
export function tracePolylines(ctx: Context, lines: readonly Polyline[]): void {
  ctx.beginPath();
  for (const line of lines) {
    const first = line[0];
    if (!first) continue;
    ctx.moveTo(first[0], first[1]);
    for (let i = 1; i < line.length; i++) ctx.lineTo(line[i]![0], line[i]![1]);
  }
}
