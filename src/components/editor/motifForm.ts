import type { Units } from '@shared/design/design.schema.ts';
import type { MotifKind } from '@shared/motifs/motifs.ts';

/** One number the motif panel asks for. `length` fields are in the design's units. */
export interface MotifField {
  readonly key: string;
  readonly label: string;
  readonly unit: 'length' | 'degrees' | 'count';
  readonly step: number;
}

const L = (key: string, label: string): MotifField => ({ key, label, unit: 'length', step: 0.125 });
const ANGLE: MotifField = { key: 'angle', label: 'Direction', unit: 'degrees', step: 15 };

/** The fields each motif shows, in order (the generator's own schema checks the values). */
export const MOTIF_FIELDS: Readonly<Record<MotifKind, readonly MotifField[]>> = {
  'straight-lines': [L('spacing', 'Spacing'), ANGLE],
  crosshatch: [L('spacing', 'Spacing'), ANGLE, { key: 'crossAngle', label: 'Angle between sets', unit: 'degrees', step: 15 }],
  echo: [L('spacing', 'Spacing'), { key: 'maxCount', label: 'Most echoes', unit: 'count', step: 1 }],
  pebbles: [L('minRadius', 'Smallest radius'), L('maxRadius', 'Largest radius'), L('gap', 'Gap'), { key: 'seed', label: 'Arrangement number', unit: 'count', step: 1 }],
  'ribbon-candy': [L('pitch', 'Loop length'), L('margin', 'Margin')],
  arches: [L('archWidth', 'Arch width'), L('rowSpacing', 'Row spacing'), ANGLE],
};

/**
 * Starting values, in inches; cm designs get them × 2.54 rounded to half centimetres.
 * Common practice, no source: 1/2 in to 1 in spacing is a usual walking-foot line spacing.
 */
const DEFAULTS_IN: Readonly<Record<MotifKind, Readonly<Record<string, number>>>> = {
  'straight-lines': { spacing: 0.5, angle: 45 },
  crosshatch: { spacing: 1, angle: 45, crossAngle: 90 },
  echo: { spacing: 0.5, maxCount: 20 },
  pebbles: { minRadius: 0.25, maxRadius: 0.6, gap: 0.05, seed: 1 },
  'ribbon-candy': { pitch: 0.75, margin: 0.125 },
  arches: { archWidth: 1.5, rowSpacing: 1, angle: 0 },
};

/** The panel's first values for a motif in the given units. */
export function defaultMotifValues(kind: MotifKind, units: Units): Record<string, number> {
  const out: Record<string, number> = {};
  for (const f of MOTIF_FIELDS[kind]) {
    const v = DEFAULTS_IN[kind][f.key] ?? 0;
    out[f.key] = f.unit === 'length' && units === 'cm' ? Math.max(0.05, Math.round(v * 2.54 * 2) / 2) : v;
  }
  return out;
}

/** The params object the motif generator parses: the kind plus the panel's numbers. */
export function buildMotifParams(kind: MotifKind, values: Readonly<Record<string, number>>): Record<string, unknown> {
  const params: Record<string, unknown> = { kind };
  for (const f of MOTIF_FIELDS[kind]) {
    const v = values[f.key];
    if (v !== undefined && Number.isFinite(v)) params[f.key] = v;
  }
  return params;
}
