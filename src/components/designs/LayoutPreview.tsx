import { buildPiecedLayout, type PiecedLayoutId } from '@shared/layouts/piecedLayouts.ts';

/** Fabric tones for patches, read from the palette tokens (src/styles/global.css). */
const PATCH_FILLS = ['var(--color-muslin-100)', 'var(--color-muslin-300)', 'var(--color-denim-500)', 'var(--color-sage-500)'];

export interface LayoutPreviewProps {
  readonly layout: PiecedLayoutId;
  /** Rendered side length in CSS px. */
  readonly size?: number;
}

/** A small drawing of a pieced layout: its patches in alternating tones and its seam lines. Decorative. */
export function LayoutPreview({ layout, size = 72 }: LayoutPreviewProps) {
  const { patches, seams } = buildPiecedLayout(layout, 100, 100);
  return (
    <svg viewBox="-2 -2 104 104" width={size} height={size} aria-hidden="true" focusable="false">
      {patches.map((p, i) => (
        <polygon key={i} points={p.polygon.map(([x, y]) => `${x},${y}`).join(' ')} fill={PATCH_FILLS[i % PATCH_FILLS.length]} />
      ))}
      {seams.map((s, i) => (
        <polyline key={i} points={s.map(([x, y]) => `${x},${y}`).join(' ')} fill="none" stroke="var(--color-indigo-ink)" strokeWidth={1.2} />
      ))}
      <rect x={0} y={0} width={100} height={100} fill="none" stroke="var(--color-indigo-ink)" strokeWidth={2} />
    </svg>
  );
}
