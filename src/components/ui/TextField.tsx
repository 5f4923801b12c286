import { useId, type InputHTMLAttributes } from 'react';

interface Props extends Omit<InputHTMLAttributes<HTMLInputElement>, 'id'> {
  label: string;
  name: string;
  /** Shown under the input and tied to it with aria-describedby. */
  hint?: string;
  error?: string | undefined;
}

/** A labelled input with its hint and error, announced together by screen readers. */
export function TextField({ label, name, hint, error, ...input }: Props) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(' ') || undefined;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      <input
        id={id}
        name={name}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={`rounded-md border bg-white px-3 py-2 text-base shadow-inner ${error ? 'border-madder-500' : 'border-muslin-300'}`}
        {...input}
      />
      {hint && (
        <p id={hintId} className="text-sm text-denim-700">
          {hint}
        </p>
      )}
      {error && (
        <p id={errorId} className="text-sm font-semibold text-madder-600">
          {error}
        </p>
      )}
    </div>
  );
}
