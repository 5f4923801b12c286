import { FormAlert } from '../ui/FormAlert.tsx';
import { SubmitButton } from '../ui/SubmitButton.tsx';
import { TextField } from '../ui/TextField.tsx';
import { field, useJsonForm } from '../ui/useJsonForm.ts';
import { UnitsChoice } from './UnitsChoice.tsx';

/** Creates an account through POST /api/accounts (which also signs it in), then opens the dashboard. */
export default function SignUpForm() {
  const form = useJsonForm(
    'POST',
    '/api/accounts',
    (f) => ({ email: field(f, 'email'), displayName: field(f, 'displayName'), password: field(f, 'password'), units: field(f, 'units') || 'in' }),
    () => {
      window.location.assign('/dashboard');
      return 'Account created. Opening your dashboard…';
    },
  );
  return (
    <form method="post" onSubmit={form.onSubmit} noValidate className="flex flex-col gap-4" aria-label="Create an account">
      <FormAlert tone="error" message={form.error} />
      <FormAlert tone="success" message={form.success} />
      <TextField label="Display name" name="displayName" autoComplete="name" required maxLength={80} hint="Shown to your guild and your students." error={form.fields['displayName']} />
      <TextField label="E-mail" name="email" type="email" autoComplete="email" required maxLength={254} error={form.fields['email']} />
      <TextField label="Password" name="password" type="password" autoComplete="new-password" required minLength={10} maxLength={256} hint="At least 10 characters. A short sentence works well." error={form.fields['password']} />
      <UnitsChoice value="in" error={form.fields['units']} />
      <SubmitButton busy={form.busy} ready={form.ready} busyText="Creating your account…">
        Create account
      </SubmitButton>
    </form>
  );
}
