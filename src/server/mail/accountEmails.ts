// The account e-mails, as plain text (links on their own line so every mail client makes them clickable).
import type { OutgoingEmail } from './mailer.ts';

export function passwordResetEmail(to: string, displayName: string, link: string, validMinutes: number): OutgoingEmail {
  return {
    to,
    kind: 'password-reset',
    subject: 'Reset your Threadway password',
    text: [
      `Hello ${displayName},`,
      '',
      'Someone (we hope you) asked to reset the password of your Threadway account.',
      `Open this link within ${validMinutes} minutes to choose a new password:`,
      '',
      link,
      '',
      'The link works once. If you did not ask for it, ignore this message: your password stays as it is.',
      '',
      '— Threadway',
    ].join('\n'),
  };
}

export function emailChangedNotice(to: string, displayName: string, newEmail: string): OutgoingEmail {
  return {
    to,
    kind: 'email-changed',
    subject: 'Your Threadway e-mail address was changed',
    text: [
      `Hello ${displayName},`,
      '',
      `The e-mail address of your Threadway account was changed to ${newEmail}.`,
      'If you did not do this, reset your password right away and tell your guild administrator.',
      '',
      '— Threadway',
    ].join('\n'),
  };
}
