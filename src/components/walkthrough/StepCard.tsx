import type { Step } from '@shared/walkthrough/walkthrough.types.ts';
import { directionWords } from '@shared/walkthrough/stepText.ts';

export interface StepCardProps {
  readonly step: Step;
}

/** The current step in large type: counter, heading, instruction, length and direction, and the trade's hints. */
export function StepCard({ step }: StepCardProps) {
  return (
    <section aria-labelledby="step-title" aria-live="polite" className="rounded border border-muslin-300 bg-white p-5 shadow-sm">
      <p className="text-lg font-semibold text-denim-600" data-testid="step-counter">
        {step.counter} · {step.passCounter}
      </p>
      <h2 id="step-title" className="mt-1 text-3xl font-bold">{step.title}</h2>
      <p className="mt-3 text-2xl leading-relaxed" data-testid="step-instruction">{step.instruction}</p>
      {(step.lengthText || step.direction) && (
        <p className="mt-3 flex flex-wrap gap-2 text-lg">
          {step.lengthText && <span className="rounded bg-muslin-100 px-2 py-1">Length: {step.lengthText}</span>}
          {step.direction && <span className="rounded bg-muslin-100 px-2 py-1">Direction: {directionWords(step.direction)}</span>}
          {step.patch && <span className="rounded bg-muslin-100 px-2 py-1">Patch: {step.patch}</span>}
        </p>
      )}
      {step.hints.length > 0 && (
        <ul className="mt-4 flex flex-col gap-2">
          {step.hints.map((h) => (
            <li key={h.kind} className="rounded border-l-4 border-ochre-500 bg-muslin-50 px-3 py-2 text-lg">
              <strong>Tip: </strong>{h.text}
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
