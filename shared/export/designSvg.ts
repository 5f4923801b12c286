import { dashFor, LINE_STYLES } from '../style/lineStyles.ts';
import type { StrokePath } from '../contract/strokes.ts';
import type { Design, Units } from '../design/design.schema.ts';
import { formatSize } from '../units/units.ts';
import { bindingBandOf, CM_PER_INCH } from '../design/design.schema.ts';
import type { Point, Polyline } from '../geometry/point.ts';
import { thumbnailLines, type ThumbnailLines } from './thumbnailLines.ts';

/** One stroke of a route as the SVG draws it (the planner's and the route check's strokes fit this shape). */
export type SvgStroke = Pick<StrokePath, 'pass' | 'kind' | 'points'>;

export interface DesignSvgOptions {
  /** Shown above the block; escaped. */
  readonly title?: string;
  /** Strokes in stitching order; when given, quilting lines are drawn as the route (pass numbers, arrows). */
  readonly route?: readonly SvgStroke[];
  /** A line under the block (e.g. "the saved route is out of date"); escaped. */
  readonly remark?: string;
  /** The viewer's units: the scale note gives the size in them first (default: the design's). */
  readonly viewerUnits?: Units;
}

// Lines and route kinds in the one visual language (shared/style/lineStyles.ts), so a printed plan reads like the
// workbench and its legend; the block's paper, outline and text are print colours of their own.
const INK = {
  block: '#fbf8f2',
  outline: '#4a4a4a',
  band: '#efe6d6',
  text: '#222222',
  seam: LINE_STYLES.seam.colour,
  stitch: LINE_STYLES.stitch.colour,
} as const;

/**
 * An SVG split into its root element's attributes and its content, so a page can write the root element itself
 * (with its own width and an accessible label, escaped by the page's template engine) around content built here.
 * Every text inside `content` is escaped and every attribute value in it is a number or one of our own words.
 */
export interface SvgParts {
  /** Width and height with units (`in`, `cm`) or in pixels (no unit). */
  readonly width: string;
  readonly height: string;
  readonly viewBox: string;
  readonly content: string;
}

/** The whole SVG document for `parts`. */
export function svgDocument(parts: SvgParts): string {
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${parts.width}" height="${parts.height}" viewBox="${parts.viewBox}">\n${parts.content}\n</svg>`;
}

/**
 * A print-ready SVG of a design (and optionally its route) at true size: the root element's width/height carry
 * physical units (`in` or `cm`), the viewBox is in design units, so printing at 100% reproduces the block.
 * Seams are thin grey, quilting lines solid; with a route, travel strokes are dashed in their own colours,
 * each pass starts at a numbered disc and every stroke carries a direction arrow at half its length.
 * A scale note (size in both inches and cm, and a 1 in and a 1 cm bar) sits under the block.
 * Pure: the same design and options always give the same string.
 */
export function buildDesignSvg(design: Design, options: DesignSvgOptions = {}): string {
  return svgDocument(designSvgParts(design, options));
}

/** buildDesignSvg as parts (see SvgParts). */
export function designSvgParts(design: Design, options: DesignSvgOptions = {}): SvgParts {
  const { width: w, height: h, units } = design;
  const side = Math.max(w, h);
  const margin = side * 0.04;
  const font = side * 0.028;
  const top = options.title ? margin + font * 1.6 : margin;
  const noteHeight = font * 5.5;
  const totalW = w + 2 * margin;
  const totalH = top + h + noteHeight;
  const stroke = side * 0.0025;
  const parts: string[] = [];
  if (options.title) parts.push(`<title>${escapeXml(options.title)}</title>`);
  parts.push(`<rect x="0" y="0" width="${num(w)}" height="${num(h)}" fill="${INK.block}"/>`);
  const band = bindingBandOf(design);
  parts.push(
    `<path d="M0 0H${num(w)}V${num(h)}H0Z M${num(band)} ${num(band)}V${num(h - band)}H${num(w - band)}V${num(band)}Z" fill="${INK.band}" fill-rule="evenodd"/>`,
  );
  parts.push(`<g fill="none" stroke-linecap="round" stroke-linejoin="round">`);
  parts.push(pathGroup(design.seams, `stroke="${INK.seam}" stroke-width="${num(stroke)}"`, 'seams'));
  if (options.route && options.route.length > 0) parts.push(routeGroup(options.route, stroke, side));
  else parts.push(pathGroup(design.lines, `stroke="${INK.stitch}" stroke-width="${num(stroke * 1.6)}"`, 'quilting-lines'));
  parts.push(`<rect x="0" y="0" width="${num(w)}" height="${num(h)}" stroke="${INK.outline}" stroke-width="${num(stroke * 1.2)}"/>`);
  parts.push('</g>');
  if (options.route && options.route.length > 0) parts.push(passLabels(options.route, font));
  if (options.title) {
    parts.push(`<text x="0" y="${num(-font * 0.8)}" font-family="sans-serif" font-size="${num(font * 1.2)}" fill="${INK.text}">${escapeXml(options.title)}</text>`);
  }
  parts.push(scaleNote(design, h + font * 1.6, font, stroke, options.remark, options.viewerUnits ?? design.units));
  return {
    width: `${num(totalW)}${units}`,
    height: `${num(totalH)}${units}`,
    viewBox: `${num(-margin)} ${num(-top)} ${num(totalW)} ${num(totalH)}`,
    content: parts.join('\n'),
  };
}

