import { FormAlert } from '../ui/FormAlert.tsx';
import { SubmitButton } from '../ui/SubmitButton.tsx';
import { TextField } from '../ui/TextField.tsx';
import { field, useJsonForm } from '../ui/useJsonForm.ts';

/** Asks POST /api/password-resets for a reset link; the answer is the same for every address. */
export default function ForgotPasswordForm() {
  const form = useJsonForm<{ message: string }>('POST', '/api/password-resets', (f) => ({ email: field(f, 'email') }), (data) => data.message);
  return (
    <form method="post" onSubmit={form.onSubmit} noValidate className="flex flex-col gap-4" aria-label="Ask for a reset link">
      <FormAlert tone="error" message={form.error} />
      <FormAlert tone="success" message={form.success} />
      <TextField label="E-mail" name="email" type="email" autoComplete="email" required maxLength={254} error={form.fields['email']} />
      <SubmitButton busy={form.busy} ready={form.ready} busyText="Sending…">
        Send reset link
      </SubmitButton>
    </form>
  );
}
