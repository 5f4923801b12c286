// The two e-mails a sign-up can send. Which one goes out is the only place the answer differs, so the page that
// asked cannot tell whether the address already has an account; only the mailbox's owner learns it.
import type { OutgoingEmail } from './mailer.ts';

export function confirmSignUpEmail(to: string, displayName: string, link: string, validHours: number): OutgoingEmail {
  return {
    to,
    kind: 'sign-up-confirm',
    subject: 'Finish creating your Threadway account',
    text: [
      `Hello ${displayName},`,
      '',
      'Someone (we hope you) asked to create a Threadway account with this e-mail address.',
      `Open this link within ${validHours} hours to finish:`,
      '',
      link,
      '',
      'If you did not ask for an account, ignore this message: nothing is created without the link.',
      '',
      '— Threadway',
    ].join('\n'),
  };
}

export function alreadyRegisteredEmail(to: string, displayName: string, origin: string): OutgoingEmail {
  return {
    to,
    kind: 'sign-up-existing',
    subject: 'You already have a Threadway account',
    text: [
      `Hello ${displayName},`,
      '',
      'Someone (we hope you) tried to create a Threadway account with this e-mail address, which already has one.',
      'Nothing was changed. To sign in:',
      '',
      new URL('/sign-in', origin).href,
      '',
      'Forgotten your password? Ask for a reset link here:',
      '',
      new URL('/forgot-password', origin).href,
      '',
      'If this was not you, you can ignore this message.',
      '',
      '— Threadway',
    ].join('\n'),
  };
}
