import { FormAlert } from '../ui/FormAlert.tsx';
import { SubmitButton } from '../ui/SubmitButton.tsx';
import { TextField } from '../ui/TextField.tsx';
import { field, useJsonForm } from '../ui/useJsonForm.ts';
import { UnitsChoice } from './UnitsChoice.tsx';

/**
 * Asks POST /api/accounts for a sign-up link. The answer is the same whether or not the address has an account
 * (the e-mail says which), so the form only passes on the message to check the inbox.
 */
export default function SignUpForm() {
  const form = useJsonForm<{ message: string }>(
    'POST',
    '/api/accounts',
    (f) => ({ email: field(f, 'email'), displayName: field(f, 'displayName'), password: field(f, 'password'), units: field(f, 'units') || 'in' }),
    (data, el) => {
      el.reset();
      return data.message;
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
      <SubmitButton busy={form.busy} ready={form.ready} busyText="Sending the link…">
        Create account
      </SubmitButton>
    </form>
  );
}
