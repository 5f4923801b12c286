import { FormAlert } from '../ui/FormAlert.tsx';
import { SubmitButton } from '../ui/SubmitButton.tsx';
import { TextField } from '../ui/TextField.tsx';
import { field, useJsonForm } from '../ui/useJsonForm.ts';

/** Sets a new password with the token from the e-mailed link (POST /api/password-resets/confirm). */
export default function ResetPasswordForm({ token }: { token: string }) {
  const form = useJsonForm<{ message: string }>(
    'POST',
    '/api/password-resets/confirm',
    (f) => ({ token, password: field(f, 'password') }),
    (data, el) => {
      el.reset();
      return data.message;
    },
  );
  return (
    <div className="flex flex-col gap-4">
      <form method="post" onSubmit={form.onSubmit} noValidate className="flex flex-col gap-4" aria-label="Choose a new password">
        <FormAlert tone="error" message={form.error ?? form.fields['token'] ?? null} />
        <FormAlert tone="success" message={form.success} />
        <TextField label="New password" name="password" type="password" autoComplete="new-password" required minLength={10} maxLength={256} hint="At least 10 characters." error={form.fields['password']} />
        <SubmitButton busy={form.busy} ready={form.ready} busyText="Saving…">
          Set new password
        </SubmitButton>
      </form>
      {form.success && (
        <a href="/sign-in" className="font-semibold text-denim-600 underline">
          Sign in with your new password
        </a>
      )}
    </div>
  );
}