/**
 * A small SVG of a design for lists: no text, fixed pixel size, quilting lines and seams only, simplified to a
 * fixed point budget (thumbnailLines.ts) so a design at the 200,000-point cap still gives a few kilobytes.
 * Line ends are always kept; lines left out of a very dense design show as shaded cells.
 */
export function buildDesignThumbnailSvg(design: Design, pixels = 96): string {
  return svgDocument(designThumbnailSvgParts(design, pixels));
}

/** buildDesignThumbnailSvg as parts (see SvgParts). */
export function designThumbnailSvgParts(design: Design, pixels = 96): SvgParts {
  const { width: w, height: h } = design;
  const side = Math.max(w, h);
  const scale = pixels / side;
  const seams = thumbnailLines(design.seams, side, pixels, THUMBNAIL_SEAM_BUDGET);
  const lines = thumbnailLines(design.lines, side, pixels);
  const content = [
    `<rect x="0" y="0" width="${num(w)}" height="${num(h)}" fill="${INK.block}" stroke="${INK.outline}" stroke-width="${num(side * 0.01)}"/>`,
    shadedCells(seams, INK.seam),
    shadedCells(lines, INK.stitch),
    `<g fill="none" stroke-linecap="round" stroke-linejoin="round">`,
    pathGroup(seams.lines, `stroke="${INK.seam}" stroke-width="${num(side * 0.006)}"`, 'seams'),
    pathGroup(lines.lines, `stroke="${INK.stitch}" stroke-width="${num(side * 0.008)}"`, 'quilting-lines'),
    '</g>',
  ].filter(Boolean).join('\n');
  return { width: num(w * scale), height: num(h * scale), viewBox: `0 0 ${num(w)} ${num(h)}`, content };
}

const THUMBNAIL_SEAM_BUDGET = 200;

/** Cells as one path of row runs (fewer bytes than a rect per cell); '' when there are none. */
function shadedCells(t: ThumbnailLines, colour: string): string {
  if (t.shadedCells.length === 0) return '';
  const c = t.cellSize;
  const runs: string[] = [];
  for (let i = 0; i < t.shadedCells.length; ) {
    const [col, row] = t.shadedCells[i]!;
    let end = i + 1;
    while (end < t.shadedCells.length && t.shadedCells[end]![1] === row && t.shadedCells[end]![0] === col + (end - i)) end++;
    runs.push(`M${num(col * c)} ${num(row * c)}h${num((end - i) * c)}v${num(c)}h${num(-(end - i) * c)}Z`);
    i = end;
  }
  return `<path class="dense" d="${runs.join('')}" fill="${colour}" fill-opacity="0.35"/>`;
}

function routeGroup(route: readonly SvgStroke[], stroke: number, side: number): string {
  const out: string[] = ['<g class="route">'];
  for (const s of route) {
    out.push(`<path class="${s.kind}" data-pass="${num(s.pass)}" d="${pathData(s.points)}" ${strokeStyle(s.kind, stroke)}/>`);
  }
  const size = side * 0.014;
  const arrows = route.map((s) => arrowAt(s.points, size)).filter((a): a is string => a !== null);
  out.push(`<g class="arrows" stroke="none">${arrows.join('')}</g>`);
  out.push('</g>');
  return out.join('\n');
}

function strokeStyle(kind: SvgStroke['kind'], stroke: number): string {
  const style = LINE_STYLES[kind];
  // Stitching is drawn heavier than travel, as on the canvas; dashes are in multiples of the drawn width.
  const width = kind === 'stitch' ? stroke * 1.6 : stroke;
  const dash = dashFor(style, width);
  return `stroke="${style.colour}" stroke-width="${num(width)}"${dash.length > 0 ? ` stroke-dasharray="${dash.map(num).join(' ')}"` : ''}`;
}

