import type { Units } from '../design/design.schema.ts';
import { convertLength } from '../units/units.ts';
import type { Quilt } from './quilt.schema.ts';

/**
 * A quilt redrawn in other units, for a viewer who works in them (a printed plan in centimetres of a quilt kept in
 * inches): block size, sashing, borders, binding allowance and the trim settings' lengths are scaled; shrinkage is a
 * percentage and thread settings carry their own units (as convertDesign), except the batting spacing limit.
 */
export function convertQuilt(quilt: Quilt, to: Units): Quilt {
  if (quilt.units === to) return quilt;
  const k = convertLength(1, quilt.units, to);
  const { seamAllowance, margin, shrinkage } = quilt.trim;
  const spacing = quilt.thread?.battingSpacing;
  return {
    ...quilt,
    units: to,
    block: { width: quilt.block.width * k, height: quilt.block.height * k },
    sashing: quilt.sashing * k,
    borders: quilt.borders.map((b) => b * k),
    ...(quilt.bindingAllowance !== undefined ? { bindingAllowance: quilt.bindingAllowance * k } : {}),
    trim: {
      ...(seamAllowance !== undefined ? { seamAllowance: seamAllowance * k } : {}),
      ...(shrinkage !== undefined ? { shrinkage } : {}),
      ...(margin !== undefined ? { margin: margin * k } : {}),
    },
    ...(quilt.thread ? { thread: { ...quilt.thread, ...(spacing !== undefined ? { battingSpacing: spacing * k } : {}) } } : {}),
  };
}
