// Which entries the legend under a block shows: only what is on the canvas right now, in the order a quilter reads
// it (the block's seams, the lines, then the route and its marks). Pure, with tests beside it.
import { STROKE_KINDS, type StrokeKind } from '@shared/contract/strokes.ts';
import { LINE_GROUP_COLOURS, type LineStyleName, type MarkName } from '@shared/style/lineStyles.ts';

export interface CanvasContents {
  readonly seams: boolean;
  readonly lines: boolean;
  /** Line groups coloured apart on the canvas (0 or 1: lines drawn alike). */
  readonly lineGroups: number;
  readonly looseEnds: boolean;
  readonly start: boolean;
  readonly finish: boolean;
  readonly widestGap: boolean;
  /** Stroke kinds of the route on show; empty when no route is shown. */
  readonly routeKinds: readonly StrokeKind[];
  readonly needle: boolean;
}

export type LegendEntry =
  | { readonly kind: 'line'; readonly style: LineStyleName }
  | { readonly kind: 'mark'; readonly mark: MarkName }
  | { readonly kind: 'groups'; readonly colours: readonly string[] };

export function legendEntries(c: CanvasContents): LegendEntry[] {
  const out: LegendEntry[] = [];
  if (c.seams) out.push({ kind: 'line', style: 'seam' });
  const routeShown = c.routeKinds.length > 0;
  // Under a route the lines are faded and drawn alike, so their group colours would explain nothing.
  if (c.lines && c.lineGroups > 1 && !routeShown) out.push({ kind: 'groups', colours: LINE_GROUP_COLOURS.slice(0, Math.min(c.lineGroups, LINE_GROUP_COLOURS.length)) });
  else if (c.lines) out.push({ kind: 'line', style: 'quiltingLine' });
  for (const kind of STROKE_KINDS) if (c.routeKinds.includes(kind)) out.push({ kind: 'line', style: kind });
  if (c.looseEnds && !routeShown) out.push({ kind: 'mark', mark: 'looseEnd' });
  if (c.start) out.push({ kind: 'mark', mark: 'start' });
  if (c.finish) out.push({ kind: 'mark', mark: 'finish' });
  if (c.widestGap) out.push({ kind: 'mark', mark: 'widestGap' });
  if (c.needle) out.push({ kind: 'mark', mark: 'needle' });
  return out;
}