/** A filled triangle pointing along the polyline at half its length; null for a zero-length polyline. */
function arrowAt(points: readonly Point[], size: number): string | null {
  let total = 0;
  for (let i = 1; i < points.length; i++) total += dist(points[i - 1]!, points[i]!);
  if (!(total > 0)) return null;
  let walked = 0;
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1]!;
    const b = points[i]!;
    const d = dist(a, b);
    if (d > 0 && walked + d >= total / 2) {
      const t = (total / 2 - walked) / d;
      const ux = (b[0] - a[0]) / d;
      const uy = (b[1] - a[1]) / d;
      const cx = a[0] + (b[0] - a[0]) * t;
      const cy = a[1] + (b[1] - a[1]) * t;
      const tip: Point = [cx + ux * size, cy + uy * size];
      const left: Point = [cx - ux * size * 0.6 - uy * size * 0.6, cy - uy * size * 0.6 + ux * size * 0.6];
      const right: Point = [cx - ux * size * 0.6 + uy * size * 0.6, cy - uy * size * 0.6 - ux * size * 0.6];
      return `<path d="M${pt(tip)}L${pt(left)}L${pt(right)}Z" fill="${INK.stitch}"/>`;
    }
    walked += d;
  }
  return null;
}

function passLabels(route: readonly SvgStroke[], font: number): string {
  const out: string[] = ['<g class="pass-numbers" font-family="sans-serif" text-anchor="middle" dominant-baseline="central">'];
  let lastPass = -1;
  for (const s of route) {
    if (s.pass === lastPass) continue;
    lastPass = s.pass;
    const [x, y] = s.points[0]!;
    out.push(
      `<circle cx="${num(x)}" cy="${num(y)}" r="${num(font * 0.75)}" fill="#ffffff" stroke="${INK.stitch}" stroke-width="${num(font * 0.08)}"/>`,
      `<text x="${num(x)}" y="${num(y)}" font-size="${num(font * 0.9)}" fill="${INK.stitch}">${num(s.pass)}</text>`,
    );
  }
  out.push('</g>');
  return out.join('\n');
}

function scaleNote(design: Design, y: number, font: number, stroke: number, remark: string | undefined, viewer: Units): string {
  const { width: w, height: h, units } = design;
  const other: Units = viewer === 'in' ? 'cm' : 'in';
  const size = `Block ${formatSize(w, h, units, viewer)} (${formatSize(w, h, units, other)})`;
  const inch = units === 'in' ? 1 : CM_PER_INCH;
  const cm = units === 'cm' ? 1 : 1 / CM_PER_INCH;
  const bar = (x: number, len: number, label: string): string =>
    `<path d="M${num(x)} ${num(y + font * 1.4)}h${num(len)}" stroke="${INK.text}" stroke-width="${num(stroke * 2)}"/>` +
    `<text x="${num(x + len + font * 0.4)}" y="${num(y + font * 1.7)}">${label}</text>`;
  return [
    `<g class="scale-note" font-family="sans-serif" font-size="${num(font)}" fill="${INK.text}">`,
    `<text x="0" y="${num(y)}">${escapeXml(size)}</text>`,
    bar(0, inch, '1 in'),
    bar(inch + font * 3.5, cm, '1 cm'),
    `<text x="0" y="${num(y + font * 3)}">Print at 100% (no fit to page) for true size.</text>`,
    remark ? `<text x="0" y="${num(y + font * 4.3)}">${escapeXml(remark)}</text>` : '',
    '</g>',
  ].join('\n');
}

function pathGroup(lines: readonly Polyline[], style: string, cls: string): string {
  if (lines.length === 0) return `<g class="${cls}"/>`;
  return `<g class="${cls}" ${style}>${lines.map((l) => `<path d="${pathData(l)}"/>`).join('')}</g>`;
}

function pathData(points: readonly Point[]): string {
  return points.map((p, i) => `${i === 0 ? 'M' : 'L'}${pt(p)}`).join('');
}

const dist = (a: Point, b: Point): number => Math.hypot(b[0] - a[0], b[1] - a[1]);
const pt = (p: Point): string => `${num(p[0])} ${num(p[1])}`;
/** Coordinates to 1e-4 design units (far below a stitch length), trailing zeros dropped. */
const num = (v: number): string => String(Math.round(v * 1e4) / 1e4);

function escapeXml(text: string): string {
  return text.replace(/[<>&"']/g, (c) => ({ '<': '&lt;', '>': '&gt;', '&': '&amp;', '"': '&quot;', "'": '&apos;' })[c]!);
}
