import type { Units } from '@shared/design/design.schema.ts';

/** Eighths of an inch as quilters write them: 12, 12 1/2, 3/8. Other values keep two decimals. */
export function formatInches(value: number): string {
  const eighths = Math.round(value * 8);
  if (Math.abs(eighths / 8 - value) > 1e-6) return trimDecimals(value, 2);
  const whole = Math.trunc(eighths / 8);
  let num = Math.abs(eighths % 8);
  let den = 8;
  while (num > 0 && num % 2 === 0) {
    num /= 2;
    den /= 2;
  }
  if (num === 0) return String(whole);
  const sign = eighths < 0 && whole === 0 ? '-' : '';
  return whole === 0 ? `${sign}${num}/${den}` : `${whole} ${num}/${den}`;
}

/** A length in the design's units: "12 1/2 in", "30.5 cm". */
export function formatLength(value: number, units: Units): string {
  return units === 'in' ? `${formatInches(value)} in` : `${trimDecimals(value, 1)} cm`;
}

/** A block size: "12 × 12 in". */
export function formatSize(width: number, height: number, units: Units): string {
  const f = (v: number) => (units === 'in' ? formatInches(v) : trimDecimals(v, 1));
  return `${f(width)} × ${f(height)} ${units}`;
}

/** A travel or stitch length, rounded for tables: "3.4 in", "0 in". */
export function formatDistance(value: number, units: Units): string {
  return `${trimDecimals(value, 1)} ${units}`;
}

/** Thread in yards (the unit thread is sold in here) with one decimal. */
export function formatYards(yards: number): string {
  return `${trimDecimals(yards, 1)} yd`;
}

/** Minutes, as "about 4 min" or "under 1 min". */
export function formatMinutes(minutes: number): string {
  if (minutes < 1) return 'under 1 min';
  return minutes < 90 ? `${Math.round(minutes)} min` : `${trimDecimals(minutes / 60, 1)} h`;
}

/** "3 minutes ago", "yesterday", or a date, relative to `now` (both ms since epoch). */
export function formatEdited(at: number, now: number): string {
  const s = Math.max(0, Math.round((now - at) / 1000));
  if (s < 60) return 'just now';
  const m = Math.round(s / 60);
  if (m < 60) return `${m} min ago`;
  const h = Math.round(m / 60);
  if (h < 24) return `${h} h ago`;
  const d = Math.round(h / 24);
  if (d === 1) return 'yesterday';
  if (d < 14) return `${d} days ago`;
  return new Date(at).toISOString().slice(0, 10);
}

function trimDecimals(value: number, digits: number): string {
  return String(Number(value.toFixed(digits)));
}
