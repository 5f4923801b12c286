interface Props {
  tone: 'error' | 'success';
  message: string | null;
}

/** The message above a form's fields. A live region, so screen readers hear the outcome of a submit. */
export function FormAlert({ tone, message }: Props) {
  const styles = tone === 'error' ? 'border-madder-500 bg-madder-500/10 text-madder-600' : 'border-sage-500 bg-sage-500/10 text-sage-600';
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} aria-live="polite" className={message ? `rounded-md border-l-4 px-3 py-2 font-semibold ${styles}` : 'sr-only'}>
      {message}
    </div>
  );
}
