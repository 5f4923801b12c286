// Writes a printable plan as a PDF with pdfkit: the quilt's pages (map, quilt-as-you-go trim table, quilt budget)
// when it is a quilt, then each block's pages (the drawing with numbered steps and direction arrows, the step list,
// the thread budget with its sources, the safety cautions). Layout and geometry come from shared/print (pure, tested
// there); this file only turns them into drawing operators. Lengths on the page are points (1/72 in).
import PDFDocument from 'pdfkit';
import type { Units } from '@shared/design/design.schema.ts';
import { bindingBandOf } from '@shared/design/design.schema.ts';
import type { Point } from '@shared/geometry/point.ts';
import type { QuiltBudget } from '@shared/quilt/quiltBudget.ts';
import type { Quilt } from '@shared/quilt/quilt.schema.ts';
import type { TrimAssumption } from '@shared/quilt/trim.ts';
import type { QuiltPlan } from '@shared/contract/quiltPlan.ts';
import { chainStepWords, chainSummaryWords } from '@shared/quilt/chainWords.ts';
import type { TrimTableRow } from '@shared/quilt/trimTable.ts';
import { bordersWidth, finishedSize } from '@shared/quilt/finishedSize.ts';
import { describeAssumption, sourceKind } from '@shared/print/assumptionWords.ts';
import { placeBlock, rowLetter, type PrintLayout, type Tile } from '@shared/print/blockPlacement.ts';
import { blockSizeInPoints, type BlockSheet } from '@shared/print/blockSheet.ts';
import { placeStepNumbers } from '@shared/print/stepMarks.ts';
import { parseUnicodeRange, splitFontRuns } from '@shared/print/fontRuns.ts';
import { paperFor, pointsPerUnit, printableBox, type Box, type Paper } from '@shared/print/paper.ts';
import { layoutQuiltMap } from '@shared/print/quiltMapLayout.ts';
import { dashFor, LINE_STYLES } from '@shared/style/lineStyles.ts';
import { formatLength, formatSize, formatThread } from '@shared/units/units.ts';
import type { ThreadBudget } from '@shared/route/threadBudget.ts';
import { faceName, FONT_WEIGHTS, fontBytes, SUBSETS, subsetRanges, type FontWeight } from './pdfFonts.ts';

/** A quilt's own pages, everything in the viewer's units (the quilt converted with convertQuilt). */
export interface QuiltSheet {
  readonly title: string;
  readonly quilt: Quilt;
  /** The placed designs' titles by id. */
  readonly designTitles: ReadonlyMap<string, string>;
  readonly trim: { readonly rows: readonly TrimTableRow[]; readonly assumptions: readonly TrimAssumption[] } | { readonly problem: string };
  readonly budget: QuiltBudget | null;
  /** The chained route when the top is quilted in one piece, if it has been planned (null: not yet). */
  readonly chain?: QuiltPlan | null;
  /** Placed blocks without planned figures (the budget waits for them). */
  readonly missing: number;
}

export interface PrintPlan {
  /** The document's title (the design's, lesson's or quilt's). */
  readonly title: string;
  readonly viewerUnits: Units;
  readonly layout: PrintLayout;
  readonly quilt?: QuiltSheet;
  readonly blocks: readonly BlockSheet[];
}

export interface RenderOptions {
  /** Compress page content (default true); tests read the operators of an uncompressed file. */
  readonly compress?: boolean;
  /** Called between pages; the server passes a yield so a long document does not hold the event loop. */
  readonly between?: () => Promise<void>;
}

const INK = { text: '#222222', muted: '#555555', block: '#fbf8f2', band: '#efe6d6', outline: '#4a4a4a', mark: '#1F2F4A', rule: '#999999' } as const;
/** Neighbouring tiles share this much paper: 1/2 in, or 1.2 cm (common practice for taped patterns, no source). */
const TILE_OVERLAP: Readonly<Record<Units, number>> = { in: 36, cm: (1.2 / 2.54) * 72 };
const HEADER = 46;
const FOOTER = 18;

