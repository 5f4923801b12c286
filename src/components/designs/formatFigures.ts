// Lengths, sizes and thread are written by shared/units/units.ts (in the viewer's units); these are the other figures.
import { formatDate } from '@shared/format/dates.ts';

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
  return formatDate(at, 'day');
}

function trimDecimals(value: number, digits: number): string {
  return String(Number(value.toFixed(digits)));
}
