import { useEffect, useRef, useState } from 'react';
import type { Point } from '@shared/geometry/point.ts';
import type { ChainLeg } from '@shared/quilt/chainOverview.ts';
import type { LinkMetric } from '@shared/quilt/chain.ts';
import { blockRect, finishedSize, type QuiltFrame } from '@shared/quilt/finishedSize.ts';
import { dashFor, LINE_STYLES, MARK_STYLES, type LineStyle } from '@shared/style/lineStyles.ts';
import { controlThroughCentre, type PlaybackFrame } from './routePlayback.ts';

export interface ChainRouteOverlayProps {
  readonly quilt: QuiltFrame;
  readonly legs: readonly ChainLeg[];
  readonly metric: LinkMetric;
  /** The replay's current frame, or null when it is not playing. */
  readonly frame: PlaybackFrame | null;
}

/**
 * The style of the way through a block and of a link, from the one visual language (shared/style/lineStyles.ts): the
 * thread runs on in stitching, and a link along the seams is travel in the ditch.
 */
export function chainStyles(metric: LinkMetric): { through: LineStyle; link: LineStyle } {
  return { through: LINE_STYLES.stitch, link: metric === 'along-seams' ? LINE_STYLES.ditch : LINE_STYLES.stitch };
}

const path = (pts: readonly Point[]) => pts.map((p, i) => `${i === 0 ? 'M' : 'L'}${p[0]} ${p[1]}`).join(' ');

/**
 * The chained route over the quilt map, in the quilt's own coordinates (the SVG's viewBox is the finished quilt, so
 * it lines up with the blocks drawn under it): in each block a curve from the entry corner to the exit corner, bowed
 * through the block's centre, with an arrowhead at the exit; links from block to block; the start and the finish
 * marked. Widths and dashes are the line styles' screen pixels, turned into quilt units from the drawn width.
 */
export function ChainRouteOverlay({ quilt, legs, metric, frame }: ChainRouteOverlayProps) {
  const box = useRef<SVGSVGElement>(null);
  const [pixels, setPixels] = useState(600);
  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const observer = new ResizeObserver(([entry]) => entry && entry.contentRect.width > 0 && setPixels(entry.contentRect.width));
    observer.observe(el);
    return () => observer.disconnect();
  }, []);
  const size = finishedSize(quilt);
  const unit = size.width / pixels;
  const { through, link } = chainStyles(metric);
  const stroke = (s: LineStyle) => ({ stroke: s.colour, strokeWidth: s.width * unit, strokeDasharray: dashFor(s, s.width * unit).join(' ') || undefined, fill: 'none', strokeLinecap: 'round' as const, strokeLinejoin: 'round' as const });
  const first = legs[0];
  const last = legs.at(-1);
  const mark = 6 * unit;
  const current = frame ? legs[frame.leg] : undefined;
  const lit = current ? blockRect(quilt, current.cell) : null;
  return (
    <svg
      ref={box}
      className="pointer-events-none absolute inset-0 z-20 h-full w-full"
      viewBox={`0 0 ${size.width} ${size.height}`}
      preserveAspectRatio="none"
      aria-hidden="true"
      data-testid="chain-route"
    >
      <defs>
        <marker id="chain-arrow" viewBox="0 0 10 10" refX="8" refY="5" markerWidth="4" markerHeight="4" orient="auto-start-reverse">
          <path d="M0 0 L10 5 L0 10 z" fill={through.colour} />
        </marker>
      </defs>
      {lit && <rect x={lit.x} y={lit.y} width={lit.width} height={lit.height} fill={through.colour} fillOpacity={0.18} data-lit-step={current?.step} />}
      {legs.map((l) => (
        <g key={l.step} data-step={l.step}>
          {l.link.length > 1 && <path d={path(l.link)} {...stroke(link)} data-link={l.step} />}
          <path d={`M${l.entry[0]} ${l.entry[1]} Q${controlThroughCentre(l).join(' ')} ${l.exit[0]} ${l.exit[1]}`} {...stroke(through)} markerEnd="url(#chain-arrow)" data-through={l.step} />
        </g>
      ))}
      {first && (
        <g data-mark="start">
          <circle cx={first.entry[0]} cy={first.entry[1]} r={mark} fill="white" stroke={MARK_STYLES.start.colour} strokeWidth={2 * unit} />
          <circle cx={first.entry[0]} cy={first.entry[1]} r={mark / 3} fill={MARK_STYLES.start.colour} />
        </g>
      )}
      {last && <path data-mark="finish" d={`M${last.exit[0]} ${last.exit[1] - mark} L${last.exit[0] + mark} ${last.exit[1]} L${last.exit[0]} ${last.exit[1] + mark} L${last.exit[0] - mark} ${last.exit[1]} z`} fill={MARK_STYLES.finish.colour} stroke="white" strokeWidth={unit} />}
      {frame && <circle data-needle cx={frame.needle[0]} cy={frame.needle[1]} r={mark * 0.8} fill={MARK_STYLES.needle.colour} stroke="white" strokeWidth={unit} />}
    </svg>
  );
}