/** Writes the plan and returns the PDF's bytes. */
export async function renderPlanPdf(plan: PrintPlan, options: RenderOptions = {}): Promise<Buffer> {
  const paper = paperFor(plan.viewerUnits);
  const doc = new PDFDocument({
    size: [paper.width, paper.height],
    margin: paper.margin,
    autoFirstPage: false,
    bufferPages: true,
    compress: options.compress ?? true,
    // The first face is the document's default, so pdfkit never loads a standard font (the option is typed as a
    // name or path; pdfkit takes the font's bytes as well).
    font: fontBytes('regular', 'latin') as unknown as string,
    info: { Title: plan.title, Creator: 'Threadway', Producer: 'Threadway (pdfkit)' },
    lang: 'en',
  });
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  const w = new Writer(doc, paper, plan.viewerUnits);
  const between = options.between ?? (async () => {});

  if (plan.quilt) {
    await writeQuiltPages(w, plan.quilt, between);
    await between();
  }
  for (const sheet of plan.blocks) {
    await writeBlockPages(w, sheet, plan.layout, between);
    await between();
  }
  w.footers(plan.title);
  doc.end();
  return done;
}

/** pdfkit plus the faces, the paper and the viewer's units; text goes through `text` so every run gets a face that has it. */
class Writer {
  readonly covers: ((cp: number) => boolean)[];
  constructor(
    readonly doc: PDFKit.PDFDocument,
    readonly paper: Paper,
    readonly units: Units,
  ) {
    for (const weight of FONT_WEIGHTS) for (const subset of SUBSETS) doc.registerFont(faceName(weight, subset), fontBytes(weight, subset));
    const ranges = subsetRanges();
    this.covers = SUBSETS.map((s) => parseUnicodeRange(ranges[s]));
  }

  get area(): Box {
    return printableBox(this.paper);
  }

  page(): void {
    this.doc.addPage({ size: [this.paper.width, this.paper.height], margin: this.paper.margin });
  }

  len(v: number): string {
    return formatLength(v, this.units, this.units);
  }

  /** Writes text at the cursor (or at x, y), wrapping at `width`, face by face. */
  text(text: string, o: { size?: number; weight?: FontWeight; colour?: string; x?: number; y?: number; width?: number; align?: 'left' | 'center' | 'right'; gap?: number; indent?: number } = {}): void {
    const { doc } = this;
    const runs = splitFontRuns(text, this.covers);
    doc.fillColor(o.colour ?? INK.text).fontSize(o.size ?? 10);
    const base = { width: o.width ?? this.area.width - (o.x !== undefined ? o.x - this.area.x : doc.x - this.area.x), align: o.align ?? 'left', lineGap: o.gap ?? 1.5, ...(o.indent ? { indent: o.indent } : {}) };
    if (runs.length > 1 && base.align !== 'left' && o.x !== undefined) {
      // pdfkit aligns each continued run on its own; measure the whole line and set it left-aligned instead.
      const widths = runs.map((run) => doc.font(faceName(o.weight ?? 'regular', SUBSETS[run.face]!)).widthOfString(run.text));
      const total = widths.reduce((a, b) => a + b, 0);
      let x = o.x + (base.align === 'center' ? (base.width - total) / 2 : base.width - total);
      const y = o.y ?? doc.y;
      runs.forEach((run, i) => {
        doc.font(faceName(o.weight ?? 'regular', SUBSETS[run.face]!)).text(run.text, x, y, { lineBreak: false });
        x += widths[i]!;
      });
      doc.x = o.x;
      return;
    }
    runs.forEach((run, i) => {
      doc.font(faceName(o.weight ?? 'regular', SUBSETS[run.face]!));
      const opts = { ...base, continued: i < runs.length - 1 };
      if (i === 0 && o.x !== undefined && o.y !== undefined) doc.text(run.text, o.x, o.y, opts);
      else if (i === 0 && o.x !== undefined) doc.text(run.text, o.x, doc.y, opts);
      else doc.text(run.text, opts);
    });
    if (runs.length === 0) doc.text('', o.x ?? doc.x, o.y ?? doc.y);
  }

