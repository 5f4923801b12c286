import { FormAlert } from '../ui/FormAlert.tsx';
import { SubmitButton } from '../ui/SubmitButton.tsx';
import { TextField } from '../ui/TextField.tsx';
import { field, useJsonForm } from '../ui/useJsonForm.ts';

/** Signs in through POST /api/session, then goes to `next` (a local path checked by the page). */
export default function SignInForm({ next }: { next: string }) {
  const form = useJsonForm('POST', '/api/session', (f) => ({ email: field(f, 'email'), password: field(f, 'password') }), () => {
    window.location.assign(next);
    return 'Signed in. Opening your page…';
  });
  return (
    <form method="post" onSubmit={form.onSubmit} noValidate className="flex flex-col gap-4" aria-label="Sign in">
      <FormAlert tone="error" message={form.error} />
      <FormAlert tone="success" message={form.success} />
      <TextField label="E-mail" name="email" type="email" autoComplete="email" required maxLength={254} error={form.fields['email']} />
      <TextField label="Password" name="password" type="password" autoComplete="current-password" required maxLength={256} error={form.fields['password']} />
      <SubmitButton busy={form.busy} ready={form.ready} busyText="Signing in…">
        Sign in
      </SubmitButton>
    </form>
  );
}
