import type { SafetyCaution } from '@shared/walkthrough/safetyCautions.ts';
import type { Step } from '@shared/walkthrough/walkthrough.types.ts';

export interface StepListProps {
  readonly title: string;
  readonly steps: readonly Step[];
  readonly cautions: readonly SafetyCaution[];
  readonly current: number;
  readonly onPick: (index: number) => void;
}

/**
 * The instruction sheet: safety notes first, then every step in order with its tips; the current one marked.
 * It is what prints (the canvas and controls are hidden on paper), so a quilter can keep it by the machine.
 */
export function StepList({ title, steps, cautions, current, onPick }: StepListProps) {
  return (
    <section aria-labelledby="steps-heading" className="rounded border border-muslin-300 bg-white p-5 print:border-0 print:p-0">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="steps-heading" className="text-2xl font-bold">All steps: {title}</h2>
        <button type="button" onClick={() => window.print()} className="min-h-12 rounded-lg border-2 border-denim-600 px-4 text-lg font-semibold text-denim-700 print:hidden">
          Print the steps
        </button>
      </div>
      <div className="mt-3 rounded border-l-4 border-madder-500 bg-muslin-50 p-3" role="note" aria-label="Safety">
        <h3 className="text-lg font-bold">Safety at the machine</h3>
        <ul className="mt-1 list-disc pl-5 text-lg">
          {cautions.map((c) => <li key={c.kind}>{c.text}</li>)}
        </ul>
        <p className="mt-1 text-base">Your machine’s and tools’ own manuals come first; these notes do not replace them.</p>
      </div>
      <ol className="mt-4 flex flex-col gap-2" data-testid="step-list" data-print-keep>
        {steps.map((s) => (
          <li key={s.index}>
            <button
              type="button"
              onClick={() => onPick(s.index)}
              aria-current={s.index === current ? 'step' : undefined}
              className={`min-h-12 w-full rounded px-3 py-2 text-left text-lg ${s.index === current ? 'bg-muslin-200 font-semibold' : 'hover:bg-muslin-100'}`}
            >
              <span className="text-denim-600">{s.index + 1}.</span> {s.instruction}
              {s.hints.map((h) => <span key={h.kind} className="block text-base font-normal italic">Tip: {h.text}</span>)}
            </button>
          </li>
        ))}
      </ol>
    </section>
  );
}