  heading(text: string, size = 14): void {
    this.ensureRoom(size * 3);
    this.doc.moveDown(0.4);
    this.text(text, { size, weight: 'bold', x: this.area.x });
    this.doc.moveDown(0.2);
  }

  /** Starts a new page when less than `points` are left above the bottom margin. */
  ensureRoom(points: number): void {
    if (this.doc.y + points > this.paper.height - this.paper.margin - FOOTER) this.page();
  }

  /** "Page n of m" and the title under every page (pages are buffered until here). */
  footers(title: string): void {
    const { doc, paper } = this;
    const range = doc.bufferedPageRange();
    for (let i = 0; i < range.count; i++) {
      doc.switchToPage(range.start + i);
      const bottom = doc.page.margins.bottom;
      doc.page.margins.bottom = 0; // writing below the margin would otherwise open a new page
      this.text(`${title} · Threadway printed plan · page ${i + 1} of ${range.count}`, { size: 7.5, colour: INK.muted, x: paper.margin, y: paper.height - paper.margin + 8, width: paper.width - 2 * paper.margin, align: 'center' });
      doc.page.margins.bottom = bottom;
    }
  }
}

// ── the quilt ────────────────────────────────────────────────────────────────────────────────────────────────────

async function writeQuiltPages(w: Writer, sheet: QuiltSheet, between: () => Promise<void>): Promise<void> {
  const { doc } = w;
  const q = sheet.quilt;
  const size = finishedSize(q);
  w.page();
  w.text(sheet.title, { size: 20, weight: 'bold', x: w.area.x, y: w.area.y });
  w.text(
    `Quilt map · finished size ${formatSize(size.width, size.height, q.units, w.units)} · ${q.rows} × ${q.columns} blocks of ${formatSize(q.block.width, q.block.height, q.units, w.units)}` +
      `${q.sashing > 0 ? ` · sashing ${w.len(q.sashing)}` : ' · no sashing'}` +
      `${q.borders.length > 1 ? ` · borders ${q.borders.map((b) => w.len(b)).join(', ')} (innermost first)` : q.borders.length === 1 ? ` · border ${w.len(q.borders[0]!)}` : ' · no border'}`,
    { size: 10, colour: INK.muted },
  );
  doc.moveDown(0.6);
  const top = doc.y;
  const mapArea: Box = { x: w.area.x, y: top, width: w.area.width, height: Math.min(w.area.height * 0.55, w.area.y + w.area.height - top - 190) };
  const map = layoutQuiltMap(q, mapArea);
  // Borders: the whole quilt in the border colour, then the blocks' field in the sashing colour, then the blocks.
  doc.save();
  doc.rect(map.outline.x, map.outline.y, map.outline.width, map.outline.height).fillAndStroke('#e9dcc3', INK.outline);
  const b = bordersWidth(q) * map.scale;
  if (b > 0) doc.rect(map.outline.x + b, map.outline.y + b, map.outline.width - 2 * b, map.outline.height - 2 * b).fillAndStroke('#f3ecdf', INK.rule);
  for (const c of map.cells) {
    const { box } = c;
    doc.rect(box.x, box.y, box.width, box.height).fillAndStroke(c.placement ? INK.block : '#ffffff', INK.outline);
    const label = c.placement ? (sheet.designTitles.get(c.placement.designId) ?? 'a design') : 'empty';
    const turn = c.placement ? `${c.placement.mirror ? 'mirrored' : ''}${c.placement.mirror && c.placement.rotation ? ', ' : ''}${c.placement.rotation ? `turned ${c.placement.rotation}°` : ''}` : '';
    const fontSize = Math.max(6, Math.min(9, box.width / 10));
    if (c.order !== null) {
      const r = Math.max(7, Math.min(12, box.width / 8));
      doc.circle(box.x + box.width / 2, box.y + box.height / 2 - fontSize, r).fillAndStroke('#ffffff', INK.mark);
      w.text(String(c.order), { size: r * 1.1, weight: 'bold', colour: INK.mark, x: box.x, y: box.y + box.height / 2 - fontSize - r * 0.62, width: box.width, align: 'center' });
    }
    w.text(label, { size: fontSize, x: box.x + 2, y: box.y + box.height / 2 + fontSize * 0.6, width: box.width - 4, align: 'center' });
    if (turn) w.text(turn, { size: fontSize * 0.9, colour: INK.muted, x: box.x + 2, y: doc.y, width: box.width - 4, align: 'center' });
  }
  doc.restore();
  doc.y = map.outline.y + map.outline.height + 10;
  w.text(
    `Numbers give the quilting order (${q.order.kind === 'rows' ? 'row by row from the top left' : q.order.kind === 'serpentine' ? 'row by row from the top left, every other row right to left' : 'your own order'}). ` +
      `Rows are counted from the top, columns from the left. The map is drawn to scale, not true size; the block pages that follow are.`,
    { size: 9, x: w.area.x, width: w.area.width },
  );

  await between();
  w.heading('Quilt budget');
  const budget = sheet.budget;
  if (!budget) {
    w.text(sheet.missing > 0 ? `${sheet.missing} placed block${sheet.missing === 1 ? ' has' : 's have'} no planned figures yet; the budget follows when every block has them.` : 'Place a design to see the budget.', { size: 10, x: w.area.x });
  } else {
    w.text('Each block quilted on its own (quilt-as-you-go), from the blocks’ planned routes.', { size: 10, x: w.area.x });
    writeBudget(w, budget.total, [
      ['Passes', String(budget.passes)],
      ['Stitched', w.len(budget.stitchLength)],
      ['Travel', w.len(budget.travelLength)],
    ]);
  }

  await between();
  w.heading('Quilted in one piece: the route across the quilt');
  if (sheet.chain) {
    const chain = sheet.chain;
    w.text(`When the whole top is quilted at once, the thread runs on from block to block: ${chainSummaryWords(chain, w.units)}`, { size: 10, x: w.area.x });
    chain.steps.forEach((_, i) => w.text(`${i + 1}. ${chainStepWords(chain, i, w.units)}`, { size: 9.5, x: w.area.x }));
  } else {
    w.text('Not planned yet: plan the route across the quilt on its page, then print again to have each block’s start and end corner here.', { size: 10, x: w.area.x });
  }

  await between();
  w.page();
  w.text('Quilt-as-you-go trim plan', { size: 16, weight: 'bold', x: w.area.x, y: w.area.y });
  if ('problem' in sheet.trim) {
    w.text(sheet.trim.problem, { size: 10, x: w.area.x });
    return;
  }
  if (sheet.trim.rows.length === 0) {
    w.text('Place a design to see how each block is trimmed.', { size: 10, x: w.area.x });
    return;
  }
  w.text('Make each block’s piece at the first size, quilt it, then trim each side at the distance given from the block’s centre. Settings in use:', { size: 9.5, x: w.area.x });
  const trimWords: Record<TrimAssumption['setting'], string> = { seamAllowance: 'Joining seam', shrinkage: 'Shrinkage while quilting', margin: 'Extra fabric and batting beyond each cut line' };
  for (const a of sheet.trim.assumptions) {
    const value = a.setting === 'shrinkage' ? `${a.value} %` : w.len(a.value);
    const source = a.source === 'quilt' ? 'set for this quilt' : w.units === 'cm' ? sourceKind(a.source) : a.source;
    w.text(`• ${trimWords[a.setting]}: ${value} (${source})`, { size: 9, x: w.area.x + 8 });
  }
  doc.moveDown(0.5);
  const cell = (text: string, bold = false) => ({ text, font: { src: faceName(bold ? 'bold' : 'regular', 'latin'), size: 8 } });
  doc.fillColor(INK.text);
  doc.table({
    position: { x: w.area.x, y: doc.y },
    maxWidth: w.area.width,
    // Fixed widths: pdfkit measures every cell again for each '*' column, which made this one table take most of a
    // quilt plan's time (measured with bench/printPlan.bench.ts).
    columnStyles: [54, 40, 58, 58, ...Array.from({ length: 4 }, () => (w.area.width - 210) / 4)],
    defaultStyle: { padding: 3, border: 0.5, borderColor: INK.rule },
    data: [
      ['Block', 'Position', 'Make at', 'Cut to', 'Top', 'Right', 'Bottom', 'Left'].map((t) => cell(t, true)),
      ...sheet.trim.rows.map((r) => [cell(r.block, true), cell(r.position), cell(r.makeAt), cell(r.cutTo), cell(r.sides.top), cell(r.sides.right), cell(r.sides.bottom), cell(r.sides.left)]),
    ],
  });
}

