/**
 * Canvas colours, read from the same palette tokens as the page (src/styles/global.css), so the canvas
 * and the controls around it always agree. Konva needs concrete colour strings, hence this lookup.
 */
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
  seam: ['--color-denim-500', '#3d5a80'],
  line: ['--color-indigo-ink', '#1f2f4a'],
  selected: ['--color-ochre-500', '#c8922e'],
  preview: ['--color-madder-500', '#b5473a'],
  guide: ['--color-sage-500', '#6f8f72'],
  oddPoint: ['--color-madder-600', '#983a2f'],
  stitch: ['--color-indigo-ink', '#1f2f4a'],
  retrace: ['--color-madder-500', '#b5473a'],
  ditch: ['--color-denim-500', '#3d5a80'],
  edge: ['--color-sage-600', '#587459'],
  needle: ['--color-madder-600', '#983a2f'],
  gap: ['--color-ochre-500', '#c8922e'],
} as const satisfies Record<string, readonly [string, string]>;

const PIECE_TOKENS = [
  ['--color-denim-600', '#2f4868'],
  ['--color-madder-500', '#b5473a'],
  ['--color-sage-600', '#587459'],
  ['--color-ochre-500', '#c8922e'],
  ['--color-indigo-ink', '#1f2f4a'],
  ['--color-madder-600', '#983a2f'],
] as const;

/** Reads the palette from the document's computed style; falls back to the token defaults. */
export function readCanvasTheme(root: Element = document.documentElement): CanvasTheme {
  const style = getComputedStyle(root);
  const read = ([name, fallback]: readonly [string, string]) => style.getPropertyValue(name).trim() || fallback;
  const entries = Object.entries(TOKENS).map(([k, token]) => [k, read(token)] as const);
  return { ...(Object.fromEntries(entries) as Omit<CanvasTheme, 'pieces'>), pieces: PIECE_TOKENS.map(read) };
}
