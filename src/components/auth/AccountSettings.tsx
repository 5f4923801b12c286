import { FormAlert } from '../ui/FormAlert.tsx';
import { SubmitButton } from '../ui/SubmitButton.tsx';
import { TextField } from '../ui/TextField.tsx';
import { field, useJsonForm } from '../ui/useJsonForm.ts';
import { UnitsChoice } from './UnitsChoice.tsx';

interface Props {
  displayName: string;
  email: string;
  units: 'in' | 'cm';
}

const section = 'flex flex-col gap-4 rounded-lg border border-muslin-200 bg-white p-5 shadow-sm';

/** The three account forms: profile (name, units), sign-in e-mail, password. */
export default function AccountSettings(props: Props) {
  const profile = useJsonForm('PATCH', '/api/account', (f) => ({ displayName: field(f, 'displayName'), units: field(f, 'units') }), () => 'Profile saved.');
  const email = useJsonForm<{ account: { email: string } }>(
    'PUT',
    '/api/account/email',
    (f) => ({ email: field(f, 'email'), currentPassword: field(f, 'currentPassword') }),
    (data, el) => {
      el.querySelector<HTMLInputElement>('[name="currentPassword"]')!.value = '';
      return `Your sign-in e-mail is now ${data.account.email}.`;
    },
  );
  const password = useJsonForm(
    'PUT',
    '/api/account/password',
    (f) => ({ currentPassword: field(f, 'currentPassword'), newPassword: field(f, 'newPassword') }),
    (_data, el) => {
      el.reset();
      return 'Password changed. Your other devices have been signed out.';
    },
  );
  return (
    <div className="grid gap-6 md:grid-cols-2">
      <form method="post" onSubmit={profile.onSubmit} noValidate className={section} aria-labelledby="profile-heading">
        <h2 id="profile-heading" className="text-xl font-bold">
          Profile
        </h2>
        <FormAlert tone="error" message={profile.error} />
        <FormAlert tone="success" message={profile.success} />
        <TextField label="Display name" name="displayName" defaultValue={props.displayName} autoComplete="name" required maxLength={80} error={profile.fields['displayName']} />
        <UnitsChoice value={props.units} error={profile.fields['units']} />
        <SubmitButton busy={profile.busy} ready={profile.ready}>Save profile</SubmitButton>
      </form>
      <form method="post" onSubmit={email.onSubmit} noValidate className={section} aria-labelledby="email-heading">
        <h2 id="email-heading" className="text-xl font-bold">
          Sign-in e-mail
        </h2>
        <FormAlert tone="error" message={email.error} />
        <FormAlert tone="success" message={email.success} />
        <TextField label="E-mail" name="email" type="email" defaultValue={props.email} autoComplete="email" required maxLength={254} error={email.fields['email']} />
        <TextField label="Current password" name="currentPassword" type="password" autoComplete="current-password" required maxLength={256} error={email.fields['currentPassword']} />
        <SubmitButton busy={email.busy} ready={email.ready}>Change e-mail</SubmitButton>
      </form>
      <form method="post" onSubmit={password.onSubmit} noValidate className={`${section} md:col-span-2 md:max-w-[calc(50%-0.75rem)]`} aria-labelledby="password-heading">
        <h2 id="password-heading" className="text-xl font-bold">
          Password
        </h2>
        <FormAlert tone="error" message={password.error} />
        <FormAlert tone="success" message={password.success} />
        <TextField label="Current password" name="currentPassword" type="password" autoComplete="current-password" required maxLength={256} error={password.fields['currentPassword']} />
        <TextField label="New password" name="newPassword" type="password" autoComplete="new-password" required minLength={10} maxLength={256} hint="At least 10 characters." error={password.fields['newPassword']} />
        <SubmitButton busy={password.busy} ready={password.ready}>Change password</SubmitButton>
      </form>
    </div>
  );
}