// ── a block ──────────────────────────────────────────────────────────────────────────────────────────────────────

async function writeBlockPages(w: Writer, sheet: BlockSheet, layout: PrintLayout, between: () => Promise<void>): Promise<void> {
  const { doc, paper } = w;
  const d = sheet.design;
  const size = blockSizeInPoints(d);
  const area = w.area;
  const drawArea: Box = { x: area.x, y: area.y + HEADER, width: area.width, height: area.height - HEADER - 40 };
  const tileArea = { width: area.width, height: area.height - 34 - FOOTER };
  const placed = placeBlock(size.width, size.height, drawArea, layout, tileArea, TILE_OVERLAP[w.units]);
  const k = pointsPerUnit(d.units);
  const sizeText = formatSize(d.width, d.height, d.units, w.units);

  w.page();
  w.text(sheet.title, { size: 18, weight: 'bold', x: area.x, y: area.y });
  const how =
    placed.kind === 'true-size'
      ? `true size on ${paper.label}: print at 100 % (no “fit to page”) and check the scale bar`
      : placed.kind === 'scaled'
        ? `drawn at ${Math.round(placed.scale * 100)} % to fit the page, NOT true size. For true size, download the tiled plan`
        : `true size on ${placed.tiling.rows * placed.tiling.columns} tiles (${placed.tiling.rows} × ${placed.tiling.columns}) of ${paper.label} on the next pages; this page shows the whole block smaller`;
  w.text(`Block ${sizeText} · ${how}.`, { size: 9.5, colour: INK.muted, x: area.x });

  if (placed.kind === 'tiled') {
    // A small overview first, with the tile grid on it, then one page per tile.
    const scale = Math.min(drawArea.width / size.width, (drawArea.height * 0.7) / size.height);
    const frame: Box = { x: area.x + (area.width - size.width * scale) / 2, y: doc.y + 8, width: size.width * scale, height: size.height * scale };
    drawBlock(w, sheet, frame, k * scale);
    doc.save().lineWidth(0.6).strokeColor(INK.mark).dash(3, { space: 2 });
    for (const t of placed.tiling.tiles) {
      const x = frame.x + t.source.x * scale;
      const y = frame.y + t.source.y * scale;
      doc.rect(x, y, Math.min(t.source.width * scale, frame.x + frame.width - x), Math.min(t.source.height * scale, frame.y + frame.height - y)).stroke();
    }
    doc.undash().restore();
    for (const t of placed.tiling.tiles) {
      w.text(t.label, { size: 9, weight: 'bold', colour: INK.mark, x: frame.x + t.source.x * scale + 3, y: frame.y + t.source.y * scale + 3, width: 30 });
    }
    doc.y = frame.y + frame.height + 8;
    writeLegend(w);
    for (const t of placed.tiling.tiles) {
      await between();
      writeTile(w, sheet, t, placed.tiling.rows, placed.tiling.columns, k);
    }
    w.page();
    w.text(sheet.title, { size: 14, weight: 'bold', x: area.x, y: area.y });
  } else {
    drawBlock(w, sheet, placed.frame, k * placed.scale);
    doc.y = placed.frame.y + placed.frame.height + 8;
    writeScaleBar(w, placed.scale, placed.kind === 'true-size');
    writeLegend(w);
  }
  for (const note of sheet.notes) w.text(note, { size: 9, colour: INK.muted, x: area.x });
  await between();
  writeSteps(w, sheet);
  w.heading('Thread budget for this block', 12);
  writeBudget(w, sheet.budget, [
    ['Passes', String(sheet.walkthrough.passes)],
    ['Stitched', w.len(sheet.stitchLength)],
    ['Travel', w.len(sheet.travelLength)],
  ]);
  writeCautions(w, sheet);
}

