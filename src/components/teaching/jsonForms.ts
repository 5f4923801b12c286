// Progressive forms for the teaching pages: a <form data-json-form action="/api/…" data-method="POST"> is sent as
// JSON (fields by name; data-number / data-list / data-datetime inputs converted), file inputs marked data-raw as
// raw bytes. Errors from the API's one error shape appear in the form's [data-form-alert] and beside the named
// fields; on success (and after an optional data-then-post request) the page goes to data-redirect (":id"-style {placeholders} filled from the response) or reloads.
// data-changed-only (edit forms) sends only the fields changed since the page loaded. data-confirm asks first (a
// delete: the text says what is lost); a 409 needs_confirmation answer (a date in the past) is asked about and, on
// yes, sent again with confirmed: true.
import { sendJson } from '../ui/submitJson.ts';
import { ask } from './confirmDialog.ts';

function valueOf(el: HTMLInputElement | HTMLTextAreaElement | HTMLSelectElement): unknown {
  const v = el.value.trim();
  if (el.dataset['number'] !== undefined) return v === '' ? null : Math.round(Number(v) * Number(el.dataset['number'] || 1));
  if (el.dataset['list'] !== undefined) return v.split(/[,\n]/).map((s) => s.trim()).filter(Boolean);
  if (el.dataset['datetime'] !== undefined) return v === '' ? undefined : new Date(v).toISOString();
  return v === '' && el.dataset['optional'] !== undefined ? undefined : el.value;
}

/** True when the field still holds what the page was served with. */
function isUnchanged(el: HTMLInputElement | HTMLTextAreaElement | HTMLSelectElement): boolean {
  if (el instanceof HTMLSelectElement) return Array.from(el.options).every((o) => o.selected === o.defaultSelected);
  return el.value === el.defaultValue;
}

function fill(template: string, data: unknown): string {
  return template.replace(/\{([\w.]+)\}/g, (_, path: string) => String(path.split('.').reduce<unknown>((o, k) => (o == null ? o : (o as Record<string, unknown>)[k]), data) ?? ''));
}

async function submit(form: HTMLFormElement): Promise<void> {
  const question = form.dataset['confirm'];
  if (question !== undefined) {
    const yes = await ask({ title: form.dataset['confirmTitle'] ?? 'Are you sure?', message: question, yes: form.dataset['confirmYes'] ?? 'Yes', no: 'Keep it', destructive: true });
    if (!yes) return;
  }
  const alert = form.querySelector<HTMLElement>('[data-form-alert]');
  const button = form.querySelector<HTMLButtonElement>('button[type=submit]');
  form.querySelectorAll('[data-field-error]').forEach((e) => e.remove());
  if (alert) alert.hidden = true;
  if (button) button.disabled = true;
  const method = (form.dataset['method'] ?? 'POST') as 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  let outcome;
  const raw = form.querySelector<HTMLInputElement>('input[type=file][data-raw]');
  if (raw) {
    const file = raw.files?.[0];
    const side = form.querySelector<HTMLSelectElement>('[name=side]')?.value ?? 'front';
    const res = file
      ? await fetch(`${form.action}?side=${side}`, { method: 'POST', body: file, headers: { 'content-type': file.type || 'application/octet-stream' } }).catch(() => null)
      : null;
    const data = res ? await res.json().catch(() => null) : null;
    outcome = res?.ok ? { ok: true as const, data } : { ok: false as const, error: { message: file ? (data?.error?.message ?? 'The upload failed.') : 'Choose a photo first.', fields: {} as Record<string, string> } };
  } else {
    const body: Record<string, unknown> = {};
    for (const el of Array.from(form.elements)) {
      if (!(el instanceof HTMLInputElement || el instanceof HTMLTextAreaElement || el instanceof HTMLSelectElement) || !el.name) continue;
      if (form.dataset['changedOnly'] !== undefined && isUnchanged(el)) continue;
      const v = valueOf(el);
      if (v !== undefined) body[el.name] = v;
    }
    outcome = await sendJson(method, form.action, form.dataset['empty'] !== undefined ? undefined : body);
    if (!outcome.ok && outcome.error.code === 'needs_confirmation') {
      const yes = await ask({ title: 'Check the date', message: outcome.error.message, yes: 'Yes, keep this date', no: 'Change it' });
      if (yes) outcome = await sendJson(method, form.action, { ...body, confirmed: true });
      else {
        if (button) button.disabled = false;
        const date = form.querySelector<HTMLElement>('[name="releaseAt"], [name="startsOn"]');
        date?.focus();
        return;
      }
    }
  }
  if (button) button.disabled = false;
  if (!outcome.ok) {
    if (alert) {
      alert.textContent = outcome.error.message;
      alert.hidden = false;
    }
    for (const [name, message] of Object.entries(outcome.error.fields)) {
      const input = form.querySelector<HTMLElement>(`[name="${CSS.escape(name)}"]`);
      if (!input) continue;
      const p = document.createElement('p');
      p.dataset['fieldError'] = '';
      p.className = 'mt-1 text-sm font-semibold text-madder-600';
      p.textContent = message;
      input.insertAdjacentElement('afterend', p);
    }
    (alert ?? form).focus();
    return;
  }
  // data-then-post: a second request after the first succeeded (e.g. create the account, then accept the invitation).
  const then = form.dataset['thenPost'];
  if (then) {
    const second = await sendJson('POST', then);
    if (!second.ok) {
      if (alert) {
        alert.textContent = second.error.message;
        alert.hidden = false;
      }
      return;
    }
    outcome = second;
  }
  const to = form.dataset['redirect'];
  if (to) window.location.assign(fill(to, outcome.data));
  else window.location.reload();
}

/** "2027-01-05T09:00" in the browser's own time zone, as a datetime-local input shows it. */
function localInputValue(iso: string): string {
  const d = new Date(iso);
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}T${pad(d.getHours())}:${pad(d.getMinutes())}`;
}

// Edit forms: a stored instant is shown in the viewer's local time (the server does not know the time zone), and
// becomes the field's default so data-changed-only sees it as unchanged.
for (const input of Array.from(document.querySelectorAll<HTMLInputElement>('input[data-datetime][data-initial-iso]'))) {
  input.defaultValue = localInputValue(input.dataset['initialIso']!);
  input.value = input.defaultValue;
}

for (const form of Array.from(document.querySelectorAll<HTMLFormElement>('form[data-json-form]'))) {
  form.addEventListener('submit', (event) => {
    event.preventDefault();
    void submit(form);
  });
}
