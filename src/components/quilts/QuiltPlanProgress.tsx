import type { QuiltPlanJob } from '@shared/contract/quiltPlan.ts';

export interface QuiltPlanProgressProps {
  readonly job: QuiltPlanJob;
}

/**
 * How far a planning worker has got with the quilt: corner-pair plans done out of the total, as a progress bar
 * screen readers read (role progressbar, aria-valuenow / max, and the count in words). Before a worker has taken
 * the job the total is not known yet: the bar stands at 0 and says it is waiting.
 */
export function QuiltPlanProgress({ job }: QuiltPlanProgressProps) {
  const waiting = job.state === 'queued' || job.total === 0;
  const max = Math.max(1, job.total);
  const now = Math.min(job.done, max);
  const words = waiting ? 'Waiting for a planning worker' : `${job.done} of ${job.total} corner pairs planned`;
  return (
    <div className="mt-2 max-w-md">
      <p id={`plan-progress-${job.id}`} className="text-sm">
        {waiting ? 'Waiting for a planning worker…' : `Planning corner pairs: ${job.done} of ${job.total}`}
      </p>
      <div
        role="progressbar"
        aria-labelledby={`plan-progress-${job.id}`}
        aria-valuemin={0}
        aria-valuemax={max}
        aria-valuenow={now}
        aria-valuetext={words}
        className="mt-1 h-3 w-full overflow-hidden rounded border border-denim-600 bg-white"
      >
        <div className="h-full bg-denim-600 transition-[width] duration-200" style={{ width: `${(100 * now) / max}%` }} />
      </div>
    </div>
  );
}