/** One tile of a block at true size, with its label, the neighbours it joins and the alignment crosses. */
function writeTile(w: Writer, sheet: BlockSheet, tile: Tile, rows: number, columns: number, k: number): void {
  const { doc } = w;
  const area = w.area;
  w.page();
  w.text(`${sheet.title} · tile ${tile.label} of ${rows * columns} (rows A–${rowLetter(rows - 1)}, columns 1–${columns}) · true size`, { size: 9, weight: 'bold', x: area.x, y: area.y });
  const joins = (['top', 'right', 'bottom', 'left'] as const).filter((s) => tile.neighbours[s]).map((s) => `${s}: ${tile.neighbours[s]}`);
  w.text(`Lay the crosses over the matching crosses of the next tile and tape. Joins ${joins.join(', ')}.`, { size: 8, colour: INK.muted, x: area.x });
  const origin: Box = { x: area.x, y: area.y + 34, width: tile.source.width, height: tile.source.height };
  doc.save();
  doc.rect(origin.x, origin.y, origin.width, origin.height).clip();
  drawBlock(w, sheet, { x: origin.x - tile.source.x, y: origin.y - tile.source.y }, k, origin);
  doc.restore();
  // Overlap strips: dashed lines where the neighbour's paper ends, so the quilter sees what is shared.
  doc.save().lineWidth(0.5).strokeColor(INK.rule).dash(2, { space: 2 });
  const o = TILE_OVERLAP[w.units];
  if (tile.neighbours.right) doc.moveTo(origin.x + origin.width - o, origin.y).lineTo(origin.x + origin.width - o, origin.y + origin.height).stroke();
  if (tile.neighbours.left) doc.moveTo(origin.x + o, origin.y).lineTo(origin.x + o, origin.y + origin.height).stroke();
  if (tile.neighbours.bottom) doc.moveTo(origin.x, origin.y + origin.height - o).lineTo(origin.x + origin.width, origin.y + origin.height - o).stroke();
  if (tile.neighbours.top) doc.moveTo(origin.x, origin.y + o).lineTo(origin.x + origin.width, origin.y + o).stroke();
  doc.undash().restore();
  doc.save().lineWidth(0.6).strokeColor('#000000');
  for (const [mx, my] of tile.marks) {
    const x = origin.x + mx - tile.source.x;
    const y = origin.y + my - tile.source.y;
    doc.moveTo(x - 9, y).lineTo(x + 9, y).moveTo(x, y - 9).lineTo(x, y + 9).stroke();
    doc.circle(x, y, 4).stroke();
  }
  doc.restore();
  doc.save().lineWidth(0.4).strokeColor(INK.rule).rect(origin.x, origin.y, origin.width, origin.height).stroke().restore();
  w.text(tile.label, { size: 22, weight: 'bold', colour: '#c8c8c8', x: origin.x + 6, y: origin.y + 6, width: 60 });
}

