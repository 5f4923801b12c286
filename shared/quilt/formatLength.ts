import type { Units } from '../design/design.schema.ts';
import { convertLength } from '../units/units.ts';

/**
 * A length as a quilter reads it: inches to the nearest 1/8 in as a whole number and a reduced fraction
 * ("42 3/8 in", "5/8 in"), centimetres to one decimal ("106.7 cm"). Negative lengths keep their sign.
 */
export function formatLength(value: number, units: Units): string {
  if (!Number.isFinite(value)) throw new Error(`quilt/formatLength: ${value} is not a length`);
  if (units === 'cm') return `${(Math.round(value * 10) / 10).toFixed(1)} cm`;
  const eighths = Math.round(Math.abs(value) * 8);
  const sign = value < 0 && eighths > 0 ? '−' : '';
  const whole = Math.floor(eighths / 8);
  let num = eighths % 8;
  let den = 8;
  while (num > 0 && num % 2 === 0) {
    num /= 2;
    den /= 2;
  }
  if (num === 0) return `${sign}${whole} in`;
  return whole === 0 ? `${sign}${num}/${den} in` : `${sign}${whole} ${num}/${den} in`;
}

/**
 * A quilt length measured in the quilt's `from` units, written in the viewer's units the quilt way: inches to the
 * nearest 1/8 in, centimetres to one decimal (formatLength above).
 */
export function formatQuiltLength(value: number, from: Units, viewer: Units): string {
  return formatLength(convertLength(value, from, viewer), viewer);
}

/** A finished quilt or block size in the viewer's units: "44 × 57 1/8 in", "111.8 × 144.8 cm". */
export function formatQuiltSize(width: number, height: number, from: Units, viewer: Units): string {
  const w = formatQuiltLength(width, from, viewer);
  const h = formatQuiltLength(height, from, viewer);
  return `${w.replace(/ (in|cm)$/, '')} × ${h}`;
}
