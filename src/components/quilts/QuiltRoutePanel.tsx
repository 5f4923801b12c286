import { useEffect, useState } from 'react';
import type { Units } from '@shared/design/design.schema.ts';
import { quiltPlanAnswerSchema, quiltPlanJobAnswerSchema, quiltPlanQueuedSchema, type QuiltPlan, type QuiltPlanAnswer, type QuiltPlanJob } from '@shared/contract/quiltPlan.ts';
import { formatLength, formatThread } from '@shared/units/units.ts';
import { chainStepWords } from '@shared/quilt/chainWords.ts';
import { apiRequest } from '../designs/apiClient.ts';
import { QuiltPlanProgress } from './QuiltPlanProgress.tsx';

/** How often the page asks how the planning worker is getting on (ms). */
const POLL_MS = 500;

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

type PanelState =
  | { kind: 'idle' }
  | { kind: 'busy' }
  | { kind: 'waiting'; job: QuiltPlanJob }
  | { kind: 'done'; plan: QuiltPlan; version: number }
  | { kind: 'failed'; message: string };

/**
 * Plans the chained route of the saved quilt (POST /api/quilts/:id/plan): the thread runs on from block to block;
 * each block's entry and exit corner, the travel, passes and thread. From stored corner costs the plan comes at once;
 * otherwise a planning worker makes it and the panel polls the job, showing its progress, then the plan.
 */
export function QuiltRoutePanel({ quiltId, version, dirty, viewerUnits, onPlanned }: QuiltRoutePanelProps) {
  const [state, setState] = useState<PanelState>({ kind: 'idle' });
  const jobId = state.kind === 'waiting' ? state.job.id : null;

  async function plan() {
    setState({ kind: 'busy' });
    const res = await apiRequest('POST', `/api/quilts/${quiltId}/plan`);
    if (!res.ok) return setState({ kind: 'failed', message: res.error.message });
    const planned = quiltPlanAnswerSchema.safeParse(res.value);
    if (planned.success) {
      onPlanned?.(planned.data);
      return setState({ kind: 'done', plan: planned.data.plan, version: planned.data.quiltVersion });
    }
    const queued = quiltPlanQueuedSchema.safeParse(res.value);
    setState(queued.success ? { kind: 'waiting', job: queued.data.job } : { kind: 'failed', message: 'The plan could not be read.' });
  }

  // While a worker plans, ask for the job every POLL_MS until it is done or has failed (stops when the panel goes).
  useEffect(() => {
    if (!jobId) return;
    const controller = new AbortController();
    let timer: ReturnType<typeof setTimeout> | undefined;
    const poll = async () => {
      const res = await apiRequest('GET', `/api/quilts/${quiltId}/plan-jobs/${jobId}`, undefined, controller.signal);
      if (controller.signal.aborted) return;
      if (!res.ok) return setState({ kind: 'failed', message: res.error.message });
      const parsed = quiltPlanJobAnswerSchema.safeParse(res.value);
      if (!parsed.success) return setState({ kind: 'failed', message: 'The planning progress could not be read.' });
      const { job, plan: made } = parsed.data;
      if (job.state === 'done' && made) {
        onPlanned?.({ quiltVersion: job.quiltVersion, plan: made });
        return setState({ kind: 'done', plan: made, version: job.quiltVersion });
      }
      if (job.state === 'failed') return setState({ kind: 'failed', message: job.failure?.message ?? 'Planning stopped.' });
      setState({ kind: 'waiting', job });
      timer = setTimeout(() => void poll(), POLL_MS);
    };
    timer = setTimeout(() => void poll(), POLL_MS);
    return () => {
      controller.abort();
      clearTimeout(timer);
    };
  }, [quiltId, jobId, onPlanned]);

  const len = (v: number, units: Units) => formatLength(v, units, viewerUnits);
  return (
    <section className="lg:col-span-2" aria-labelledby="route-heading">
      <h2 id="route-heading" className="text-xl font-bold">Quilted in one piece</h2>
      <p className="mt-1 max-w-prose">When the whole top is quilted at once, the thread can run on from one block to the next. The planner picks where each block starts and ends so the travel between blocks is least.</p>
      <button type="button" onClick={() => void plan()} disabled={dirty || state.kind === 'busy' || state.kind === 'waiting'} className="mt-2 rounded border border-denim-600 px-4 py-2 font-semibold text-denim-700 disabled:opacity-60">
        {state.kind === 'busy' || state.kind === 'waiting' ? 'Planning…' : 'Plan the route across the quilt'}
      </button>
      {dirty && <p className="mt-1 text-sm">Save the quilt first: the route is planned for the saved quilt.</p>}
      {state.kind === 'waiting' && <QuiltPlanProgress job={state.job} />}
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
              {state.plan.steps.map((s, i) => (
                <li key={`${s.cell.row}-${s.cell.column}`}>{chainStepWords(state.plan, i, viewerUnits)}</li>
              ))}
            </ol>
          </div>
        )}
      </div>
    </section>
  );
}
