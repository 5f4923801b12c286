import type { Point, Polyline } from '../geometry/point.ts';
import type { DesignCommand } from '../design/commands.ts';

/**
 * Pointer and key input a tool reacts to. Points are in design units and already snapped by the caller
 * (see snap.ts), so tools never see screen pixels.
 */
export type ToolEvent =
  /**
   * `raw` is the pointer before snapping: hit tests use it, so snapping never moves a click off the line it is on.
   * `shift` adds to or takes from a pick.
   */
  | { readonly kind: 'pointerDown'; readonly point: Point; readonly raw?: Point; readonly shift?: boolean }
  | { readonly kind: 'pointerMove'; readonly point: Point }
  | { readonly kind: 'pointerUp'; readonly point: Point }
  | { readonly kind: 'doubleClick'; readonly point: Point }
  | { readonly kind: 'key'; readonly key: 'Enter' | 'Escape' | 'Backspace' };

/**
 * What a tool step yields: its next state, lines to draw as a preview (never saved), and at most one
 * command for history (one gesture = one command).
 */
export interface ToolStep<S> {
  readonly state: S;
  readonly preview?: readonly Polyline[];
  readonly command?: DesignCommand;
}
