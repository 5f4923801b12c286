// Threadway's visual language for blocks and routes, one table for the workbench canvas, the replay, the SVG export
// and printed plans, and for the legend that explains them. Each kind of line has its own colour AND its own dash,
// and each mark its own shape, so nothing depends on colour alone (WCAG 2.2, 1.4.1 Use of Color).
//
// Colours come from the Okabe–Ito palette (Okabe and Ito, "Color Universal Design", 2008), published for people
// with colour-vision deficiencies; lineStyles.test.ts checks that the route colours stay apart under simulated
// protanopia, deuteranopia and tritanopia. Seams are a neutral grey: they are the fabric's structure, drawn thin
// and solid under everything.
import type { StrokeKind } from '../contract/strokes.ts';

/** The eight colours of the Okabe–Ito palette (2008). */
export const OKABE_ITO = {
  black: '#000000',
  orange: '#E69F00',
  skyBlue: '#56B4E9',
  bluishGreen: '#009E73',
  yellow: '#F0E442',
  blue: '#0072B2',
  vermillion: '#D55E00',
  reddishPurple: '#CC79A7',
} as const;

export interface LineStyle {
  readonly colour: string;
  /** Line width in screen pixels on the canvas (the SVG scales it with the block). */
  readonly width: number;
  /** Dash pattern in multiples of the line width; empty: solid. */
  readonly dash: readonly number[];
  /** What the legend calls it, in quilting words. */
  readonly label: string;
}

export type LineStyleName = 'seam' | 'quiltingLine' | StrokeKind;

export const LINE_STYLES: Readonly<Record<LineStyleName, LineStyle>> = {
  seam: { colour: '#8C8C8C', width: 1.5, dash: [], label: 'Seam' },
  quiltingLine: { colour: '#1F2F4A', width: 2, dash: [], label: 'Quilting line' },
  stitch: { colour: OKABE_ITO.blue, width: 2.5, dash: [], label: 'Stitching (the route)' },
  retrace: { colour: OKABE_ITO.vermillion, width: 3, dash: [3, 1.5], label: 'Sewn over twice (retrace)' },
  ditch: { colour: OKABE_ITO.reddishPurple, width: 3.5, dash: [0.5, 1.5], label: 'Travel in the ditch' },
  edge: { colour: OKABE_ITO.bluishGreen, width: 3, dash: [4, 1, 0.7, 1], label: 'Travel along the edge (under the binding)' },
};

export type MarkShape = 'hollow-square' | 'ring-dot' | 'diamond' | 'thin-ring' | 'disc';

export interface MarkStyle {
  readonly colour: string;
  readonly shape: MarkShape;
  readonly label: string;
}

export type MarkName = 'looseEnd' | 'start' | 'finish' | 'widestGap' | 'needle';

export const MARK_STYLES: Readonly<Record<MarkName, MarkStyle>> = {
  looseEnd: { colour: OKABE_ITO.orange, shape: 'hollow-square', label: 'Loose end (a line end the thread must leave or stop at)' },
  start: { colour: '#1F2F4A', shape: 'ring-dot', label: 'Where the needle starts' },
  finish: { colour: '#1F2F4A', shape: 'diamond', label: 'Where the needle finishes' },
  widestGap: { colour: OKABE_ITO.black, shape: 'thin-ring', label: 'Widest unquilted space' },
  needle: { colour: OKABE_ITO.vermillion, shape: 'disc', label: 'The needle' },
};

/** Colours for telling line groups apart while the route check shows them (cycled). */
export const LINE_GROUP_COLOURS: readonly string[] = [OKABE_ITO.blue, OKABE_ITO.vermillion, OKABE_ITO.bluishGreen, OKABE_ITO.reddishPurple, OKABE_ITO.orange, OKABE_ITO.skyBlue, OKABE_ITO.black];

/** The colour of a line being drawn (before it is placed). */
export const PREVIEW_COLOUR = OKABE_ITO.skyBlue;

/** A style's dash pattern in the same length unit as `width` (pixels on the canvas, block units in the SVG). */
export function dashFor(style: LineStyle, width: number = style.width): number[] {
  return style.dash.map((d) => d * width);
}
