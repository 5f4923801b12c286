import type { Units } from '../design/design.schema.ts';
import { inchFraction } from '../units/units.ts';

/**
 * A length as a quilter reads it off a ruler, in the design's units:
 * inches to the nearest 1/8 in as a mixed fraction in lowest terms ("2 3/4 in", "1/2 in", "12 in"),
 * centimetres to the nearest 0.5 cm ("3.5 cm", "4 cm"). Lengths that round to zero but are not zero read
 * "under 1/16 in" / "under 0.25 cm" (half a ruler step), so a short move is never shown as nothing.
 * `value` must be finite and ≥ 0 (a length); anything else is a caller bug and throws.
 */
export function formatRulerLength(value: number, units: Units): string {
  if (!(Number.isFinite(value) && value >= 0)) {
    throw new Error(`walkthrough/rulerLength: a length must be finite and not negative, got ${value}`);
  }
  return units === 'in' ? formatInches(value) : formatCentimetres(value);
}

function formatInches(value: number): string {
  if (Math.round(value * 8) === 0) return value === 0 ? '0 in' : 'under 1/16 in';
  return `${inchFraction(value, 8)} in`;
}

function formatCentimetres(value: number): string {
  const halves = Math.round(value * 2);
  if (halves === 0) return value === 0 ? '0 cm' : 'under 0.25 cm';
  return halves % 2 === 0 ? `${halves / 2} cm` : `${(halves - 1) / 2}.5 cm`;
}
