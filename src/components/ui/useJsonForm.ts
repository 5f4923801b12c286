import { useEffect, useState, type FormEvent } from 'react';
import { sendJson } from './submitJson.ts';

export interface JsonFormState {
  busy: boolean;
  error: string | null;
  success: string | null;
  fields: Record<string, string>;
}

/**
 * Submits a form's fields as JSON. `toBody` builds the request body from the FormData; `onSuccess`
 * returns the message to show (or navigates away). Field errors from the API land in `fields`.
 */
export function useJsonForm<T>(
  method: 'POST' | 'PUT' | 'PATCH',
  url: string,
  toBody: (form: FormData) => unknown,
  onSuccess: (data: T, form: HTMLFormElement) => string | null | void,
) {
  const [state, setState] = useState<JsonFormState>({ busy: false, error: null, success: null, fields: {} });
  // False in the server-rendered HTML and until this island has hydrated: the submit button stays
  // disabled, so an early click or Enter cannot fall back to a native submit of the form.
  const [ready, setReady] = useState(false);
  useEffect(() => setReady(true), []);
  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = event.currentTarget;
    setState({ busy: true, error: null, success: null, fields: {} });
    const outcome = await sendJson<T>(method, url, toBody(new FormData(form)));
    if (!outcome.ok) {
      setState({ busy: false, error: outcome.error.message, success: null, fields: outcome.error.fields });
      const first = Object.keys(outcome.error.fields)[0];
      const input = first ? form.querySelector<HTMLInputElement>(`[name="${CSS.escape(first)}"]`) : null;
      input?.focus();
      return;
    }
    const message = onSuccess(outcome.data, form) ?? null;
    setState({ busy: false, error: null, success: message, fields: {} });
  }
  return { ...state, ready, onSubmit };
}

/** A FormData text value ('' when missing). */
export function field(form: FormData, name: string): string {
  const v = form.get(name);
  return typeof v === 'string' ? v : '';
}
