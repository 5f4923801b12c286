import { formatLength, type UnitPair } from '@shared/units/units.ts';
import { RoutePlayerControls } from './RoutePlayerControls.tsx';
import type { RoutePlayer } from './useRoutePlayer.ts';
import type { RoutePlanState } from './useRoutePlan.ts';

export interface RoutePanelProps {
  readonly routes: RoutePlanState;
  readonly player: RoutePlayer;
  readonly units: UnitPair;
  /** Keeping a route needs the design saved (the route is stored for a saved version). */
  readonly canKeep: boolean;
  readonly hasOwnRoute: boolean;
  readonly onClearOwn: () => void;
}

/** Plan route, the route preview player, and keeping the planned or own route. */
export function RoutePanel({ routes, player, units, canKeep, hasOwnRoute, onClearOwn }: RoutePanelProps) {
  const { plan, saved, busy, message } = routes;
  const showing = plan ? 'planned' : saved && routes.savedIsCurrent ? saved.kind : null;
  return (
    <section aria-label="Route" className="rounded border border-muslin-300 bg-white p-3 text-sm">
      <div className="flex items-center justify-between gap-2">
        <h2 className="text-lg font-semibold">Route</h2>
        <button type="button" onClick={routes.planRoute} disabled={busy !== null} className="rounded bg-denim-600 px-3 py-1.5 font-semibold text-white disabled:opacity-60">
          {busy === 'planning' ? 'Planning…' : 'Plan route'}
        </button>
      </div>
      {plan && (
        <p className="mt-1" data-figure="plan-summary">
          Planned: {plan.passes} pass{plan.passes === 1 ? '' : 'es'}, {plan.stops} stop{plan.stops === 1 ? '' : 's'}, travel {formatLength(plan.travelLength, units.design, units.viewer)}
          {plan.optimal === true ? ' (best possible route)' : ''}.
        </p>
      )}
      {!plan && saved && (
        <p className="mt-1">
          Kept: the {saved.kind === 'planned' ? 'planned route' : 'your own stitching order'}
          {routes.savedIsCurrent ? '.' : ', for an earlier version of this design. Plan again to see it for the current lines.'}
        </p>
      )}
      {showing && (
        <div className="mt-2">
          <RoutePlayerControls player={player} units={units} label="Route preview" />
          <p className="mt-1 text-xs text-denim-700">Solid: stitching · long dashes: retrace · dots: ditch travel · dash-dot: edge travel.</p>
        </div>
      )}
      <div className="mt-3 flex flex-wrap gap-2">
        <button type="button" onClick={() => routes.keep('planned')} disabled={!plan || !canKeep || busy !== null} className="rounded border border-denim-600 px-2 py-1 disabled:opacity-50">Keep planned route</button>
        <button type="button" onClick={() => routes.keep('own')} disabled={!hasOwnRoute || !canKeep || busy !== null} className="rounded border border-denim-600 px-2 py-1 disabled:opacity-50">Keep my order</button>
        {hasOwnRoute && <button type="button" onClick={onClearOwn} className="underline">Clear my order</button>}
      </div>
      {!canKeep && (plan || hasOwnRoute) && <p className="mt-1 text-xs">Saving first… a route is kept for the saved design.</p>}
      {message && <p className="mt-1" role="status">{message}</p>}
    </section>
  );
}