/**
 * The block at `k` points per design unit with its top-left corner at (frame.x, frame.y): paper colour, binding
 * band, seams, the route in the one visual language (lineStyles.ts), the outline, then arrows and step numbers.
 */
function drawBlock(w: Writer, sheet: BlockSheet, frame: Pick<Box, 'x' | 'y'>, k: number, visible?: Box): void {
  const { doc } = w;
  const d = sheet.design;
  const at = (p: Point): [number, number] => [frame.x + p[0] * k, frame.y + p[1] * k];
  const W = d.width * k;
  const H = d.height * k;
  const band = bindingBandOf(d) * k;
  doc.save();
  doc.rect(frame.x, frame.y, W, H).fill(INK.block);
  if (band > 0) doc.rect(frame.x, frame.y, W, H).rect(frame.x + band, frame.y + band, W - 2 * band, H - 2 * band).fill(INK.band, 'even-odd');
  doc.lineCap('round').lineJoin('round');
  const polyline = (pts: readonly Point[]) => {
    const [x0, y0] = at(pts[0]!);
    doc.moveTo(x0, y0);
    for (let i = 1; i < pts.length; i++) {
      const [x, y] = at(pts[i]!);
      doc.lineTo(x, y);
    }
  };
  doc.lineWidth(0.6).strokeColor(LINE_STYLES.seam.colour);
  for (const s of d.seams) polyline(s);
  if (d.seams.length > 0) doc.stroke();
  for (const s of sheet.route) {
    const style = LINE_STYLES[s.kind];
    const width = s.kind === 'stitch' ? 1.1 : 0.9;
    const dash = dashFor(style, width);
    doc.lineWidth(width).strokeColor(style.colour);
    if (dash.length > 0) doc.dash(dash[0]!, { space: dash[1] ?? dash[0]! });
    polyline(s.points);
    doc.stroke();
    if (dash.length > 0) doc.undash();
  }
  doc.lineWidth(0.8).strokeColor(INK.outline).rect(frame.x, frame.y, W, H).stroke();
  const shown = sheet.marks
    .map((m) => ({ ...m, page: at(m.at) }))
    // On a tile only the marks on this tile are drawn (the rest would be clipped anyway).
    .filter(({ page: [x, y] }) => !visible || (x >= visible.x - 12 && x <= visible.x + visible.width + 12 && y >= visible.y - 12 && y <= visible.y + visible.height + 12));
  const steps = shown.filter((m) => m.kind !== 'start');
  const discs = placeStepNumbers(steps.map((m) => ({ at: m.page, angle: m.angle })), 5.5);
  for (const m of steps) {
    const [x, y] = m.page;
    const c = Math.cos(m.angle);
    const s = Math.sin(m.angle);
    const size = 4.5;
    doc
      .moveTo(x + c * size, y + s * size)
      .lineTo(x - c * size * 0.7 - s * size * 0.7, y - s * size * 0.7 + c * size * 0.7)
      .lineTo(x - c * size * 0.7 + s * size * 0.7, y - s * size * 0.7 - c * size * 0.7)
      .closePath()
      .fill(INK.mark);
  }
  steps.forEach((m, i) => {
    const [nx, ny] = discs[i]!;
    // A number set back from its arrow to stay clear of its neighbours gets a thin leader to the arrow.
    if (Math.hypot(nx - m.page[0], ny - m.page[1]) > 10) doc.moveTo(nx, ny).lineTo(m.page[0], m.page[1]).lineWidth(0.4).stroke(INK.mark);
    doc.circle(nx, ny, 5.5).lineWidth(0.5).fillAndStroke('#ffffff', INK.mark);
    label(doc, String(m.number), nx, ny, m.number > 99 ? 5 : 6.5, INK.mark);
  });
  for (const m of shown) {
    if (m.kind !== 'start') continue;
    const [x, y] = m.page;
    doc.circle(x, y, 6.5).fill(INK.mark);
    label(doc, `S${m.number}`, x, y, 6.5, '#ffffff');
  }
  doc.restore();
}

