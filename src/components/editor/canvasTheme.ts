/**
 * Canvas colours. The paper, grid, rulers and selection come from the page's palette tokens (src/styles/global.css),
 * so the canvas and the controls around it agree; every line and mark that carries meaning (seams, quilting lines,
 * the route's kinds, loose ends, the widest gap, line groups) comes from the one visual language in
 * shared/style/lineStyles.ts, which the legend, the SVG export and printed plans share.
 */
import { LINE_GROUP_COLOURS, LINE_STYLES, MARK_STYLES, PREVIEW_COLOUR } from '@shared/style/lineStyles.ts';

export interface CanvasTheme {
  readonly paper: string;
  readonly fabric: string;
  readonly grid: string;
  readonly gridMajor: string;
  readonly ruler: string;
  readonly rulerInk: string;
  readonly seam: string;
  readonly line: string;
  readonly selected: string;
  readonly preview: string;
  readonly guide: string;
  /** The walkthrough's current step (its ends and direction marks). */
  readonly highlight: string;
  readonly oddPoint: string;
  readonly stitch: string;
  readonly retrace: string;
  readonly ditch: string;
  readonly edge: string;
  readonly needle: string;
  readonly gap: string;
  /** Distinct colours for pieces (cycled). */
  readonly pieces: readonly string[];
}

const TOKENS = {
  paper: ['--color-muslin-50', '#fbf8f1'],
  fabric: ['--color-muslin-100', '#f4eee1'],
  grid: ['--color-muslin-200', '#e7dcc5'],
  gridMajor: ['--color-muslin-300', '#d4c4a3'],
  ruler: ['--color-muslin-100', '#f4eee1'],
  rulerInk: ['--color-indigo-ink', '#1f2f4a'],
  selected: ['--color-ochre-500', '#c8922e'],
  guide: ['--color-sage-500', '#6f8f72'],
  highlight: ['--color-madder-600', '#983a2f'],
} as const satisfies Record<string, readonly [string, string]>;

const MEANINGFUL = {
  seam: LINE_STYLES.seam.colour,
  line: LINE_STYLES.quiltingLine.colour,
  preview: PREVIEW_COLOUR,
  oddPoint: MARK_STYLES.looseEnd.colour,
  stitch: LINE_STYLES.stitch.colour,
  retrace: LINE_STYLES.retrace.colour,
  ditch: LINE_STYLES.ditch.colour,
  edge: LINE_STYLES.edge.colour,
  needle: MARK_STYLES.needle.colour,
  gap: MARK_STYLES.widestGap.colour,
} as const;

/** Reads the palette from the document's computed style; falls back to the token defaults. */
export function readCanvasTheme(root: Element = document.documentElement): CanvasTheme {
  const style = getComputedStyle(root);
  const read = ([name, fallback]: readonly [string, string]) => style.getPropertyValue(name).trim() || fallback;
  const entries = Object.entries(TOKENS).map(([k, token]) => [k, read(token)] as const);
  return { ...(Object.fromEntries(entries) as Pick<CanvasTheme, keyof typeof TOKENS>), ...MEANINGFUL, pieces: LINE_GROUP_COLOURS };
}
