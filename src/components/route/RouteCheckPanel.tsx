import { memo, type ReactNode } from 'react';
import type { Units } from '@shared/design/design.schema.ts';
import { formatLength, formatThread, type UnitPair } from '@shared/units/units.ts';
import { formatMinutes } from '../designs/formatFigures.ts';
import { FigureHint } from './FigureHint.tsx';
import type { GapView, RouteCheckView, RouteFigures, ThreadBudgetView } from './routeCheckView.ts';

export interface RouteCheckPanelProps {
  readonly check: RouteCheckView | null;
  /** 'checking' while a fresh check is on its way (the old figures stay visible, marked as stale). */
  readonly state: 'idle' | 'checking' | 'failed';
  readonly message: string | null;
  /** The design's own units (the figures arrive in them). */
  readonly units: Units;
  /** The viewer's unit choice: every figure is written in it. */
  readonly viewerUnits: Units;
}

/**
 * The route check card in quilting words: passes, stops, loose ends, line groups, lengths, thread budget, gap check
 * and warnings. Lengths arrive in the design's units and are written in the viewer's.
 */
export const RouteCheckPanel = memo(function RouteCheckPanel({ check, state, message, units: designUnits, viewerUnits }: RouteCheckPanelProps) {
  const units: UnitPair = { design: designUnits, viewer: viewerUnits };
  return (
    <section aria-label="Route check" aria-busy={state === 'checking'} className="rounded border border-muslin-300 bg-white p-3">
      <div className="flex items-baseline justify-between gap-2">
        <h2 className="text-lg font-semibold">Route check</h2>
        <span className="text-xs text-denim-700" role="status">{state === 'checking' ? 'Checking…' : state === 'failed' ? 'Not up to date' : 'Up to date'}</span>
      </div>
      {message && <p className="mt-1 text-sm text-madder-600" role="alert">{message}</p>}
      {!check && state !== 'failed' && <p className="mt-2 text-sm">Draw a quilting line to see its route check.</p>}
      {check && (
        <div className={state === 'checking' ? 'opacity-70' : ''}>
          <FigureList figures={check.planned} units={units} extra={[['Passes if the needle never travels', String(check.passesWithoutTravel), 'passes-without-travel']]} />
          {check.own && (
            <>
              <h3 className="mt-3 font-semibold">My stitching order</h3>
              <FigureList figures={check.own.figures} units={units} extra={[]} />
            </>
          )}
          <ThreadList thread={check.own?.thread ?? check.thread} whose={check.own ? 'my stitching order' : 'the planned route'} viewer={viewerUnits} />
          <h3 className="mt-3 font-semibold">Gap check</h3>
          {check.gap ? (
            <p className={`text-sm ${check.gap.status === 'over' ? 'text-madder-600' : ''}`} data-figure="gap">
              Widest gap {length(check.gap.widestGap, units)} across (circled on the block)
              {check.gap.limit === null ? '. Set the batting’s spacing limit to compare.' : GAP_WORDS[check.gap.status](length(check.gap.limit, units))}
            </p>
          ) : (
            <p className="text-sm">The gap check could not measure this design.</p>
          )}
          {check.warnings.length > 0 && (
            <ul className="mt-2 list-disc pl-5 text-sm text-madder-600">
              {check.warnings.map((w, i) => <li key={i}>{w}</li>)}
            </ul>
          )}
        </div>
      )}
    </section>
  );
});

const GAP_WORDS: Readonly<Record<GapView['status'], (limit: string) => string>> = {
  within: (l) => `: within the batting’s ${l} limit.`,
  over: (l) => `: over the batting’s ${l} limit. Add quilting there.`,
  'at-limit': (l) => `: right at the batting’s ${l} limit.`,
  'no-limit': () => '.',
};

function length(value: number, units: UnitPair): string {
  return formatLength(value, units.design, units.viewer);
}

/** What each figure means, said once; shown on hover and on tap (FigureHint). */
const HINTS: Readonly<Record<string, string>> = {
  passes: 'A pass is one run of stitching from where you start to where you tie off.',
  stops: 'Each stop is a tie-off and a new start: one fewer than the passes.',
  'odd-points': 'A point where an odd number of lines meet. A group of lines sews in one pass only when it has no more than two loose ends (where you start and where you finish); every further two loose ends cost one more pass or some travel.',
  pieces: 'Lines that touch each other form one group. The needle cannot get from one group to another without a stop, unless it travels along a seam or the edge.',
  'stitch-length': 'Length of the quilting lines themselves, each sewn once.',
  retrace: 'Stitching sewn a second time over a line already quilted, to reach the next line.',
  ditch: 'Travel sewn in the ditch, along a seam, where it hides.',
  edge: 'Travel along the outer edge, inside the binding band, where the binding covers it.',
  optimal: 'Whether the planner proved that no route has less travel for this many stops.',
  'passes-without-travel': 'How many passes the lines need if you never sew along a seam or the edge and never retrace. Travel is what brings the planned route below this.',
};

