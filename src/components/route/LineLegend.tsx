// The legend under a block: one small drawing per entry, drawn from the same style table as the canvas
// (shared/style/lineStyles.ts), so the legend cannot disagree with what it explains.
import { dashFor, LINE_STYLES, MARK_STYLES, type MarkName } from '@shared/style/lineStyles.ts';
import type { LegendEntry } from './legendEntries.ts';

const W = 34;
const H = 14;

function LineSwatch({ colour, width, dash }: { colour: string; width: number; dash: readonly number[] }) {
  return (
    <svg width={W} height={H} viewBox={`0 0 ${W} ${H}`} aria-hidden="true" className="shrink-0">
      <line x1={2} y1={H / 2} x2={W - 2} y2={H / 2} stroke={colour} strokeWidth={width} strokeDasharray={dash.length > 0 ? dash.join(' ') : undefined} strokeLinecap={dash.length > 0 ? 'butt' : 'round'} />
    </svg>
  );
}

function MarkSwatch({ mark }: { mark: MarkName }) {
  const { colour, shape } = MARK_STYLES[mark];
  const c = { x: W / 2, y: H / 2 };
  return (
    <svg width={W} height={H} viewBox={`0 0 ${W} ${H}`} aria-hidden="true" className="shrink-0">
      {shape === 'hollow-square' && <rect x={c.x - 5} y={c.y - 5} width={10} height={10} fill="none" stroke={colour} strokeWidth={2} />}
      {shape === 'ring-dot' && (
        <>
          <circle cx={c.x} cy={c.y} r={5.5} fill="#ffffff" stroke={colour} strokeWidth={2} />
          <circle cx={c.x} cy={c.y} r={2} fill={colour} />
        </>
      )}
      {shape === 'diamond' && <polygon points={`${c.x},${c.y - 6} ${c.x + 6},${c.y} ${c.x},${c.y + 6} ${c.x - 6},${c.y}`} fill={colour} />}
      {shape === 'thin-ring' && <circle cx={c.x} cy={c.y} r={5.5} fill="none" stroke={colour} strokeWidth={1.25} strokeDasharray="3 2" />}
      {shape === 'disc' && <circle cx={c.x} cy={c.y} r={5} fill={colour} stroke="#ffffff" strokeWidth={1.5} />}
    </svg>
  );
}

export function LineLegend({ entries }: { entries: readonly LegendEntry[] }) {
  if (entries.length === 0) return null;
  return (
    <ul aria-label="What the drawing shows" className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-denim-700" data-testid="line-legend">
      {entries.map((e) => {
        if (e.kind === 'line') {
          const style = LINE_STYLES[e.style];
          return (
            <li key={e.style} className="flex items-center gap-1.5" data-legend={e.style}>
              <LineSwatch colour={style.colour} width={style.width} dash={dashFor(style)} />
              {style.label}
            </li>
          );
        }
        if (e.kind === 'mark') {
          return (
            <li key={e.mark} className="flex items-center gap-1.5" data-legend={e.mark}>
              <MarkSwatch mark={e.mark} />
              {MARK_STYLES[e.mark].label}
            </li>
          );
        }
        return (
          <li key="groups" className="flex items-center gap-1.5" data-legend="groups">
            <span className="flex gap-0.5" aria-hidden="true">
              {e.colours.map((c) => (
                <svg key={c} width={10} height={H} viewBox={`0 0 10 ${H}`} className="shrink-0">
                  <line x1={1.5} y1={H / 2} x2={8.5} y2={H / 2} stroke={c} strokeWidth={3} strokeLinecap="round" />
                </svg>
              ))}
            </span>
            Line groups, one colour each (lines that touch form one group and can be sewn without a stop)
          </li>
        );
      })}
    </ul>
  );
}
