interface Props {
  busy: boolean;
  /** False until the island has hydrated (see useJsonForm). */
  ready?: boolean;
  children: string;
  busyText?: string;
  tone?: 'primary' | 'quiet';
}

export const buttonClass = {
  primary: 'inline-flex items-center justify-center rounded-md bg-denim-600 px-4 py-2 font-semibold text-white hover:bg-denim-700 disabled:opacity-60',
  quiet: 'inline-flex items-center justify-center rounded-md border border-denim-500 px-4 py-2 font-semibold text-denim-700 hover:bg-muslin-100 disabled:opacity-60',
};

export function SubmitButton({ busy, ready = true, children, busyText = 'Please wait…', tone = 'primary' }: Props) {
  return (
    <button type="submit" disabled={busy || !ready} aria-busy={busy} className={buttonClass[tone]}>
      {busy ? busyText : children}
    </button>
  );
}
