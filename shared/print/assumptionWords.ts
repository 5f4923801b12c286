import type { Units } from '../design/design.schema.ts';
import type { BudgetAssumption } from '../route/threadBudget.ts';
import { CM_PER_INCH } from '../design/design.schema.ts';
import { formatLength, METRES_PER_YARD } from '../units/units.ts';

/**
 * One line of "where these numbers come from" for a printed thread budget, in the viewer's units. Thread settings
 * are stored in fixed units (SPI and inches, bobbins in yards: threadBudget.ts); a centimetre viewer reads them
 * converted, and reads only the kind of source ("from memory", "common practice, no source"), since the sources'
 * notes quote inch figures. An inch viewer reads the whole note, as the screens show it.
 */
export function describeAssumption(a: Pick<BudgetAssumption, 'setting' | 'value' | 'source'>, viewer: Units): string {
  const source = a.source === 'design' ? 'set in this design' : a.source === 'quilt' ? 'set for this quilt' : viewer === 'cm' ? sourceKind(a.source) : a.source;
  const v = a.value;
  if (typeof v === 'string') return `${SETTING_WORDS[a.setting] ?? a.setting}: ${v} (${source})`;
  switch (a.setting) {
    case 'spi':
      return viewer === 'in' ? `Stitches per inch: ${v} (${source})` : `Stitches per centimetre: ${round(v / CM_PER_INCH, 1)} (${source})`;
    case 'sandwichThickness':
    case 'tieOffTail':
      return `${SETTING_WORDS[a.setting]}: ${viewer === 'in' ? formatLength(v, 'in', 'in') : `${round(v * CM_PER_INCH * 10, 1)} mm`} (${source})`;
    case 'bobbinCapacity':
      return `${SETTING_WORDS[a.setting]}: ${viewer === 'in' ? `${v} yd` : `${round(v * METRES_PER_YARD, 0)} m`} (${source})`;
    default:
      return `${SETTING_WORDS[a.setting] ?? a.setting}: ${v} (${source})`;
  }
}

const SETTING_WORDS: Readonly<Record<string, string>> = {
  model: 'Thread model',
  sandwichThickness: 'Quilt sandwich thickness',
  tieOffTail: 'Tail left at each tie-off, per thread',
  bobbinCapacity: 'One bobbin holds',
  stitchesPerMinute: 'Stitches per minute',
};

/** "from memory: about 4 in …" → "from memory"; a source without a note is kept whole. */
export function sourceKind(source: string): string {
  const colon = source.indexOf(':');
  return colon > 0 ? source.slice(0, colon) : source;
}

function round(v: number, digits: number): string {
  return String(Number(v.toFixed(digits)));
}
