import type { BBox } from '../geometry/bbox.ts';
import type { Point } from '../geometry/point.ts';

/** A label to place beside a point on screen (CSS px); earlier labels in the list win a contested spot. */
export interface LabelRequest {
  readonly key: string;
  readonly text: string;
  /** The point the label names (a pass start, the needle), screen px. */
  readonly anchor: Point;
}

export interface PlacedLabel {
  readonly key: string;
  readonly text: string;
  /** The label's box, screen px; the text is drawn from its top-left at `LABEL_PADDING`. */
  readonly box: BBox;
}

export interface LabelLayout {
  readonly placed: readonly PlacedLabel[];
  /** Labels with no free spot near their point: left off the canvas (the step list still names every pass). */
  readonly hidden: readonly string[];
}

/** Label type size and padding, CSS px; widths are estimated from these (bold sans, ≤ 0.62 em per character). */
export const LABEL_FONT_PX = 14;
export const LABEL_PADDING = 3;
const CHAR_EM = 0.62;
/** Clear space kept around the anchor itself so a label never sits on its own marker ring (px). */
const GAP = 18;

/** The box size a label's text needs, px. */
export function measureLabel(text: string): { width: number; height: number } {
  return { width: Math.ceil(text.length * LABEL_FONT_PX * CHAR_EM) + 2 * LABEL_PADDING, height: LABEL_FONT_PX + 2 * LABEL_PADDING };
}

/**
 * Places labels without overlaps, greedily in the given order: each label tries eight spots around its point
 * (right, left, above, below, then the diagonals, `GAP` px from the point), keeps the first spot that lies inside
 * `area` and overlaps no label already placed and no marker in `keepClear` (points whose surrounding square of half-side `GAP`
 * stays free), and is hidden when none does. Guarantee (labelPlacement.test.ts): the placed boxes are pairwise
 * disjoint and inside `area`.
 */
export function placeLabels(requests: readonly LabelRequest[], area: BBox, keepClear: readonly Point[] = []): LabelLayout {
  const placed: PlacedLabel[] = [];
  const hidden: string[] = [];
  const blocked: BBox[] = keepClear.map(([x, y]) => ({ minX: x - GAP, minY: y - GAP, maxX: x + GAP, maxY: y + GAP }));
  for (const r of requests) {
    const { width: w, height: h } = measureLabel(r.text);
    const [x, y] = r.anchor;
    const spots: [number, number][] = [
      [x + GAP, y - h / 2], [x - GAP - w, y - h / 2], [x - w / 2, y - GAP - h], [x - w / 2, y + GAP],
      [x + GAP, y - GAP - h], [x - GAP - w, y - GAP - h], [x + GAP, y + GAP], [x - GAP - w, y + GAP],
    ];
    const box = spots
      .map(([left, top]): BBox => ({ minX: left, minY: top, maxX: left + w, maxY: top + h }))
      .find((b) => isInside(b, area) && !placed.some((p) => overlaps(p.box, b)) && !blocked.some((k) => overlaps(k, b)));
    if (box) placed.push({ key: r.key, text: r.text, box });
    else hidden.push(r.key);
  }
  return { placed, hidden };
}

/** Open boxes overlap: touching edges do not count. */
export function overlaps(a: BBox, b: BBox): boolean {
  return a.minX < b.maxX && b.minX < a.maxX && a.minY < b.maxY && b.minY < a.maxY;
}

function isInside(b: BBox, area: BBox): boolean {
  return b.minX >= area.minX && b.minY >= area.minY && b.maxX <= area.maxX && b.maxY <= area.maxY;
}
