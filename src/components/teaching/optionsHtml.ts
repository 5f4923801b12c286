// <option> elements as one HTML string (values and labels escaped), for a <select set:html>.
const escapeHtml = (t: string) => t.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

export function optionsHtml(options: readonly { value: string; label: string }[]): string {
  return options.map((o) => `<option value="${escapeHtml(o.value)}">${escapeHtml(o.label)}</option>`).join('');
}
