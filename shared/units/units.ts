import { CM_PER_INCH, type Units } from '../design/design.schema.ts';

/**
 * One place that turns lengths into the words a quilter reads, in the VIEWER's units (their account choice), not
 * the design's: inches as ruler fractions to 1/16 in, centimetres to the millimetre (metres from 100 cm), thread in
 * yards or metres. Conversions are exact by definition: 1 in = 2.54 cm, 1 yd = 0.9144 m (international yard and
 * pound agreement, 1959).
 */
export const METRES_PER_YARD = 0.9144;

/** `value` measured in `from`, expressed in `to`. */
export function convertLength(value: number, from: Units, to: Units): number {
  if (from === to) return value;
  return from === 'in' ? value * CM_PER_INCH : value / CM_PER_INCH;
}

/**
 * Inches as a mixed fraction in lowest terms, rounded to the nearest 1/denominator: "12", "12 1/2", "3/8".
 * Negative values keep their sign ("-1/4").
 */
export function inchFraction(value: number, denominator = 16): string {
  const sign = value < 0 ? '-' : '';
  const parts = Math.round(Math.abs(value) * denominator);
  const whole = Math.floor(parts / denominator);
  let num = parts % denominator;
  let den = denominator;
  while (num > 0 && num % 2 === 0 && den % 2 === 0) {
    num /= 2;
    den /= 2;
  }
  if (num === 0) return `${whole === 0 ? '' : sign}${whole}`;
  return whole === 0 ? `${sign}${num}/${den}` : `${sign}${whole} ${num}/${den}`;
}

/** A length measured in `from`, written in the viewer's units: "57 15/16 in", "30.5 cm", "1.47 m". */
export function formatLength(value: number, from: Units, viewer: Units): string {
  const v = convertLength(value, from, viewer);
  if (viewer === 'in') return `${inchFraction(v)} in`;
  return Math.abs(v) >= 100 ? `${trimDecimals(v / 100, 2)} m` : `${trimDecimals(v, 1)} cm`;
}

/** A block or quilt size: "12 × 12 in", "30.5 × 30.5 cm" (sizes stay in centimetres, as patterns give them). */
export function formatSize(width: number, height: number, from: Units, viewer: Units): string {
  const f = (v: number) => (viewer === 'in' ? inchFraction(v) : trimDecimals(v, 1));
  return `${f(convertLength(width, from, viewer))} × ${f(convertLength(height, from, viewer))} ${viewer}`;
}

/** Thread, computed in yards (see shared/route/threadBudget.ts), in yards or metres with one decimal. */
export function formatThread(yards: number, viewer: Units): string {
  return viewer === 'in' ? `${trimDecimals(yards, 1)} yd` : `${trimDecimals(yards * METRES_PER_YARD, 1)} m`;
}

/** An area measured in square `from` units: "144 sq in", "929 cm²". */
export function formatArea(area: number, from: Units, viewer: Units): string {
  const f = convertLength(1, from, viewer);
  const v = area * f * f;
  return viewer === 'in' ? `${trimDecimals(v, 1)} sq in` : `${trimDecimals(v, 0)} cm²`;
}

/**
 * Reads what a quilter types into an inch field: "1/16", "1 1/2", "2-1/4", "0.0625", "3". Undefined when it is not
 * a number or a fraction (the caller names the field in its message).
 */
export function parseInchInput(text: string): number | undefined {
  const t = text.trim().replace(/\s*in(ches)?\.?$/i, '');
  const mixed = /^(\d+)(?:\s+|-)(\d+)\/(\d+)$/.exec(t);
  if (mixed) return fraction(Number(mixed[1]), Number(mixed[2]), Number(mixed[3]));
  const simple = /^(\d+)\/(\d+)$/.exec(t);
  if (simple) return fraction(0, Number(simple[1]), Number(simple[2]));
  if (/^\d*\.?\d+$/.test(t)) return Number(t);
  return undefined;
}

function fraction(whole: number, num: number, den: number): number | undefined {
  return den === 0 ? undefined : whole + num / den;
}

function trimDecimals(value: number, digits: number): string {
  return String(Number(value.toFixed(digits)));
}

/** Figures arrive in the design's units and are written in the viewer's. */
export interface UnitPair {
  readonly design: Units;
  readonly viewer: Units;
}

/**
 * Reads a length typed into a field in `units`: inches as a ruler reads them ("1/16", "1 1/2", "0.0625" — see
 * parseInchInput), centimetres as a decimal with a point or a comma ("1.5", "1,5"). Undefined when it is not one.
 */
export function parseLengthInput(text: string, units: Units): number | undefined {
  if (units === 'in') return parseInchInput(text);
  const t = text.trim().replace(/\s*cm\.?$/i, '').replace(',', '.');
  return /^\d*\.?\d+$/.test(t) ? Number(t) : undefined;
}

/** A length as a field shows it: inches as a ruler fraction when it falls on a 1/16 mark ("1/16", "2 1/4"), else a decimal. */
export function lengthInputText(value: number, units: Units): string {
  if (units === 'in' && Math.abs(value * 16 - Math.round(value * 16)) < 1e-9) return inchFraction(value, 16);
  return trimDecimals(value, units === 'in' ? 4 : 2);
}