function Row({ label, figure, children }: { label: string; figure: string; children: ReactNode }) {
  const hint = HINTS[figure];
  return (
    <div className="flex justify-between gap-3 border-b border-muslin-100 py-0.5">
      <dt>{label}{hint && <FigureHint label={label} text={hint} />}</dt>
      <dd className="font-semibold tabular-nums" data-figure={figure}>{children}</dd>
    </div>
  );
}

function FigureList({ figures, units, extra }: { figures: RouteFigures; units: UnitPair; extra: readonly (readonly [string, string, string])[] }) {
  return (
    <div className="mt-2 text-sm">
      {/* A <dl> may hold only dt/dd groups wrapped in one <div> each, so the two big figures are a list of their own. */}
      <dl className="grid grid-cols-2 gap-2 pb-2">
        <div className="rounded bg-muslin-100 p-2 text-center">
          <dt className="text-xs uppercase tracking-wide">Passes</dt>
          <dd className="text-2xl font-bold" data-figure="passes">{figures.passes}</dd>
        </div>
        <div className="rounded bg-muslin-100 p-2 text-center">
          <dt className="text-xs uppercase tracking-wide">Stops</dt>
          <dd className="text-2xl font-bold" data-figure="stops">{figures.stops}</dd>
        </div>
      </dl>
      <dl>
      <Row label="Loose ends" figure="odd-points">{figures.oddPoints}</Row>
      <Row label="Line groups" figure="pieces">{figures.pieces}</Row>
      <Row label="Stitching" figure="stitch-length">{length(figures.stitchLength, units)}</Row>
      <Row label="Retrace" figure="retrace">{length(figures.retraceLength, units)}</Row>
      <Row label="Ditch travel" figure="ditch">{length(figures.ditchLength, units)}</Row>
      <Row label="Edge travel" figure="edge">{length(figures.edgeLength, units)}</Row>
      {figures.optimal !== undefined && <Row label="Planned route" figure="optimal">{figures.optimal ? 'best possible' : 'good, not proven best'}</Row>}
      {extra.map(([label, value, key]) => <Row key={key} label={label} figure={key}>{value}</Row>)}
      </dl>
    </div>
  );
}

const SETTING_LABELS: Readonly<Record<string, string>> = {
  spi: 'Stitches per inch (SPI)',
  sandwichThickness: 'Sandwich thickness',
  tieOffTail: 'Tie-off tail',
  bobbinCapacity: 'Bobbin holds',
  stitchesPerMinute: 'Stitches per minute',
  model: 'Thread model',
};

function ThreadList({ thread, whose, viewer }: { thread: ThreadBudgetView; whose: string; viewer: Units }) {
  const assumed = thread.assumptions.filter((a) => a.setting !== 'model');
  return (
    <>
      <h3 className="mt-3 font-semibold">Thread budget <span className="font-normal text-xs">for {whose}</span></h3>
      <dl className="text-sm">
        <Row label="Stitches" figure="stitches">{thread.stitchCount.toLocaleString('en')}</Row>
        <Row label="Top thread" figure="top-thread">{formatThread(thread.topThreadYards, viewer)}</Row>
        <Row label="Bobbin thread" figure="bobbin-thread">{formatThread(thread.bobbinThreadYards, viewer)}</Row>
        <Row label="Bobbins" figure="bobbins">{thread.bobbins}</Row>
        <Row label="Sewing time" figure="time">{formatMinutes(thread.sewingMinutes)}</Row>
      </dl>
      <details className="mt-1 text-xs">
        <summary className="cursor-pointer">Settings behind these figures</summary>
        <ul className="mt-1 space-y-1">
          {assumed.map((a) => (
            <li key={a.setting}>
              {SETTING_LABELS[a.setting] ?? a.setting}: <strong>{settingValue(a.setting, a.value, viewer)}</strong>{' '}
              <span className="text-denim-700">{a.source === 'design' ? '(set in this design)' : `(default — ${a.source})`}</span>
            </li>
          ))}
        </ul>
      </details>
    </>
  );
}

/** Thread settings are stored in fixed units (inches, yards); they are written in the viewer's. */
function settingValue(setting: string, value: number | string, viewer: Units): string {
  if (typeof value !== 'number') return value;
  if (setting === 'sandwichThickness' || setting === 'tieOffTail') return formatLength(value, 'in', viewer);
  if (setting === 'bobbinCapacity') return formatThread(value, viewer);
  return String(value);
}