/**
 * A short label (digits, "S1") centred on (x, y), written without wrapping: pdfkit never starts a new page for it,
 * even when a tile's clipped drawing reaches below the margin.
 */
function label(doc: PDFKit.PDFDocument, text: string, x: number, y: number, size: number, colour: string): void {
  doc.font(faceName('bold', 'latin')).fontSize(size).fillColor(colour);
  const width = doc.widthOfString(text);
  doc.text(text, x - width / 2, y - size * 0.62, { lineBreak: false });
}

function writeScaleBar(w: Writer, scale: number, trueSize: boolean): void {
  const { doc } = w;
  const unit = w.units === 'in' ? 1 : 5;
  const length = unit * pointsPerUnit(w.units) * scale;
  const y = doc.y + 4;
  const x = w.area.x;
  doc.save().lineWidth(1).strokeColor(INK.text).moveTo(x, y).lineTo(x + length, y).moveTo(x, y - 3).lineTo(x, y + 3).moveTo(x + length, y - 3).lineTo(x + length, y + 3).stroke().restore();
  w.text(`${unit} ${w.units}${trueSize ? ': measure this bar to check the print is true size' : ' at the scale of this drawing'}`, { size: 8.5, x: x + length + 6, y: y - 5 });
  doc.x = w.area.x;
}

