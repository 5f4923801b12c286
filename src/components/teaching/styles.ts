// Class strings shared by the teaching pages (our palette from src/styles/global.css). Touch targets are at
// least 44 px high (WCAG 2.5.5) because students use these pages on a tablet beside the machine.
export const ui = {
  card: 'rounded-lg border border-muslin-200 bg-white p-5 shadow-sm',
  button: 'inline-flex min-h-11 items-center justify-center rounded-md bg-denim-600 px-5 py-2 font-semibold text-white hover:bg-denim-700 disabled:opacity-60',
  dangerButton: 'inline-flex min-h-11 items-center justify-center rounded-md bg-madder-600 px-5 py-2 font-semibold text-white hover:bg-madder-500 disabled:opacity-60',
  quietButton: 'inline-flex min-h-11 items-center justify-center rounded-md border border-denim-500 px-5 py-2 font-semibold text-denim-700 hover:bg-muslin-100',
  input: 'mt-1 block min-h-11 w-full rounded-md border border-muslin-300 bg-white px-3 py-2 text-base',
  label: 'block font-semibold',
  link: 'font-semibold text-denim-600 underline underline-offset-4',
  alert: 'rounded-md border border-madder-500 bg-muslin-100 p-3 font-semibold text-madder-600',
  muted: 'text-sm text-denim-700',
  table: 'w-full border-collapse text-left text-sm',
  th: 'border-b border-muslin-300 px-3 py-2 font-semibold',
  td: 'border-b border-muslin-200 px-3 py-2 align-top',
} as const;

