import type { Box } from './paper.ts';

/**
 * How a block is laid out on paper, all in points:
 * - `true-size`: the block fits the drawing area at scale 1 and is centred across it, at its top;
 * - `scaled`: it does not fit and the quilter asked for one page: drawn smaller (`scale` < 1), the page says so;
 * - `tiled`: it does not fit and the quilter asked for true size: cut into overlapping tiles (see planTiles).
 */
export type BlockPlacement =
  | { readonly kind: 'true-size'; readonly scale: 1; readonly frame: Box }
  | { readonly kind: 'scaled'; readonly scale: number; readonly frame: Box }
  | { readonly kind: 'tiled'; readonly scale: 1; readonly tiling: Tiling };

/** What the quilter asked for: one page per block (`page`), or true size on tiles when it does not fit (`tiles`). */
export type PrintLayout = 'page' | 'tiles';
export const PRINT_LAYOUTS: readonly PrintLayout[] = ['page', 'tiles'];

/** Whether a drawing of `width` × `height` points fits `area` (a hair of tolerance for rounding). */
export function fitsIn(width: number, height: number, area: Pick<Box, 'width' | 'height'>): boolean {
  const eps = 1e-6;
  return width <= area.width + eps && height <= area.height + eps;
}

/**
 * Places a block drawn `width` × `height` points at true size into `area`. `tileArea` is the drawing area of a tile
 * page (a whole page less its labels) and `overlap` how much neighbouring tiles share.
 */
export function placeBlock(width: number, height: number, area: Box, layout: PrintLayout, tileArea: Pick<Box, 'width' | 'height'>, overlap: number): BlockPlacement {
  if (!(width > 0 && height > 0)) throw new Error(`print/blockPlacement: a block of ${width} × ${height} pt cannot be placed`);
  if (fitsIn(width, height, area)) return { kind: 'true-size', scale: 1, frame: { x: area.x + (area.width - width) / 2, y: area.y, width, height } };
  if (layout === 'tiles') return { kind: 'tiled', scale: 1, tiling: planTiles(width, height, tileArea, overlap) };
  const scale = Math.min(area.width / width, area.height / height);
  const w = width * scale;
  const h = height * scale;
  return { kind: 'scaled', scale, frame: { x: area.x + (area.width - w) / 2, y: area.y, width: w, height: h } };
}

/** One tile: which part of the drawing it shows (drawing points, origin at the block's top-left) and its label. */
export interface Tile {
  readonly row: number;
  readonly column: number;
  /** "B2": rows lettered from the top (A, B, …), columns numbered from the left. */
  readonly label: string;
  readonly source: Box;
  /** Alignment crosses inside this tile (drawing points); each lies in the overlap it shares with one neighbour. */
  readonly marks: readonly (readonly [number, number])[];
  /** Labels of the neighbours this tile is taped to, by side (absent on the drawing's own edge). */
  readonly neighbours: Readonly<Partial<Record<'top' | 'right' | 'bottom' | 'left', string>>>;
}

export interface Tiling {
  readonly rows: number;
  readonly columns: number;
  /** Width shared by neighbouring tiles, in points. */
  readonly overlap: number;
  readonly tiles: readonly Tile[];
}

/** "A", "B", … "Z", "AA", …: a tile row's letter. */
export function rowLetter(row: number): string {
  let n = row;
  let out = '';
  do {
    out = String.fromCharCode(65 + (n % 26)) + out;
    n = Math.floor(n / 26) - 1;
  } while (n >= 0);
  return out;
}

/**
 * Cuts a drawing of `width` × `height` points into tiles of at most `tile` points, neighbours sharing `overlap`:
 * tile (r, c) shows x from c·(w − overlap) and y from r·(h − overlap). The fewest tiles that cover the drawing:
 * columns = ⌈(width − overlap) / (w − overlap)⌉ (one tile when it fits). Alignment crosses sit in the middle of each
 * shared strip, at a quarter and three quarters along the edge they share, so the same cross is printed on both
 * neighbours: laying one cross over the other lines the tiles up at true size.
 */
export function planTiles(width: number, height: number, tile: Pick<Box, 'width' | 'height'>, overlap: number): Tiling {
  if (!(overlap >= 0 && tile.width > overlap && tile.height > overlap)) throw new Error(`print/blockPlacement: tiles of ${tile.width} × ${tile.height} pt cannot overlap by ${overlap} pt`);
  const count = (length: number, size: number): number => (length <= size ? 1 : Math.ceil((length - overlap) / (size - overlap) - 1e-9));
  const columns = count(width, tile.width);
  const rows = count(height, tile.height);
  const stepX = tile.width - overlap;
  const stepY = tile.height - overlap;
  const label = (r: number, c: number): string => `${rowLetter(r)}${c + 1}`;
  const marks: [number, number][] = [];
  // Strips between columns c and c+1 and between rows r and r+1, crosses at 1/4 and 3/4 of each tile's shared edge.
  for (let c = 0; c + 1 < columns; c++) {
    const x = (c + 1) * stepX + overlap / 2;
    for (let r = 0; r < rows; r++) {
      const top = r * stepY;
      const bottom = Math.min(top + tile.height, height);
      for (const f of [0.25, 0.75]) marks.push([x, top + (bottom - top) * f]);
    }
  }
  for (let r = 0; r + 1 < rows; r++) {
    const y = (r + 1) * stepY + overlap / 2;
    for (let c = 0; c < columns; c++) {
      const left = c * stepX;
      const right = Math.min(left + tile.width, width);
      for (const f of [0.25, 0.75]) marks.push([left + (right - left) * f, y]);
    }
  }
  const tiles: Tile[] = [];
  for (let r = 0; r < rows; r++) {
    for (let c = 0; c < columns; c++) {
      const source: Box = { x: c * stepX, y: r * stepY, width: tile.width, height: tile.height };
      const inside = (p: readonly [number, number]): boolean => p[0] >= source.x && p[0] <= source.x + source.width && p[1] >= source.y && p[1] <= source.y + source.height;
      tiles.push({
        row: r,
        column: c,
        label: label(r, c),
        source,
        marks: marks.filter(inside),
        neighbours: {
          ...(r > 0 ? { top: label(r - 1, c) } : {}),
          ...(c + 1 < columns ? { right: label(r, c + 1) } : {}),
          ...(r + 1 < rows ? { bottom: label(r + 1, c) } : {}),
          ...(c > 0 ? { left: label(r, c - 1) } : {}),
        },
      });
    }
  }
  return { rows, columns, overlap, tiles };
}
