import { CM_PER_INCH, type Units } from '../design/design.schema.ts';

/**
 * PDF user space: one unit is 1/72 inch by default (ISO 32000-1:2008, §8.3.2.3 "User Space"), so a length in
 * points is inches × 72. Everything in shared/print measures pages and drawings in points.
 */
export const POINTS_PER_INCH = 72;

/** Points per design unit: 72 per inch, 72 / 2.54 per centimetre (1 in = 2.54 cm exactly, 1959 agreement). */
export function pointsPerUnit(units: Units): number {
  return units === 'in' ? POINTS_PER_INCH : POINTS_PER_INCH / CM_PER_INCH;
}

/** A sheet of paper in points, portrait, with the margin kept clear on every side. */
export interface Paper {
  readonly name: 'letter' | 'a4';
  /** How the page names the sheet: "Letter (8 1/2 × 11 in)", "A4 (21 × 29.7 cm)". */
  readonly label: string;
  readonly width: number;
  readonly height: number;
  readonly margin: number;
}

/**
 * US Letter, 8 1/2 × 11 in (ANSI/ASME Y14.1 size A), for a quilter who works in inches; ISO 216 A4, 210 × 297 mm,
 * for one who works in centimetres. Margins of 1/2 in and 12 mm clear the unprintable edge of home printers
 * (common practice, no source).
 */
export const PAPERS: Readonly<Record<Units, Paper>> = {
  in: { name: 'letter', label: 'Letter (8 1/2 × 11 in)', width: 8.5 * POINTS_PER_INCH, height: 11 * POINTS_PER_INCH, margin: 0.5 * POINTS_PER_INCH },
  cm: { name: 'a4', label: 'A4 (21 × 29.7 cm)', width: (21 / CM_PER_INCH) * POINTS_PER_INCH, height: (29.7 / CM_PER_INCH) * POINTS_PER_INCH, margin: (1.2 / CM_PER_INCH) * POINTS_PER_INCH },
};

/** The paper for a viewer's units. */
export function paperFor(units: Units): Paper {
  return PAPERS[units];
}

/** An axis-aligned box in points, origin top-left, y down (as pdfkit draws). */
export interface Box {
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

/** The part of the page inside the margins. */
export function printableBox(paper: Paper): Box {
  return { x: paper.margin, y: paper.margin, width: paper.width - 2 * paper.margin, height: paper.height - 2 * paper.margin };
}
