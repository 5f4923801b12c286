import { FormAlert } from '../ui/FormAlert.tsx';
import { SubmitButton } from '../ui/SubmitButton.tsx';
import { useJsonForm } from '../ui/useJsonForm.ts';

/**
 * Finishes a sign-up with the token from the e-mailed link (POST /api/accounts/confirm). A button rather than
 * on page load: mail scanners open links, and opening the page must not create the account.
 */
export default function SignUpConfirmForm({ token }: { token: string }) {
  const form = useJsonForm('POST', '/api/accounts/confirm', () => ({ token }), () => {
    window.location.assign('/dashboard');
    return 'Account created. Opening your dashboard…';
  });
  return (
    <form method="post" onSubmit={form.onSubmit} noValidate className="flex flex-col gap-4" aria-label="Finish creating your account">
      <FormAlert tone="error" message={form.error ?? form.fields['token'] ?? null} />
      <FormAlert tone="success" message={form.success} />
      <SubmitButton busy={form.busy} ready={form.ready} busyText="Creating your account…">
        Create my account
      </SubmitButton>
    </form>
  );
}
