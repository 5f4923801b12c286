import { memo, type ReactNode } from 'react';
import type { Units } from '@shared/design/design.schema.ts';
import { formatDistance, formatMinutes } from '../designs/formatFigures.ts';
import type { GapView, RouteCheckView, RouteFigures, ThreadBudgetView } from './routeCheckView.ts';

export interface RouteCheckPanelProps {
  readonly check: RouteCheckView | null;
  /** 'checking' while a fresh check is on its way (the old figures stay visible, marked as stale). */
  readonly state: 'idle' | 'checking' | 'failed';
  readonly message: string | null;
  readonly units: Units;
}

/** The route check card: passes, stops, odd points, pieces, lengths, thread budget, gap check and warnings. */
export const RouteCheckPanel = memo(function RouteCheckPanel({ check, state, message, units }: RouteCheckPanelProps) {
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
          <FigureList figures={check.planned} units={units} extra={[['Passes with no travel at all', String(check.passesWithoutTravel), 'passes-without-travel']]} />
          {check.own && (
            <>
              <h3 className="mt-3 font-semibold">My stitching order</h3>
              <FigureList figures={check.own.figures} units={units} extra={[]} />
            </>
          )}
          <ThreadList thread={check.own?.thread ?? check.thread} whose={check.own ? 'my stitching order' : 'the planned route'} />
          <h3 className="mt-3 font-semibold">Gap check</h3>
          {check.gap ? (
            <p className={`text-sm ${check.gap.status === 'over' ? 'text-madder-600' : ''}`} data-figure="gap">
              Widest gap {formatDistance(check.gap.widestGap, units)} across (circled on the block)
              {check.gap.limit === null ? '. Set the batting’s spacing limit to compare.' : GAP_WORDS[check.gap.status](formatDistance(check.gap.limit, units))}
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

function Row({ label, figure, children }: { label: string; figure: string; children: ReactNode }) {
  return (
    <div className="flex justify-between gap-3 border-b border-muslin-100 py-0.5">
      <dt>{label}</dt>
      <dd className="font-semibold tabular-nums" data-figure={figure}>{children}</dd>
    </div>
  );
}

function FigureList({ figures, units, extra }: { figures: RouteFigures; units: Units; extra: readonly (readonly [string, string, string])[] }) {
  return (
    <dl className="mt-2 text-sm">
      <div className="grid grid-cols-2 gap-2 pb-2">
        <div className="rounded bg-muslin-100 p-2 text-center">
          <dt className="text-xs uppercase tracking-wide">Passes</dt>
          <dd className="text-2xl font-bold" data-figure="passes">{figures.passes}</dd>
        </div>
        <div className="rounded bg-muslin-100 p-2 text-center">
          <dt className="text-xs uppercase tracking-wide">Stops</dt>
          <dd className="text-2xl font-bold" data-figure="stops">{figures.stops}</dd>
        </div>
      </div>
      <Row label="Odd points" figure="odd-points">{figures.oddPoints}</Row>
      <Row label="Pieces" figure="pieces">{figures.pieces}</Row>
      <Row label="Stitching" figure="stitch-length">{formatDistance(figures.stitchLength, units)}</Row>
      <Row label="Retrace" figure="retrace">{formatDistance(figures.retraceLength, units)}</Row>
      <Row label="Ditch travel" figure="ditch">{formatDistance(figures.ditchLength, units)}</Row>
      <Row label="Edge travel" figure="edge">{formatDistance(figures.edgeLength, units)}</Row>
      {figures.optimal !== undefined && <Row label="Least travel" figure="optimal">{figures.optimal ? 'proven' : 'not proven'}</Row>}
      {extra.map(([label, value, key]) => <Row key={key} label={label} figure={key}>{value}</Row>)}
    </dl>
  );
}

const SETTING_LABELS: Readonly<Record<string, string>> = {
  spi: 'Stitches per inch',
  sandwichThickness: 'Sandwich thickness (in)',
  tieOffTail: 'Tie-off tail (in)',
  bobbinCapacity: 'Bobbin holds (yd)',
  stitchesPerMinute: 'Stitches per minute',
  model: 'Thread model',
};

function ThreadList({ thread, whose }: { thread: ThreadBudgetView; whose: string }) {
  const assumed = thread.assumptions.filter((a) => a.setting !== 'model');
  return (
    <>
      <h3 className="mt-3 font-semibold">Thread budget <span className="font-normal text-xs">for {whose}</span></h3>
      <dl className="text-sm">
        <Row label="Stitches" figure="stitches">{thread.stitchCount.toLocaleString('en')}</Row>
        <Row label="Top thread" figure="top-thread">{thread.topThreadYards.toFixed(1)} yd</Row>
        <Row label="Bobbin thread" figure="bobbin-thread">{thread.bobbinThreadYards.toFixed(1)} yd</Row>
        <Row label="Bobbins" figure="bobbins">{thread.bobbins}</Row>
        <Row label="Sewing time" figure="time">{formatMinutes(thread.sewingMinutes)}</Row>
      </dl>
      <details className="mt-1 text-xs">
        <summary className="cursor-pointer">Settings behind these figures</summary>
        <ul className="mt-1 space-y-1">
          {assumed.map((a) => (
            <li key={a.setting}>
              {SETTING_LABELS[a.setting] ?? a.setting}: <strong>{String(a.value)}</strong>{' '}
              {a.source === 'design' ? '(set in this design)' : <span className="text-madder-600">({a.source})</span>}
            </li>
          ))}
        </ul>
      </details>
    </>
  );
}