function writeLegend(w: Writer): void {
  w.text('How to read the drawing: S1 marks where pass 1 starts; each numbered circle is a step of the list below, its arrow points the way you sew; solid lines are stitched, dashed lines are travel (retrace, in the ditch, along the edge); grey lines are seams.', {
    size: 8.5,
    colour: INK.muted,
    x: w.area.x,
  });
}

function writeSteps(w: Writer, sheet: BlockSheet): void {
  const { doc } = w;
  w.heading(`Steps (${sheet.walkthrough.steps.length}, ${sheet.walkthrough.passes} pass${sheet.walkthrough.passes === 1 ? '' : 'es'})`, 12);
  for (const step of sheet.walkthrough.steps) {
    w.ensureRoom(26);
    const length = step.lengthText ? ` (${step.lengthText})` : '';
    w.text(`${step.index + 1}. ${step.title}${length}: ${step.instruction}`, { size: 9.5, x: w.area.x, indent: 0 });
    for (const hint of step.hints) w.text(`Tip: ${hint.text}`, { size: 8.5, colour: INK.muted, x: w.area.x + 14 });
    doc.moveDown(0.15);
  }
}

function writeBudget(w: Writer, budget: ThreadBudget, figures: readonly (readonly [string, string])[]): void {
  const rows: [string, string][] = [
    ...figures.map(([a, b]) => [a, b] as [string, string]),
    ['Stitches', budget.stitchCount.toLocaleString('en-US')],
    ['Top thread', formatThread(budget.topThreadYards, w.units)],
    ['Bobbin thread', formatThread(budget.bobbinThreadYards, w.units)],
    ['Bobbins', String(budget.bobbins)],
    ['Sewing time', `about ${Math.max(1, Math.round(budget.sewingMinutes))} min`],
  ];
  w.ensureRoom(rows.length * 13 + 40);
  for (const [label, value] of rows) {
    const y = w.doc.y;
    w.text(label, { size: 9.5, x: w.area.x, y, width: 110 });
    w.text(value, { size: 9.5, weight: 'bold', x: w.area.x + 115, y, width: 200 });
  }
  w.doc.moveDown(0.3);
  w.text('Where these numbers come from:', { size: 8.5, weight: 'bold', x: w.area.x });
  for (const a of budget.assumptions) w.text(`• ${describeAssumption(a, w.units)}`, { size: 8, colour: INK.muted, x: w.area.x + 8 });
}

function writeCautions(w: Writer, sheet: BlockSheet): void {
  w.heading('Safety', 12);
  const words: Record<BlockSheet['cautions'][number]['kind'], string> = { needle: 'Needle', 'rotary-cutter': 'Rotary cutter', iron: 'Iron' };
  for (const c of sheet.cautions) w.text(`${words[c.kind]}: ${c.text}`, { size: 9, x: w.area.x });
  w.text('These are habits, not instructions: your machine’s manual and your tools’ instructions come first.', { size: 9, weight: 'bold', x: w.area.x });
}
