import { useState } from 'react';
import type { Units } from '@shared/design/design.schema.ts';
import { quiltPlanAnswerSchema, type QuiltPlan, type QuiltPlanAnswer } from '@shared/contract/quiltPlan.ts';
import { formatLength, formatThread } from '@shared/units/units.ts';
import { apiRequest } from '../designs/apiClient.ts';

const CORNER_WORDS = ['top left', 'top right', 'bottom right', 'bottom left'] as const;

export interface QuiltRoutePanelProps {
  readonly quiltId: string;
  /** The saved version; the plan is of what is saved. */
  readonly version: number;
  /** Unsaved changes on the page: planning waits for a save. */
  readonly dirty: boolean;
  readonly viewerUnits: Units;
  /** Told each plan that arrives, so the quilt map can draw the route. */
  readonly onPlanned?: (answer: QuiltPlanAnswer) => void;
}

/**
 * Plans the chained route of the saved quilt (POST /api/quilts/:id/plan, run in the engine's worker pool): the
 * thread runs on from block to block; each block's entry and exit corner, the travel, passes and thread.
 */
export function QuiltRoutePanel({ quiltId, version, dirty, viewerUnits, onPlanned }: QuiltRoutePanelProps) {
  const [state, setState] = useState<{ kind: 'idle' } | { kind: 'busy' } | { kind: 'done'; plan: QuiltPlan; version: number } | { kind: 'failed'; message: string }>({ kind: 'idle' });

  async function plan() {
    setState({ kind: 'busy' });
    const res = await apiRequest('POST', `/api/quilts/${quiltId}/plan`);
    if (!res.ok) return setState({ kind: 'failed', message: res.error.message });
    const parsed = quiltPlanAnswerSchema.safeParse(res.value);
    setState(parsed.success ? { kind: 'done', plan: parsed.data.plan, version: parsed.data.quiltVersion } : { kind: 'failed', message: 'The plan could not be read.' });
    if (parsed.success) onPlanned?.(parsed.data);
  }

  const len = (v: number, units: Units) => formatLength(v, units, viewerUnits);
  return (
    <section className="lg:col-span-2" aria-labelledby="route-heading">
      <h2 id="route-heading" className="text-xl font-bold">Quilted in one piece</h2>
      <p className="mt-1 max-w-prose">When the whole top is quilted at once, the thread can run on from one block to the next. The planner picks where each block starts and ends so the travel between blocks is least.</p>
      <button type="button" onClick={() => void plan()} disabled={dirty || state.kind === 'busy'} className="mt-2 rounded border border-denim-600 px-4 py-2 font-semibold text-denim-700 disabled:opacity-60">
        {state.kind === 'busy' ? 'Planning…' : 'Plan the route across the quilt'}
      </button>
      {dirty && <p className="mt-1 text-sm">Save the quilt first: the route is planned for the saved quilt.</p>}
      <div aria-live="polite">
        {state.kind === 'failed' && <p className="mt-2 font-semibold text-madder-600">{state.message}</p>}
        {state.kind === 'done' && (
          <div className="mt-2" data-testid="quilt-route">
            <p>
              <strong>{state.plan.passes}</strong> {state.plan.passes === 1 ? 'pass' : 'passes'}, {state.plan.stops} {state.plan.stops === 1 ? 'stop' : 'stops'};
              travel <strong>{len(state.plan.totalTravel, state.plan.units)}</strong> ({len(state.plan.blockTravel, state.plan.units)} inside blocks, {len(state.plan.linkTravel, state.plan.units)} between them),
              {state.plan.proven ? ' the least possible.' : ` at least ${len(state.plan.lowerBound, state.plan.units)} is needed (not proven least in time).`}
              {' '}Thread: {formatThread(state.plan.topThreadYards, viewerUnits)} top, {formatThread(state.plan.bobbinThreadYards, viewerUnits)} bobbin ({state.plan.bobbins} {state.plan.bobbins === 1 ? 'bobbin' : 'bobbins'}).
              {state.version !== version && ' This plan is of an earlier save.'}
            </p>
            <ol className="mt-2 ml-5 list-decimal text-sm">
              {state.plan.steps.map((s) => (
                <li key={`${s.cell.row}-${s.cell.column}`}>
                  Row {s.cell.row + 1}, column {s.cell.column + 1}: start at the {CORNER_WORDS[s.entry]} corner, end at the {CORNER_WORDS[s.exit]}
                  {s.linkBefore > 0 ? ` (travel ${len(s.linkBefore, state.plan.units)} from the last block)` : ''}.
                </li>
              ))}
            </ol>
          </div>
        )}
      </div>
    </section>
  );
}
